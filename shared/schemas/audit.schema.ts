import { z } from 'zod';
import { idSchema, timestampSchema } from './id.schema';
import { listQuerySchema } from './list-query.schema';

/** Kinds of record the audit trail names. */
export const auditEntityTypeSchema = z.enum(['organisation', 'user', 'job', 'spool', 'spool_revision']);

/** One audit event as the API returns it: who did what to which record, and when. */
export const auditEventSchema = z.object({
  id: idSchema,
  /** Null for system actions such as loading the demo data. */
  actor: z.object({ id: idSchema, displayName: z.string() }).nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: idSchema.nullable(),
  at: timestampSchema,
  details: z.record(z.string(), z.unknown()),
});
/** An audit event. */
export type AuditEvent = z.infer<typeof auditEventSchema>;

/** `GET /api/audit-events` query: newest first by default, filtered by record or actor. */
export const auditListQuerySchema = listQuerySchema(['at'] as const, 'desc').extend({
  entityType: auditEntityTypeSchema.optional(),
  entityId: idSchema.optional(),
  actorId: idSchema.optional(),
});
/** Parsed audit list query. */
export type AuditListQuery = z.infer<typeof auditListQuerySchema>;
