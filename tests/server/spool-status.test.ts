import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/role.schema';
import { spoolStatusSchema, type SpoolStatus } from '../../shared/schemas/spool-status.schema';
import { createJob, createShop, createSpool, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
const agents = {} as Record<Role, Awaited<ReturnType<typeof signedIn>>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Status');
  const app = testApp(db.dataSource, db.url);
  for (const role of ['admin', 'fabricator', 'inspector'] as Role[]) {
    agents[role] = await signedIn(app, shop.email(role), PASSWORD);
  }
});
afterAll(async () => {
  await db?.drop();
});

// The contract, written out independently of SPOOL_STATUS_MOVES.
const EXPECTED: Record<'fabricator' | 'inspector', string[]> = {
  fabricator: ['issued>cut', 'cut>fitted', 'fitted>welded'],
  inspector: ['welded>inspected', 'inspected>released'],
};
const STATUSES = spoolStatusSchema.options;
const pairs = STATUSES.flatMap((from) =>
  STATUSES.filter((to) => to !== from).map((to) => [from, to] as const),
);

describe('POST /api/spools/:id/status per role', () => {
  it.each(
    (['fabricator', 'inspector'] as const).flatMap((role) => pairs.map(([f, t]) => [role, f, t] as const)),
  )('%s: %s → %s', async (role, from, to) => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job, { status: from as SpoolStatus });
    const before = await snapshot(db.dataSource);
    const res = await agents[role].post(`/api/spools/${spool.id}/status`).send({ status: to, version: 1 });
    if (EXPECTED[role].includes(`${from}>${to}`)) {
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ status: to, version: 2 });
    } else {
      expect(res.status).toBe(403);
      expect(res.body.error.details).toMatchObject({ from, to });
      expect(await snapshot(db.dataSource)).toBe(before);
    }
  });

  it('an admin may set any status, e.g. put a welded spool on hold', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job, { status: 'welded' });
    const res = await agents.admin
      .post(`/api/spools/${spool.id}/status`)
      .send({ status: 'on-hold', version: 1 });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('on-hold');
    const audit = await db.dataSource.query(
      `SELECT details FROM audit_event WHERE action = 'spool.status' AND entity_id = $1`,
      [spool.id],
    );
    expect(audit[0].details).toEqual({ from: 'welded', to: 'on-hold' });
  });
});
