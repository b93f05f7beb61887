import type { DataSource } from 'typeorm';
import type { SessionActor } from '../../common/session-actor';
import type { Role } from '../../../shared/schemas/role.schema';
import type { AuditWriter } from '../audit/audit.service';
import { OrganisationEntity } from '../organisations/organisation.entity';
import { UserEntity, type UserRow } from '../users/user.entity';
import { dummyPasswordHash, verifyPassword } from './password';

/**
 * bcrypt comparisons per sign-in attempt, whatever the e-mail: one e-mail may have an
 * account in two shops, and an unknown e-mail or a one-shop account is padded with
 * comparisons against a dummy hash of the same cost, so the answer's time tells nothing.
 */
export const SIGN_IN_PASSWORD_CHECKS = 2;

/** Sign-in checks and loading the signed-in user for each request. */
export class AuthService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
    /** bcrypt cost of the dummy hash: the cost new passwords are hashed at. */
    private readonly bcryptCost: number,
    /** The bcrypt comparison; tests count its calls. */
    private readonly verify: (password: string, hash: string) => Promise<boolean> = verifyPassword,
  ) {}

  /**
   * The active account whose password matches, or null. E-mails are unique per shop,
   * so one address may have accounts in two shops: each is checked, oldest first.
   * Unknown e-mail, wrong password, inactive account and an e-mail in two shops all make
   * the same number of bcrypt comparisons (`SIGN_IN_PASSWORD_CHECKS`; more only for an
   * e-mail in three or more shops), so they take the same time.
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
    const dummy = dummyPasswordHash(this.bcryptCost);
    let match: UserRow | null = null;
    // Every candidate is checked even after a match, then padded with dummy checks.
    for (let i = 0; i < Math.max(SIGN_IN_PASSWORD_CHECKS, candidates.length); i++) {
      const user = candidates[i];
      const ok = await this.verify(password, user ? user.passwordHash : dummy);
      if (ok && user && !match) match = user;
    }
    return match ? this.toActor(match) : null;
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
