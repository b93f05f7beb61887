import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MIGRATIONS } from '../../server/db/data-source';
import { createJob, createShop, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';

let db: TestDatabase;
let kestrel: Shop;
let fenwick: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  kestrel = await createShop(db.dataSource, 'Kestrel');
  fenwick = await createShop(db.dataSource, 'Fenwick');
});
afterAll(async () => {
  await db?.drop();
});

describe('the schema itself', () => {
  it("refuses a row that points at another shop's row (composite foreign keys)", async () => {
    const job = await createJob(db.dataSource, kestrel);
    await expect(
      db.dataSource.query(
        `INSERT INTO spool (organisation_id, job_id, mark, line_number) VALUES ($1, $2, 'X-1', 'L')`,
        [fenwick.id, job.id],
      ),
    ).rejects.toThrow(/foreign key/);
  });

  it('refuses values outside the enumerations and upper-case e-mails', async () => {
    await expect(
      db.dataSource.query(`UPDATE app_user SET role = 'owner' WHERE id = $1`, [kestrel.users.viewer.id]),
    ).rejects.toThrow(/check constraint/);
    await expect(
      db.dataSource.query(`UPDATE app_user SET email = 'Loud@Example.com' WHERE id = $1`, [
        kestrel.users.viewer.id,
      ]),
    ).rejects.toThrow(/check constraint/);
  });

  it('allows one draft per spool', async () => {
    const job = await createJob(db.dataSource, kestrel);
    const [spool] = await db.dataSource.query(
      `INSERT INTO spool (organisation_id, job_id, mark, line_number) VALUES ($1, $2, 'D-1', 'L') RETURNING id`,
      [kestrel.id, job.id],
    );
    const insert = (letter: string) =>
      db.dataSource.query(
        `INSERT INTO spool_revision (organisation_id, spool_id, letter, state, design, author_id)
         VALUES ($1, $2, $3, 'draft', '{}'::jsonb, $4)`,
        [kestrel.id, spool.id, letter, kestrel.users.detailer.id],
      );
    await insert('A');
    await expect(insert('B')).rejects.toThrow(/spool_revision_one_draft/);
  });

  it('migrates down and up again cleanly', async () => {
    const fresh = await createTestDatabase();
    try {
      for (let i = 0; i < MIGRATIONS.length; i++) await fresh.dataSource.undoLastMigration({ transaction: 'each' });
      const [{ n }] = await fresh.dataSource.query(
        `SELECT count(*)::int AS n FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'typeorm_migrations'`,
      );
      expect(n).toBe(0);
      const applied = await fresh.dataSource.runMigrations({ transaction: 'each' });
      expect(applied.map((m) => m.name)).toEqual(MIGRATIONS.map((m) => m.name));
    } finally {
      await fresh.drop();
    }
  });
});
