import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, createShop, createSpool, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Archived');
  admin = await signedIn(testApp(db.dataSource, db.url), shop.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

/** A job archived through the API, with one spool whose draft is open. */
async function archivedJobWithSpool(status?: 'issued') {
  const job = await createJob(db.dataSource, shop);
  const { spool, draft } = await createSpool(db.dataSource, shop, job, status ? { status } : {});
  const res = await admin.post(`/api/jobs/${job.id}/archive`);
  expect(res.status).toBe(200);
  return { job, spool, draft };
}

describe('an archived job is read-only throughout: 409 job_archived, nothing written', () => {
  const writes: Array<
    [
      string,
      (
        ids: Awaited<ReturnType<typeof archivedJobWithSpool>>,
      ) => PromiseLike<{ status: number; body: { error?: { code: string } } }>,
    ]
  > = [
    [
      'edit a spool',
      ({ spool }) => admin.patch(`/api/spools/${spool.id}`).send({ lineNumber: 'CW-2', version: 1 }),
    ],
    [
      'save the draft',
      ({ spool, draft }) =>
        admin.put(`/api/spools/${spool.id}/draft`).send({ design: draft.design, version: 1 }),
    ],
    ['issue the draft', ({ spool }) => admin.post(`/api/spools/${spool.id}/draft/issue`).send({})],
    [
      'move a spool on the floor',
      ({ spool }) => admin.post(`/api/spools/${spool.id}/status`).send({ status: 'cut', version: 1 }),
    ],
    ['archive a spool', ({ spool }) => admin.post(`/api/spools/${spool.id}/archive`).send({})],
    [
      'add a spool',
      ({ job }) => admin.post(`/api/jobs/${job.id}/spools`).send({ mark: 'NEW-1', lineNumber: 'CW-1' }),
    ],
  ];
  it.each(writes)('%s', async (_name, send) => {
    const ids = await archivedJobWithSpool('issued');
    // The issued spool needs a draft to save or issue: it keeps the fixture's open draft.
    const before = await snapshot(db.dataSource);
    const res = await send(ids);
    expect(res.status, JSON.stringify(res.body)).toBe(409);
    expect(res.body.error?.code).toBe('job_archived');
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('opening a draft of a spool without one is refused too; reading still works', async () => {
    const { spool, draft } = await archivedJobWithSpool();
    await db.dataSource.query(`DELETE FROM spool_revision WHERE id = $1`, [draft.id]);
    const before = await snapshot(db.dataSource);
    const res = await admin.post(`/api/spools/${spool.id}/draft`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('job_archived');
    expect(await snapshot(db.dataSource)).toBe(before);
    expect((await admin.get(`/api/spools/${spool.id}`)).status).toBe(200);
    expect((await admin.get(`/api/spools/${spool.id}/revisions`)).status).toBe(200);
  });
});
