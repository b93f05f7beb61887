import { EntitySchema } from 'typeorm';

/** Who did what to which record, and when. Written in the same transaction as the change. */
export interface AuditEventRow {
  id: string;
  organisationId: string;
  /** Null for system actions (seed). */
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  at: Date;
  details: Record<string, unknown>;
}

export const AuditEventEntity = new EntitySchema<AuditEventRow>({
  name: 'AuditEvent',
  tableName: 'audit_event',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    organisationId: { name: 'organisation_id', type: 'uuid' },
    actorId: { name: 'actor_id', type: 'uuid', nullable: true },
    action: { type: 'text' },
    entityType: { name: 'entity_type', type: 'text' },
    entityId: { name: 'entity_id', type: 'uuid', nullable: true },
    at: { type: 'timestamptz', default: () => 'now()' },
    details: { type: 'jsonb', default: () => "'{}'::jsonb" },
  },
});
