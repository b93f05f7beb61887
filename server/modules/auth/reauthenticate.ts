import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import { AppError } from '../../common/app-error';
import type { SessionActor } from '../../common/session-actor';
import { UserEntity } from '../users/user.entity';
import { verifyPassword } from './password';
import { signInKeys, type SignInThrottle } from './sign-in-throttle';

/**
 * Checks the signed-in user's own password before a sensitive write (user administration).
 * Wrong passwords count as failed sign-ins of the actor's account and address, and an
 * account in back-off is refused (429) before its password is looked at, so this route
 * guesses no faster than the sign-in form.
 */
export class Reauthenticator {
  constructor(
    private readonly ds: DataSource,
    private readonly throttle: SignInThrottle,
  ) {}

  /** Resolves when `password` is `actor`'s; throws 429 in back-off, 403 `reauthentication_failed` otherwise. */
  async confirm(
    actor: SessionActor,
    password: string,
    address: string | undefined,
    res: Response,
  ): Promise<void> {
    const keys = signInKeys(actor.email, address);
    const wait = await this.throttle.retryAfterSeconds(keys.account);
    if (wait > 0) {
      res.set('Retry-After', String(wait));
      throw new AppError(
        429,
        'too_many_attempts',
        `Too many failed password attempts. Try again in ${wait} second${wait === 1 ? '' : 's'}.`,
        { retryAfterSeconds: wait },
      );
    }
    const row = await this.ds
      .getRepository(UserEntity)
      .createQueryBuilder('u')
      .addSelect('u.passwordHash')
      .where('u.id = :id AND u.organisationId = :org AND u.active = true', {
        id: actor.id,
        org: actor.organisationId,
      })
      .getOne();
    if (row && (await verifyPassword(password, row.passwordHash))) return;
    await this.throttle.recordFailure(keys);
    throw new AppError(403, 'reauthentication_failed', 'Your password is not correct; nothing was changed');
  }
}
