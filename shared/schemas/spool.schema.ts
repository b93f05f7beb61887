import { z } from 'zod';
import { idSchema, timestampSchema } from './id.schema';
import { listQuerySchema, queryBooleanSchema } from './list-query.schema';
import { spoolStatusSchema } from './spool-status.schema';
import { textSchema } from './text.schema';

/** Spool mark, e.g. `CW-201-S03`: unique within its job. */
export const spoolMarkSchema = z
  .string()
  .trim()
  .min(1)
  .max(60)
  .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, 'Letters, digits, and . _ / - only');

/** Line number from the client's isometric, e.g. `CW-201`. */
export const lineNumberSchema = textSchema().trim().min(1).max(80);

/**
 * A spool flagged for rework: a revision was issued over work the bay had already done.
 * `fromStatus` is where the spool stood, `toStatus` where the issue sent it back.
 */
export const spoolReworkSchema = z.object({
  letter: z.string(),
  sinceLetter: z.string(),
  fromStatus: spoolStatusSchema,
  toStatus: spoolStatusSchema,
  /** What changed, one line per difference, in shop marks. */
  changes: z.array(z.string()),
  flaggedAt: timestampSchema,
});
/** A spool's rework flag. */
export type SpoolRework = z.infer<typeof spoolReworkSchema>;

/** A spool as the API returns it. */
export const spoolSchema = z.object({
  id: idSchema,
  jobId: idSchema,
  mark: z.string(),
  lineNumber: z.string(),
  status: spoolStatusSchema,
  currentRevision: z.object({ id: idSchema, letter: z.string(), issuedAt: timestampSchema }).nullable(),
  draft: z
    .object({ id: idSchema, letter: z.string(), version: z.number().int(), updatedAt: timestampSchema })
    .nullable(),
  /** Set while the bay must rework the spool to a newer revision; null otherwise. */
  rework: spoolReworkSchema.nullable(),
  archivedAt: timestampSchema.nullable(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  version: z.number().int(),
});
/** A spool as the API returns it. */
export type Spool = z.infer<typeof spoolSchema>;

/** `POST /api/jobs/:jobId/spools` body. */
export const spoolCreateSchema = z.object({ mark: spoolMarkSchema, lineNumber: lineNumberSchema }).strict();
/** Parsed spool create body. */
export type SpoolCreate = z.infer<typeof spoolCreateSchema>;

/** `PATCH /api/spools/:id` body. */
export const spoolUpdateSchema = z
  .object({
    mark: spoolMarkSchema.optional(),
    lineNumber: lineNumberSchema.optional(),
    version: z.number().int().min(1),
  })
  .strict();
/** Parsed spool update body. */
export type SpoolUpdate = z.infer<typeof spoolUpdateSchema>;

/** `POST /api/spools/:id/status` body. */
export const spoolStatusChangeSchema = z
  .object({ status: spoolStatusSchema, version: z.number().int().min(1) })
  .strict();
/** Parsed status change body. */
export type SpoolStatusChange = z.infer<typeof spoolStatusChangeSchema>;

/** `POST /api/spools/:id/rework/done` body: the bay has reworked the spool to its current revision. */
export const reworkDoneSchema = z.object({ version: z.number().int().min(1) }).strict();
/** Parsed rework-done body. */
export type ReworkDone = z.infer<typeof reworkDoneSchema>;

/** Roles that may say a spool's rework is done: the bay and admins. */
export const REWORK_DONE_ROLES = ['admin', 'fabricator'] as const;

/** Route params of the job's spool collection, `/api/jobs/:jobId/spools`. */
export const jobSpoolsParamsSchema = z.object({ jobId: idSchema }).strict();

/** Sortable spool list fields; the first is the default. */
export const SPOOL_SORT_FIELDS = ['mark', 'lineNumber', 'status', 'createdAt', 'updatedAt'] as const;

/** `GET /api/jobs/:jobId/spools` query. Archived spools are left out unless `includeArchived=true`. */
export const spoolListQuerySchema = listQuerySchema(SPOOL_SORT_FIELDS).extend({
  status: spoolStatusSchema.optional(),
  includeArchived: queryBooleanSchema.optional(),
});
/** Parsed spool list query. */
export type SpoolListQuery = z.infer<typeof spoolListQuerySchema>;
