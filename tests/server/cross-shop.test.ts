import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, createShop, createSpool, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { ROUTES } from './helpers/route-table';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let kestrel: Shop;
let fenwick: Shop;
let app: ReturnType<typeof testApp>;
let fenwickAdmin: Awaited<ReturnType<typeof signedIn>>;

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/;

beforeAll(async () => {
  db = await createTestDatabase();
  kestrel = await createShop(db.dataSource, 'Kestrel');
  fenwick = await createShop(db.dataSource, 'Fenwick');
  app = testApp(db.dataSource, db.url);
  // An admin passes every role check, so only the shop boundary stands in the way.
  fenwickAdmin = await signedIn(app, fenwick.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

describe("another shop's records", () => {
  const idRoutes = ROUTES.filter((r) => r.allowed !== 'public' && r.name.includes(':'));

  it('covers every route that takes an id', () => {
    expect(idRoutes.length).toBeGreaterThanOrEqual(15);
  });

  it.each(idRoutes.map((r) => [r.name, r] as const))(
    '%s with a Kestrel id, as a Fenwick admin: 404, nothing leaked, nothing written',
    async (_name, route) => {
      const { path, body } = await route.prepare(db.dataSource, kestrel, 'admin');
      expect(path).toMatch(UUID);
      const before = await snapshot(db.dataSource);
      const req = fenwickAdmin[route.method](path);
      const res = body === undefined ? await req : await req.send(body as object);
      expect(res.status, JSON.stringify(res.body)).toBe(404);
      expect(res.body.error.code).toBe('not_found');
      expect(res.body.error.details).toBeUndefined();
      const text = JSON.stringify(res.body);
      expect(text).not.toContain(kestrel.id);
      expect(text).not.toMatch(/Kestrel|Chilled water|SP-|J-/);
      expect(await snapshot(db.dataSource)).toBe(before);
    },
  );

  it("answers a missing id and another shop's id identically", async () => {
    const job = await createJob(db.dataSource, kestrel);
    const theirs = await fenwickAdmin.get(`/api/jobs/${job.id}`);
    const none = await fenwickAdmin.get(`/api/jobs/00000000-0000-4000-8000-000000000000`);
    expect(theirs.status).toBe(404);
    expect(theirs.body).toEqual(none.body);
  });

  it('leaves other shops out of every list', async () => {
    const job = await createJob(db.dataSource, kestrel, {
      number: 'KESTREL-ONLY',
      title: 'Kestrel secret job',
    });
    await createSpool(db.dataSource, kestrel, job);
    const jobs = await fenwickAdmin.get('/api/jobs?includeArchived=true&pageSize=100');
    expect(jobs.status).toBe(200);
    expect(JSON.stringify(jobs.body)).not.toContain('KESTREL-ONLY');
    const search = await fenwickAdmin.get('/api/jobs?q=KESTREL');
    expect(search.body.total).toBe(0);
    const users = await fenwickAdmin.get('/api/users?pageSize=100');
    expect(users.status).toBe(200);
    expect(users.body.items.length).toBeGreaterThan(0);
    for (const u of users.body.items) expect(u.organisation.id).toBe(fenwick.id);
    expect(JSON.stringify(users.body)).not.toContain(kestrel.slug);
  });

  it('lets a job number and a user e-mail exist in two shops', async () => {
    await createJob(db.dataSource, kestrel, { number: 'SHARED-1' });
    const res = await fenwickAdmin.post('/api/jobs').send({
      number: 'SHARED-1',
      title: 'Same number, other shop',
      client: 'Client',
      spec: {
        material: 'ASTM A106 Gr B',
        schedule: 'STD',
        flangeClass: 150,
        rootGapMm: 3,
        sawKerfMm: 3,
        minPieceLengthMm: 100,
      },
    });
    expect(res.status).toBe(201);
    const user = await fenwickAdmin.post('/api/users').send({
      email: kestrel.email('viewer'),
      displayName: 'Same address',
      role: 'viewer',
      password: 'another-password',
      currentPassword: PASSWORD,
    });
    expect(user.status).toBe(201);
  });
});
