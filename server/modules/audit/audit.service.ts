import type { EntityManager } from 'typeorm';
import { AuditEventEntity } from './audit-event.entity';

/** One audit record to write: who (null for the system), what, to which record. */
export interface AuditInput {
  organisationId: string;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  details?: Record<string, unknown>;
}

/**
 * Writes an audit event with the transaction's manager, so the event and the change
 * commit or roll back together. Injectable so tests can make it fail mid-write.
 */
export type AuditWriter = (manager: EntityManager, event: AuditInput) => Promise<void>;

/** The real writer: one row in audit_event. */
export const writeAuditEvent: AuditWriter = async (manager, event) => {
  const row = manager.create(AuditEventEntity, {
    organisationId: event.organisationId,
    actorId: event.actorId,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    details: event.details ?? {},
  });
  await manager.save(AuditEventEntity, row);
};
