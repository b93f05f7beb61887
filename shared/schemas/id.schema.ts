import { z } from 'zod';

/** A record id: a UUID as PostgreSQL's gen_random_uuid() makes them. */
export const idSchema = z.uuid();
/** A record id string. */
export type Id = z.infer<typeof idSchema>;

/** Route params carrying one record id, `/:id`. */
export const idParamsSchema = z.object({ id: idSchema }).strict();
/** Parsed `/:id` route params. */
export type IdParams = z.infer<typeof idParamsSchema>;

/** ISO 8601 timestamp string as the API returns them (UTC, `Z`). */
export const timestampSchema = z.iso.datetime({ offset: true });
