import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, createShop, PASSWORD, snapshot, SPEC, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

// A job in a class Tackline has no ASME B16.5 table for used to be printed as Class 150.
// The API now refuses it, naming the supported classes, and stores nothing.

let db: TestDatabase;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Classes');
  admin = await signedIn(testApp(db.dataSource, db.url), shop.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

interface ErrorAnswer {
  error?: {
    code: string;
    message: string;
    details?: { issues?: Array<{ path: PropertyKey[]; message: string }> };
  };
}

const job = (flangeClass: unknown) => ({
  number: `FC-${Math.random().toString(36).slice(2, 8)}`,
  title: 'Class check',
  client: 'Invented Client Ltd',
  spec: { ...SPEC, flangeClass },
});

describe('flange classes without tables are refused by the API', () => {
  it.each([400, 900, 1500, 2500, 125, '600', null])(
    'POST /api/jobs with class %j: 400, nothing stored',
    async (cls) => {
      const before = await snapshot(db.dataSource);
      const res = await admin.post('/api/jobs').send(job(cls));
      const body = res.body as ErrorAnswer;
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(body.error?.code).toBe('invalid_request');
      const issue = body.error?.details?.issues?.find((i) => i.path.join('.') === 'spec.flangeClass');
      expect(issue?.message).toMatch(/Classes 150, 300 and 600/);
      if (typeof cls === 'number') expect(issue?.message).toContain(`Class ${cls} is not supported`);
      expect(await snapshot(db.dataSource)).toBe(before);
    },
  );

  it('PATCH to Class 900: 400, the job keeps its class', async () => {
    const created = await createJob(db.dataSource, shop);
    const before = await snapshot(db.dataSource);
    const res = await admin
      .patch(`/api/jobs/${created.id}`)
      .send({ spec: { ...SPEC, flangeClass: 900 }, version: created.version });
    expect(res.status).toBe(400);
    expect((res.body as ErrorAnswer).error?.details?.issues?.[0]?.message).toMatch(
      /Class 900 is not supported/,
    );
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('Class 600 is accepted and stored as 600', async () => {
    const res = await admin.post('/api/jobs').send(job(600));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect((res.body as { spec: { flangeClass: number } }).spec.flangeClass).toBe(600);
  });
});
