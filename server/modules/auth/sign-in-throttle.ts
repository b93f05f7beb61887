import type { DataSource } from 'typeorm';

/** Sign-in failure limits: per account (across addresses) and per client address. */
export interface SignInLimits {
  /** Failures at one account, from any address, before it is slowed down. */
  maxAttemptsPerAccount: number;
  /** Failures from one address, at any accounts, before its failing attempts are slowed down. */
  maxAttemptsPerIp: number;
  /** Failures older than this (ms) no longer count. Also the longest back-off. */
  windowMs: number;
}

/** The two keys a sign-in attempt is counted under. */
export interface SignInKeys {
  account: string;
  address: string;
}

/** The keys of an attempt at `email` (normalised) from `address`. */
export function signInKeys(email: string, address: string | undefined): SignInKeys {
  return { account: `account:${email.trim().toLowerCase()}`, address: `address:${address ?? 'unknown'}` };
}

/**
 * Counts failed sign-ins in PostgreSQL (table `sign_in_failure`) so every server process
 * sees the same counts. Past a key's limit each further failure doubles its back-off
 * (1 s, 2 s, 4 s … up to the window): the key is slowed down, never locked for good, and a
 * success clears the account's count.
 */
export class SignInThrottle {
  constructor(
    private readonly ds: DataSource,
    private readonly limits: SignInLimits,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /** Whole seconds until `key` may try again; 0 when it is not in back-off. */
  async retryAfterSeconds(key: string): Promise<number> {
    const rows = (await this.ds.query(`SELECT blocked_until FROM sign_in_failure WHERE key = $1`, [
      key,
    ])) as Array<{ blocked_until: Date | null }>;
    const until = rows[0]?.blocked_until;
    if (!until) return 0;
    const ms = until.getTime() - this.now().getTime();
    return ms > 0 ? Math.ceil(ms / 1000) : 0;
  }

  /** Counts one failure under each key (and starts or lengthens its back-off past the limit). */
  async recordFailure(keys: SignInKeys): Promise<void> {
    const now = this.now();
    const staleBefore = new Date(now.getTime() - this.limits.windowMs);
    await this.bump(keys.account, this.limits.maxAttemptsPerAccount, now, staleBefore);
    await this.bump(keys.address, this.limits.maxAttemptsPerIp, now, staleBefore);
    // Expire old rows here, so the table stays as small as the recent failures.
    await this.ds.query(
      `DELETE FROM sign_in_failure
        WHERE last_failure_at < $1 AND (blocked_until IS NULL OR blocked_until < $2)`,
      [staleBefore, now],
    );
  }

  /** Forgets the failures counted under `key` (after a successful sign-in). */
  async clear(key: string): Promise<void> {
    await this.ds.query(`DELETE FROM sign_in_failure WHERE key = $1`, [key]);
  }

  private async bump(key: string, limit: number, now: Date, staleBefore: Date): Promise<void> {
    // One statement, so concurrent failures (any process) each count once.
    const rows = (await this.ds.query(
      `INSERT INTO sign_in_failure AS f (key, failures, first_failure_at, last_failure_at)
       VALUES ($1, 1, $2, $2)
       ON CONFLICT (key) DO UPDATE SET
         failures = CASE WHEN f.last_failure_at < $3 THEN 1 ELSE f.failures + 1 END,
         first_failure_at = CASE WHEN f.last_failure_at < $3 THEN $2 ELSE f.first_failure_at END,
         blocked_until = CASE WHEN f.last_failure_at < $3 THEN NULL ELSE f.blocked_until END,
         last_failure_at = $2
       RETURNING failures`,
      [key, now, staleBefore],
    )) as Array<{ failures: number }>;
    const failures = rows[0]!.failures;
    if (failures < limit) return;
    const backOffMs = Math.min(this.limits.windowMs, 1000 * 2 ** Math.min(failures - limit, 30));
    await this.ds.query(`UPDATE sign_in_failure SET blocked_until = $2 WHERE key = $1`, [
      key,
      new Date(now.getTime() + backOffMs),
    ]);
  }
}
