import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createJob,
  createShop,
  createSpool,
  createUser,
  PASSWORD,
  snapshot,
  type Shop,
} from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let detailer: Awaited<ReturnType<typeof signedIn>>;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Lock');
  const app = testApp(db.dataSource, db.url);
  detailer = await signedIn(app, shop.email('detailer'), PASSWORD);
  admin = await signedIn(app, shop.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

describe('optimistic locking', () => {
  it('job: the first PATCH wins and bumps the version; the second, stale one gets 409 with the current job', async () => {
    const job = await createJob(db.dataSource, shop, { title: 'Original' });
    const first = await detailer.patch(`/api/jobs/${job.id}`).send({ title: 'First edit', version: 1 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ title: 'First edit', version: 2 });

    const before = await snapshot(db.dataSource);
    const stale = await detailer.patch(`/api/jobs/${job.id}`).send({ title: 'Second edit', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale_version');
    expect(stale.body.error.details.current).toMatchObject({ id: job.id, title: 'First edit', version: 2 });
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('spool PATCH and status change refuse a stale version', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job, { status: 'issued' });
    await detailer.patch(`/api/spools/${spool.id}`).send({ lineNumber: 'CW-2', version: 1 }).expect(200);
    const before = await snapshot(db.dataSource);
    const patch = await detailer.patch(`/api/spools/${spool.id}`).send({ lineNumber: 'CW-3', version: 1 });
    const status = await admin.post(`/api/spools/${spool.id}/status`).send({ status: 'cut', version: 1 });
    for (const res of [patch, status]) {
      expect(res.status).toBe(409);
      expect(res.body.error.details.current).toMatchObject({
        lineNumber: 'CW-2',
        version: 2,
        status: 'issued',
      });
    }
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('draft PUT: a stale save gets 409 with the stored draft (design included) and changes nothing', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    const design = { ...draft.design, description: 'saved by the first person' };
    const saved = await detailer.put(`/api/spools/${spool.id}/draft`).send({ design, version: 1 });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(2);

    const before = await snapshot(db.dataSource);
    const stale = await admin
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: { ...draft.design, description: 'stale' }, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.details.current).toMatchObject({ id: draft.id, version: 2, state: 'draft' });
    expect(stale.body.error.details.current.design.description).toBe('saved by the first person');
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('issuing with a stale draft version gets 409 and issues nothing', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: draft.design, version: 1 })
      .expect(200);
    const before = await snapshot(db.dataSource);
    const res = await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({ version: 1 });
    expect(res.status).toBe(409);
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('user PATCH with a stale version gets 409', async () => {
    const user = await createUser(db.dataSource, shop, 'viewer');
    await admin
      .patch(`/api/users/${user.id}`)
      .send({ displayName: 'One', version: 1, currentPassword: PASSWORD })
      .expect(200);
    const res = await admin
      .patch(`/api/users/${user.id}`)
      .send({ displayName: 'Two', version: 1, currentPassword: PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error.details.current).toMatchObject({ displayName: 'One', version: 2 });
  });

  it('archive with a stale version gets 409; without a version it archives', async () => {
    const job = await createJob(db.dataSource, shop);
    await detailer.patch(`/api/jobs/${job.id}`).send({ site: 'Roof', version: 1 }).expect(200);
    await detailer.post(`/api/jobs/${job.id}/archive`).send({ version: 1 }).expect(409);
    const ok = await detailer.post(`/api/jobs/${job.id}/archive`);
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ status: 'archived', version: 3 });
    expect(ok.body.archivedAt).not.toBeNull();
  });

  it('two saves racing with the same version: exactly one wins', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    const results = await Promise.all(
      ['racer one', 'racer two'].map((d) =>
        detailer
          .put(`/api/spools/${spool.id}/draft`)
          .send({ design: { ...draft.design, description: d }, version: 1 }),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
  });
});
