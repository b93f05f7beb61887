import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, createShop, createSpool, PASSWORD, snapshot, SPEC, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;
let jobId: string;
let spoolId: string;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Bad');
  // A small body limit so the oversize case stays cheap.
  const app = testApp(db.dataSource, db.url, { env: { JSON_BODY_LIMIT: '64kb' } });
  admin = await signedIn(app, shop.email('admin'), PASSWORD);
  const job = await createJob(db.dataSource, shop);
  jobId = job.id;
  spoolId = (await createSpool(db.dataSource, shop, job)).spool.id;
});
afterAll(async () => {
  await db?.drop();
});

interface ErrorAnswer {
  error?: { code: string; message: string; details?: { issues?: Array<{ path: PropertyKey[] }> } };
}

/** Sends a request and checks: the status, the one error shape, and that no row changed. */
async function refused(
  send: () => PromiseLike<{ status: number; body: unknown }>,
  status: number,
  code: string,
) {
  const before = await snapshot(db.dataSource);
  const res = await send();
  const body = res.body as ErrorAnswer;
  expect(res.status, JSON.stringify(body)).toBe(status);
  expect(body.error?.code).toBe(code);
  expect(body.error?.message).toEqual(expect.any(String));
  expect(await snapshot(db.dataSource)).toBe(before);
  return { status: res.status, body };
}

const validJob = () => ({
  number: `N-${Math.random().toString(36).slice(2, 8)}`,
  title: 'T',
  client: 'C',
  spec: SPEC,
});

describe('bad input', () => {
  it('malformed JSON: 400 invalid_request', async () => {
    const res = await refused(
      () => admin.post('/api/jobs').set('Content-Type', 'application/json').send('{"number": "X", '),
      400,
      'invalid_request',
    );
    expect(res.body.error?.message).toMatch(/JSON/);
  });

  it('wrong types: 400 with the zod issues naming the field', async () => {
    const res = await refused(
      () => admin.post('/api/jobs').send({ ...validJob(), spec: { ...SPEC, rootGapMm: '3' } }),
      400,
      'invalid_request',
    );
    expect(res.body.error?.details?.issues?.[0]?.path).toEqual(['spec', 'rootGapMm']);
  });

  it('unknown fields at the top level and inside the spec: 400', async () => {
    await refused(
      () => admin.post('/api/jobs').send({ ...validJob(), organisationId: shop.id }),
      400,
      'invalid_request',
    );
    await refused(
      () => admin.post('/api/jobs').send({ ...validJob(), spec: { ...SPEC, colour: 'red' } }),
      400,
      'invalid_request',
    );
    await refused(
      () => admin.patch(`/api/spools/${spoolId}`).send({ status: 'shipped', version: 1 }),
      400,
      'invalid_request',
    );
  });

  it('a body that is not an object, or no body where one is needed: 400', async () => {
    await refused(() => admin.post('/api/jobs').send([validJob()]), 400, 'invalid_request');
    await refused(() => admin.post('/api/jobs'), 400, 'invalid_request');
    await refused(
      () => admin.post('/api/jobs').set('Content-Type', 'text/plain').send('number=1'),
      400,
      'invalid_request',
    );
  });

  it('a form or text body on a route whose fields are all optional: 400, nothing archived', async () => {
    await refused(
      () =>
        admin
          .post(`/api/jobs/${jobId}/archive`)
          .set('Content-Type', 'application/x-www-form-urlencoded')
          .send('a=1'),
      400,
      'invalid_request',
    );
    await refused(
      () => admin.post(`/api/spools/${spoolId}/archive`).set('Content-Type', 'text/plain').send('x'),
      400,
      'invalid_request',
    );
  });

  it('values out of range: negative root gap, unknown flange class, unknown role, short password', async () => {
    await refused(
      () => admin.post('/api/jobs').send({ ...validJob(), spec: { ...SPEC, rootGapMm: -1 } }),
      400,
      'invalid_request',
    );
    await refused(
      () => admin.post('/api/jobs').send({ ...validJob(), spec: { ...SPEC, flangeClass: 125 } }),
      400,
      'invalid_request',
    );
    await refused(
      () =>
        admin
          .post('/api/users')
          .send({
            email: 'x@bad.example',
            displayName: 'X',
            role: 'owner',
            password: 'long-enough-1',
            currentPassword: PASSWORD,
          }),
      400,
      'invalid_request',
    );
    await refused(
      () =>
        admin
          .post('/api/users')
          .send({
            email: 'x@bad.example',
            displayName: 'X',
            role: 'viewer',
            password: 'short',
            currentPassword: PASSWORD,
          }),
      400,
      'invalid_request',
    );
  });

  it('oversize body: 413 payload_too_large', async () => {
    const design = { format: 'tackline.spool', padding: 'x'.repeat(100_000) };
    await refused(
      () => admin.put(`/api/spools/${spoolId}/draft`).send({ design, version: 1 }),
      413,
      'payload_too_large',
    );
  });

  it('bad ids in the path: 400 invalid_request, for every kind of record', async () => {
    for (const path of [
      '/api/jobs/123',
      '/api/spools/not-a-uuid',
      `/api/spools/${spoolId}/revisions/xyz`,
      '/api/users/1',
    ]) {
      await refused(() => admin.get(path), 400, 'invalid_request');
    }
    await refused(
      () => admin.patch('/api/jobs/%27%20OR%201%3D1').send({ title: 'x', version: 1 }),
      400,
      'invalid_request',
    );
  });

  it('well-formed ids that do not exist: 404 not_found', async () => {
    const none = '3f1c2b9a-0d4e-4c1b-9a7e-2b6c8d0e1f23';
    await refused(() => admin.get(`/api/jobs/${none}`), 404, 'not_found');
    await refused(
      () => admin.post(`/api/jobs/${none}/spools`).send({ mark: 'A-1', lineNumber: 'L' }),
      404,
      'not_found',
    );
    await refused(() => admin.get(`/api/spools/${spoolId}/revisions/${none}`), 404, 'not_found');
  });

  it('list queries: unknown sort field, page size over 100, unknown parameter: 400', async () => {
    await refused(() => admin.get('/api/jobs?sort=passwordHash'), 400, 'invalid_request');
    await refused(() => admin.get('/api/jobs?pageSize=1000'), 400, 'invalid_request');
    await refused(() => admin.get('/api/jobs?page=0'), 400, 'invalid_request');
    await refused(() => admin.get(`/api/jobs/${jobId}/spools?where=1`), 400, 'invalid_request');
  });

  it('a design that is not a spool design: 422 with the issues, the draft unchanged', async () => {
    const res = await refused(
      () => admin.put(`/api/spools/${spoolId}/draft`).send({ design: { nodes: [] }, version: 1 }),
      422,
      'unprocessable',
    );
    expect(res.body.error?.details?.issues?.length).toBeGreaterThan(0);
  });

  it('unknown API paths: 404 in the error shape', async () => {
    await refused(() => admin.get('/api/nothing-here'), 404, 'not_found');
    await refused(() => admin.delete(`/api/jobs/${jobId}`), 404, 'not_found');
  });

  it('a duplicate job number (any case) or spool mark: 409 duplicate', async () => {
    const job = await createJob(db.dataSource, shop, { number: 'DUP-1' });
    await refused(() => admin.post('/api/jobs').send({ ...validJob(), number: 'dup-1' }), 409, 'duplicate');
    const { spool } = await createSpool(db.dataSource, shop, job, { mark: 'M-1' });
    await refused(
      () => admin.post(`/api/jobs/${job.id}/spools`).send({ mark: 'm-1', lineNumber: 'L' }),
      409,
      'duplicate',
    );
    expect(spool.id).toBeTruthy();
  });
});
