import type { DataSource } from 'typeorm';
import type { AuditEvent, AuditListQuery } from '../../../shared/schemas/audit.schema';
import type { Page } from '../../../shared/schemas/list-query.schema';
import { applySortAndPage, likePattern } from '../../common/list-query';
import type { SessionActor } from '../../common/session-actor';
import { UserEntity } from '../users/user.entity';
import { AuditEventEntity } from './audit-event.entity';

/** Reads the shop's audit trail (admins). */
export class AuditQueryService {
  constructor(private readonly ds: DataSource) {}

  async list(actor: SessionActor, query: AuditListQuery): Promise<Page<AuditEvent>> {
    const qb = this.ds
      .getRepository(AuditEventEntity)
      .createQueryBuilder('e')
      .leftJoin(UserEntity.options.name, 'u', 'u.id = e.actorId')
      .addSelect('u.displayName', 'actor_name')
      .where('e.organisationId = :org', { org: actor.organisationId });
    if (query.entityType) qb.andWhere('e.entityType = :type', { type: query.entityType });
    if (query.entityId) qb.andWhere('e.entityId = :entityId', { entityId: query.entityId });
    if (query.actorId) qb.andWhere('e.actorId = :actorId', { actorId: query.actorId });
    if (query.q) qb.andWhere('e.action ILIKE :q', { q: likePattern(query.q) });
    const total = await qb.getCount();
    const { entities, raw } = await applySortAndPage(qb, 'e', { at: 'e.at' }, query).getRawAndEntities();
    const items = entities.map((e, i) => ({
      id: e.id,
      actor: e.actorId ? { id: e.actorId, displayName: String(raw[i]?.actor_name ?? '') } : null,
      action: e.action,
      entityType: e.entityType,
      entityId: e.entityId,
      at: e.at.toISOString(),
      details: e.details,
    }));
    return { items, total, page: query.page, pageSize: query.pageSize };
  }
}
