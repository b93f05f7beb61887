import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createShop, PASSWORD, SPEC, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let other: Shop;
let app: ReturnType<typeof testApp>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Audit');
  other = await createShop(db.dataSource, 'Elsewhere');
  app = testApp(db.dataSource, db.url);
});
afterAll(async () => {
  await db?.drop();
});

describe('GET /api/audit-events', () => {
  it('lists who did what to which record, newest first, filtered by record', async () => {
    const detailer = await signedIn(app, shop.email('detailer'), PASSWORD);
    const job = await detailer
      .post('/api/jobs')
      .send({ number: 'AU-1', title: 'Audited', client: 'C', spec: SPEC });
    await detailer.patch(`/api/jobs/${job.body.id}`).send({ title: 'Audited twice', version: 1 }).expect(200);
    const admin = await signedIn(app, shop.email('admin'), PASSWORD);
    const res = await admin.get(`/api/audit-events?entityId=${job.body.id}`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(2);
    expect(res.body.items.map((e: { action: string }) => e.action)).toEqual(['job.update', 'job.create']);
    expect(res.body.items[0]).toMatchObject({
      actor: { id: shop.users.detailer.id, displayName: 'Audit detailer' },
      entityType: 'job',
      details: { fields: ['title'], before: { title: 'Audited' } },
    });
  });

  it("never shows another shop's events", async () => {
    const theirs = await signedIn(app, other.email('admin'), PASSWORD);
    await theirs
      .post('/api/jobs')
      .send({ number: 'OTHER-1', title: 'Theirs', client: 'C', spec: SPEC })
      .expect(201);
    const admin = await signedIn(app, shop.email('admin'), PASSWORD);
    const res = await admin.get('/api/audit-events?pageSize=100&q=job');
    expect(res.body.items.length).toBeGreaterThan(0);
    expect(JSON.stringify(res.body)).not.toContain('OTHER-1');
    expect(JSON.stringify(res.body)).not.toContain(other.users.admin.id);
  });
});
