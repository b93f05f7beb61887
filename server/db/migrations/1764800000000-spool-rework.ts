import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A spool's rework flag: set when a revision is issued over work the bay has done. */
export class SpoolRework1764800000000 implements MigrationInterface {
  name = 'SpoolRework1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE spool ADD COLUMN rework jsonb NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE spool DROP COLUMN rework`);
  }
}
