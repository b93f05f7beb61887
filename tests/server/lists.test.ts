import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJob, createShop, createSpool, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let viewer: Awaited<ReturnType<typeof signedIn>>;
let jobIds: Record<string, string>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Lists');
  viewer = await signedIn(testApp(db.dataSource, db.url), shop.email('viewer'), PASSWORD);
  jobIds = {};
  const specs = [
    { number: 'B-200', title: 'Boiler feed', client: 'Aster Mills', spools: 3 },
    { number: 'A-100', title: 'Chilled water', client: 'Brook Labs', spools: 1 },
    { number: 'C-300', title: 'Condensate 50% return', client: 'Aster Mills', spools: 0 },
  ];
  for (const s of specs) {
    const job = await createJob(db.dataSource, shop, { number: s.number, title: s.title, client: s.client });
    jobIds[s.number] = job.id;
    for (let i = 0; i < s.spools; i++)
      await createSpool(db.dataSource, shop, job, { mark: `${s.number}-S${i + 1}` });
  }
  await createJob(db.dataSource, shop, {
    number: 'Z-999',
    title: 'Old',
    status: 'archived',
    archivedAt: new Date(),
  });
});
afterAll(async () => {
  await db?.drop();
});

describe('GET /api/jobs', () => {
  it('sorts by number by default, leaves archived jobs out and counts spools', async () => {
    const res = await viewer.get('/api/jobs');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 25 });
    expect(
      res.body.items.map((j: { number: string; spoolCount: number }) => [j.number, j.spoolCount]),
    ).toEqual([
      ['A-100', 1],
      ['B-200', 3],
      ['C-300', 0],
    ]);
  });

  it('pages, sorts descending and filters by text (with % taken literally)', async () => {
    const page2 = await viewer.get('/api/jobs?sort=number&order=desc&pageSize=2&page=2');
    expect(page2.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(page2.body.items.map((j: { number: string }) => j.number)).toEqual(['A-100']);
    const aster = await viewer.get('/api/jobs?q=aster&sort=title');
    expect(aster.body.items.map((j: { number: string }) => j.number)).toEqual(['B-200', 'C-300']);
    const percent = await viewer.get(`/api/jobs?q=${encodeURIComponent('50%')}`);
    expect(percent.body.items.map((j: { number: string }) => j.number)).toEqual(['C-300']);
    const wildcard = await viewer.get(`/api/jobs?q=${encodeURIComponent('%')}`);
    expect(wildcard.body.total).toBe(1);
  });

  it('includes archived jobs on request', async () => {
    const all = await viewer.get('/api/jobs?includeArchived=true');
    expect(all.body.total).toBe(4);
    const archived = await viewer.get('/api/jobs?status=archived');
    expect(archived.body.items.map((j: { number: string }) => j.number)).toEqual(['Z-999']);
  });
});

describe('GET /api/jobs/:jobId/spools', () => {
  it("lists the job's spools sorted by mark with their draft, and drops archived ones from list and count", async () => {
    const res = await viewer.get(`/api/jobs/${jobIds['B-200']}/spools?order=desc`);
    expect(res.status).toBe(200);
    expect(res.body.items.map((s: { mark: string }) => s.mark)).toEqual(['B-200-S3', 'B-200-S2', 'B-200-S1']);
    expect(res.body.items[0].draft).toMatchObject({ letter: 'A', version: 1 });
    await db.dataSource.query(`UPDATE spool SET archived_at = now() WHERE mark = 'B-200-S2'`);
    const after = await viewer.get(`/api/jobs/${jobIds['B-200']}/spools`);
    expect(after.body.total).toBe(2);
    const job = await viewer.get(`/api/jobs/${jobIds['B-200']}`);
    expect(job.body.spoolCount).toBe(2);
    const withArchived = await viewer.get(`/api/jobs/${jobIds['B-200']}/spools?includeArchived=true&q=S2`);
    expect(withArchived.body.items.map((s: { mark: string }) => s.mark)).toEqual(['B-200-S2']);
  });
});
