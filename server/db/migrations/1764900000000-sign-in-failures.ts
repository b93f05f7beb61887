import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Failed sign-in counts, per account and per client address, shared by every server
 * process. A row past its window is stale: the next failure restarts its count, and
 * the sign-in limiter deletes old rows.
 */
export class SignInFailures1764900000000 implements MigrationInterface {
  name = 'SignInFailures1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE sign_in_failure (
        key text PRIMARY KEY,
        failures integer NOT NULL CHECK (failures > 0),
        first_failure_at timestamptz NOT NULL,
        last_failure_at timestamptz NOT NULL,
        blocked_until timestamptz NULL
      )`);
    await q.query(`CREATE INDEX sign_in_failure_last_idx ON sign_in_failure (last_failure_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE sign_in_failure`);
  }
}
