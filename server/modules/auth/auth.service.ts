import type { DataSource } from 'typeorm';
import type { SessionActor } from '../../common/session-actor';
import type { Role } from '../../../shared/schemas/role.schema';
import type { AuditWriter } from '../audit/audit.service';
import { OrganisationEntity } from '../organisations/organisation.entity';
import { UserEntity, type UserRow } from '../users/user.entity';
import { burnPasswordCheck, verifyPassword } from './password';

/** Sign-in checks and loading the signed-in user for each request. */
export class AuthService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
  ) {}

  /**
   * The active account whose password matches, or null. E-mails are unique per shop,
   * so one address may have accounts in two shops: each is checked, oldest first.
   * Unknown e-mail, wrong password and inactive account all give null, in about the same time.
   */
  async verifyCredentials(email: string, password: string): Promise<SessionActor | null> {
    const candidates = await this.ds
      .getRepository(UserEntity)
      .createQueryBuilder('u')
      .addSelect('u.passwordHash')
      .where('u.email = :email', { email })
      .andWhere('u.active = true')
      .orderBy('u.createdAt', 'ASC')
      .getMany();
    if (candidates.length === 0) {
      await burnPasswordCheck(password);
      return null;
    }
    for (const user of candidates) {
      if (await verifyPassword(password, user.passwordHash)) return this.toActor(user);
    }
    return null;
  }

  /** Records the sign-in time and an audit event. */
  async recordSignIn(actor: SessionActor): Promise<Date> {
    return this.ds.transaction(async (m) => {
      const at = new Date();
      await m.update(
        UserEntity,
        { id: actor.id, organisationId: actor.organisationId },
        { lastSignInAt: at },
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'auth.sign-in',
        entityType: 'user',
        entityId: actor.id,
      });
      return at;
    });
  }

  /** The session's user, freshly loaded; null when deleted or deactivated (ends the session). */
  /** The signed-in user of a session, with their shop's name: one query, run on every request. */
  async loadActor(userId: string): Promise<SessionActor | null> {
    const rows: Array<{
      id: string;
      organisation_id: string;
      email: string;
      display_name: string;
      role: Role;
      name: string;
    }> = await this.ds.query(
      `SELECT u.id, u.organisation_id, u.email, u.display_name, u.role, o.name
           FROM app_user u JOIN organisation o ON o.id = u.organisation_id
          WHERE u.id = $1 AND u.active`,
      [userId],
    );
    const row = rows[0];
    if (!row) return null;
    return {
      id: row.id,
      organisationId: row.organisation_id,
      organisationName: row.name,
      email: row.email,
      displayName: row.display_name,
      role: row.role,
    };
  }

  private async toActor(user: UserRow): Promise<SessionActor> {
    const org = await this.ds.getRepository(OrganisationEntity).findOneByOrFail({ id: user.organisationId });
    return {
      id: user.id,
      organisationId: user.organisationId,
      organisationName: org.name,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
    };
  }
}
