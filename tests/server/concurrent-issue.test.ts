import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditCount, createJob, createShop, createSpool, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let app: Express;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Race');
  app = testApp(db.dataSource, db.url);
});
afterAll(async () => {
  await db?.drop();
});

describe('twenty clients issue the same draft at once', () => {
  it('one wins; the others get 409 already_issued with the issued revision, never 404', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    const clients = await Promise.all(
      Array.from({ length: 20 }, () => signedIn(app, shop.email('detailer'), PASSWORD)),
    );
    const answers = await Promise.all(
      clients.map((c) => c.post(`/api/spools/${spool.id}/draft/issue`).send({ note: 'For fabrication' })),
    );
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    for (const loser of answers.filter((a) => a.status === 409)) {
      expect(loser.body.error.code).toBe('already_issued');
      expect(loser.body.error.details.current).toMatchObject({ id: draft.id, state: 'issued', letter: 'A' });
    }
    expect(await auditCount(db.dataSource, 'revision.issue')).toBe(1);
  });
});
