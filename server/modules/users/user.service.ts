import type { DataSource, EntityManager } from 'typeorm';
import type { Page } from '../../../shared/schemas/list-query.schema';
import type { User, UserCreate, UserListQuery, UserUpdate } from '../../../shared/schemas/user.schema';
import { notFound, staleVersion, unprocessable } from '../../common/app-error';
import { applySortAndPage, likePattern } from '../../common/list-query';
import type { SessionActor } from '../../common/session-actor';
import type { AuditWriter } from '../audit/audit.service';
import { hashPassword } from '../auth/password';
import { UserEntity, type UserRow } from './user.entity';
import { toUserDto } from './user.mapper';

const SORT_COLUMNS: Record<UserListQuery['sort'], string> = {
  displayName: 'u.displayName',
  email: 'u.email',
  role: 'u.role',
  createdAt: 'u.createdAt',
  lastSignInAt: 'u.lastSignInAt',
};

/** The shop's user accounts (admin routes), always within the actor's organisation. */
export class UserService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
    private readonly bcryptCost: number,
  ) {}

  async list(actor: SessionActor, query: UserListQuery): Promise<Page<User>> {
    const qb = this.ds
      .getRepository(UserEntity)
      .createQueryBuilder('u')
      .where('u.organisationId = :org', { org: actor.organisationId });
    if (query.q) {
      qb.andWhere('(u.email ILIKE :q OR u.displayName ILIKE :q)', { q: likePattern(query.q) });
    }
    if (query.role) qb.andWhere('u.role = :role', { role: query.role });
    if (query.active !== undefined) qb.andWhere('u.active = :active', { active: query.active });
    const [rows, total] = await applySortAndPage(qb, 'u', SORT_COLUMNS, query).getManyAndCount();
    return { items: rows.map((r) => this.dto(actor, r)), total, page: query.page, pageSize: query.pageSize };
  }

  async get(actor: SessionActor, id: string): Promise<User> {
    return this.dto(actor, await this.find(this.ds.manager, actor, id));
  }

  async create(actor: SessionActor, input: UserCreate): Promise<User> {
    const passwordHash = await hashPassword(input.password, this.bcryptCost);
    return this.ds.transaction(async (m) => {
      const row = await m.save(
        UserEntity,
        m.create(UserEntity, {
          organisationId: actor.organisationId,
          email: input.email,
          displayName: input.displayName,
          role: input.role,
          passwordHash,
          active: true,
        }),
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'user.create',
        entityType: 'user',
        entityId: row.id,
        details: { email: row.email, role: row.role },
      });
      return this.dto(actor, await this.find(m, actor, row.id));
    });
  }

  async update(actor: SessionActor, id: string, input: UserUpdate): Promise<User> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== undefined && input.version !== row.version)
        throw staleVersion(this.dto(actor, row));
      if (row.id === actor.id && input.active === false) {
        throw unprocessable('You cannot deactivate your own account');
      }
      if (row.id === actor.id && input.role !== undefined && input.role !== 'admin') {
        throw unprocessable('You cannot remove your own admin role; ask another admin');
      }
      const changes: Partial<UserRow> = {};
      if (input.displayName !== undefined && input.displayName !== row.displayName)
        changes.displayName = input.displayName;
      if (input.role !== undefined && input.role !== row.role) changes.role = input.role;
      if (input.active !== undefined && input.active !== row.active) changes.active = input.active;
      if (Object.keys(changes).length === 0) return this.dto(actor, row);
      await m.update(
        UserEntity,
        { id: row.id, organisationId: actor.organisationId },
        { ...changes, version: row.version + 1, updatedAt: new Date() },
      );
      // A deactivated user, or one whose role changed, signs in again with the new rights.
      if (changes.active === false) await this.endSessions(m, row.id);
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'user.update',
        entityType: 'user',
        entityId: row.id,
        details: { changes },
      });
      return this.dto(actor, await this.find(m, actor, row.id));
    });
  }

  /** Sets a new password and ends the user's sessions (except `keepSessionId`, the caller's own). */
  async resetPassword(
    actor: SessionActor,
    id: string,
    password: string,
    keepSessionId?: string,
  ): Promise<void> {
    const passwordHash = await hashPassword(password, this.bcryptCost);
    await this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      await m.update(
        UserEntity,
        { id: row.id, organisationId: actor.organisationId },
        { passwordHash, version: row.version + 1, updatedAt: new Date() },
      );
      // Whoever held the old password is signed out everywhere (but not the admin doing it).
      await this.endSessions(m, row.id, row.id === actor.id ? keepSessionId : undefined);
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'user.reset-password',
        entityType: 'user',
        entityId: row.id,
      });
    });
  }

  private async endSessions(m: EntityManager, userId: string, keepSessionId?: string): Promise<void> {
    await m.query(`DELETE FROM session WHERE sess -> 'passport' ->> 'user' = $1 AND sid <> $2`, [
      userId,
      keepSessionId ?? '',
    ]);
  }

  private async find(m: EntityManager, actor: SessionActor, id: string, lock = false): Promise<UserRow> {
    const qb = m
      .getRepository(UserEntity)
      .createQueryBuilder('u')
      .where('u.id = :id AND u.organisationId = :org', { id, org: actor.organisationId });
    if (lock) qb.setLock('pessimistic_write');
    const row = await qb.getOne();
    if (!row) throw notFound('User');
    return row;
  }

  private dto(actor: SessionActor, row: UserRow): User {
    return toUserDto(row, { id: actor.organisationId, name: actor.organisationName });
  }
}
