import { z } from 'zod';

/**
 * What a signed-in person may do in their shop:
 * admin (users, jobs, everything), detailer (designs and issues revisions),
 * fabricator (reads sheets, records shop progress), inspector (records inspections,
 * releases spools), viewer (read-only, e.g. the client's engineer).
 */
export const roleSchema = z.enum(['admin', 'detailer', 'fabricator', 'inspector', 'viewer']);
/** A user role. */
export type Role = z.infer<typeof roleSchema>;
/** Every role, in the order screens list them. */
export const ROLES = roleSchema.options;
