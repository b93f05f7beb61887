import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createShop, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { ROUTES } from './helpers/route-table';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let app: Express;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;

const PUBLIC_URL = 'http://tackline.shop.example:4717';

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Csrf');
  app = testApp(db.dataSource, db.url, { env: { PUBLIC_URL } });
  admin = await signedIn(app, shop.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

const WRITES = ROUTES.filter((r) => r.method !== 'get');

/** What a page on another port of the same host (same site) can make a browser send. */
const FORGERIES: Array<{ name: string; headers: Record<string, string>; body?: string; status: number }> = [
  {
    name: 'text/plain form',
    headers: {
      'Content-Type': 'text/plain',
      Origin: 'http://tackline.shop.example:8080',
      'Sec-Fetch-Site': 'same-site',
    },
    body: '{"x":1}',
    status: 400,
  },
  {
    name: 'urlencoded form',
    headers: {
      'Content-Type': 'application/x-www-form-urlencoded',
      Origin: 'http://tackline.shop.example:8080',
    },
    body: 'a=1',
    status: 400,
  },
  {
    name: 'no-cors fetch without a body (Content-Length: 0)',
    headers: {
      Origin: 'http://tackline.shop.example:8080',
      'Sec-Fetch-Site': 'same-site',
      'Content-Length': '0',
    },
    status: 400,
  },
  { name: 'bodiless request with no headers at all', headers: { 'Content-Length': '0' }, status: 400 },
  {
    name: 'JSON from another port (Origin only)',
    headers: { 'Content-Type': 'application/json', Origin: 'http://tackline.shop.example:8080' },
    body: '{}',
    status: 403,
  },
  {
    name: 'JSON marked same-site by the browser',
    headers: { 'Content-Type': 'application/json', 'Sec-Fetch-Site': 'same-site' },
    body: '{}',
    status: 403,
  },
  {
    name: 'JSON marked cross-site by the browser',
    headers: {
      'Content-Type': 'application/json',
      'Sec-Fetch-Site': 'cross-site',
      Origin: 'https://elsewhere.example',
    },
    body: '{}',
    status: 403,
  },
  {
    name: 'JSON from an opaque origin',
    headers: { 'Content-Type': 'application/json', Origin: 'null' },
    body: '{}',
    status: 403,
  },
];

describe('writes that do not come from Tackline pages are refused and change nothing', () => {
  for (const forgery of FORGERIES) {
    it.each(WRITES.map((r) => [r.name, r] as const))(`${forgery.name}: %s`, async (_name, route) => {
      const { path } = await route.prepare(db.dataSource, shop, 'admin');
      const before = await snapshot(db.dataSource);
      // The signed-in agent (session cookie) without its default JSON Content-Type.
      let req = admin[route.method](path).unset('Content-Type');
      for (const [k, v] of Object.entries(forgery.headers)) req = req.set(k, v);
      const res = await (forgery.body !== undefined ? req.send(forgery.body) : req);
      expect(res.status, JSON.stringify(res.body)).toBe(forgery.status);
      expect(await snapshot(db.dataSource)).toBe(before);
    });
  }

  it('sign-in and sign-out are guarded too', async () => {
    const other = 'http://tackline.shop.example:8080';
    const signIn = await request(app)
      .post('/api/auth/sign-in')
      .set('Origin', other)
      .send({ email: shop.email('viewer'), password: PASSWORD });
    expect(signIn.status).toBe(403);
    const signOut = await admin.post('/api/auth/sign-out').set('Origin', other);
    expect(signOut.status).toBe(403);
    expect((await admin.get('/api/auth/me')).status).toBe(200);
  });
});

describe("Tackline's own pages still write", () => {
  it('Origin = PUBLIC_URL, Sec-Fetch-Site same-origin', async () => {
    const route = WRITES.find((r) => r.name === 'POST /api/jobs/:id/archive')!;
    const { path } = await route.prepare(db.dataSource, shop, 'admin');
    const res = await admin.post(path).set('Origin', PUBLIC_URL).set('Sec-Fetch-Site', 'same-origin');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  });

  it('Origin = the address the request was sent to (the app reached by another name)', async () => {
    const route = WRITES.find((r) => r.name === 'POST /api/jobs')!;
    const { path, body } = await route.prepare(db.dataSource, shop, 'admin');
    const res = await admin
      .post(path)
      .set('Host', '192.0.2.7:4717')
      .set('Origin', 'http://192.0.2.7:4717')
      .send(body as object);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it('a script without browser headers, declaring JSON', async () => {
    const route = WRITES.find((r) => r.name === 'POST /api/spools/:id/draft')!;
    const { path } = await route.prepare(db.dataSource, shop, 'admin');
    const res = await admin.post(path);
    expect([200, 201]).toContain(res.status);
  });
});
