import { gzipSync } from 'node:zlib';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { starterDesign } from '../../server/modules/revisions/starter-design';
import { createJob, createShop, createSpool, PASSWORD, snapshot, SPEC, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let app: Express;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;
let jobId: string;
let spoolId: string;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Hostile');
  app = testApp(db.dataSource, db.url);
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

/** Sends, expects `status` in the one error shape, and checks that no row changed. */
async function refused(send: () => PromiseLike<{ status: number; body: unknown }>, status = 400) {
  const before = await snapshot(db.dataSource);
  const res = await send();
  const body = res.body as ErrorAnswer;
  expect(res.status, JSON.stringify(body)).toBe(status);
  expect(body.error?.code).toEqual(expect.any(String));
  expect(await snapshot(db.dataSource)).toBe(before);
  return body;
}

const NUL = 'a\u0000b';
const LONE_HIGH = 'a\uD800b';
const LONE_LOW = '\uDC00';

describe('bad percent-encoding in the path', () => {
  for (const path of [
    '/api/jobs/%zz',
    '/api/jobs/%E0%A4%A',
    '/api/jobs/%ff',
    '/api/jobs/%',
    '/api/spools/%C0%AF/revisions',
  ]) {
    it(`${path}: 400 signed out and signed in`, async () => {
      const out = await refused(() => request(app).get(path));
      expect(out.error?.code).toBe('invalid_request');
      const inside = await refused(() => admin.get(path));
      expect(inside.error?.code).toBe('invalid_request');
    });
  }
});

describe('NUL and lone surrogates: 400 naming the field', () => {
  const cases: Array<[string, string]> = [
    ['NUL', NUL],
    ['lone high surrogate', LONE_HIGH],
    ['lone low surrogate', LONE_LOW],
  ];
  for (const [label, bad] of cases) {
    it(`${label} in a job title, client, site and spec material`, async () => {
      const job = {
        number: `N-${Math.random().toString(36).slice(2, 8)}`,
        title: 'T',
        client: 'C',
        spec: SPEC,
      };
      for (const [field, value] of [
        ['title', { ...job, title: bad }],
        ['client', { ...job, client: bad }],
        ['site', { ...job, site: bad }],
      ] as const) {
        const body = await refused(() => admin.post('/api/jobs').send(value));
        expect(body.error?.details?.issues?.[0]?.path).toEqual([field]);
      }
      const body = await refused(() =>
        admin.post('/api/jobs').send({ ...job, spec: { ...SPEC, material: bad } }),
      );
      expect(body.error?.details?.issues?.[0]?.path).toEqual(['spec', 'material']);
      await refused(() => admin.patch(`/api/jobs/${jobId}`).send({ title: bad, version: 1 }));
    });

    it(`${label} in a spool line number, a user's display name, and a password`, async () => {
      const spool = await refused(() =>
        admin.post(`/api/jobs/${jobId}/spools`).send({ mark: 'X-1', lineNumber: bad }),
      );
      expect(spool.error?.details?.issues?.[0]?.path).toEqual(['lineNumber']);
      const user = await refused(() =>
        admin.post('/api/users').send({
          email: `n-${Math.random().toString(36).slice(2)}@${shop.slug}.example`,
          displayName: bad,
          role: 'viewer',
          password: 'a-long-password',
          currentPassword: PASSWORD,
        }),
      );
      expect(user.error?.details?.issues?.[0]?.path).toEqual(['displayName']);
      await refused(() =>
        request(app)
          .post('/api/auth/sign-in')
          .send({ email: shop.email('admin'), password: bad }),
      );
    });

    it(`${label} in a draft note and in design strings`, async () => {
      const design = starterDesign({ mark: 'X-1', lineNumber: 'CW-1' });
      const note = await refused(() =>
        admin.put(`/api/spools/${spoolId}/draft`).send({ design, note: bad, version: 1 }),
      );
      expect(note.error?.details?.issues?.[0]?.path).toEqual(['note']);
      const inDesign = await refused(() =>
        admin
          .put(`/api/spools/${spoolId}/draft`)
          .send({ design: { ...design, description: bad }, version: 1 }),
      );
      expect(inDesign.error?.details?.issues?.[0]?.path).toEqual(['design', 'description']);
      // A hostile key deep inside the document is found too.
      const deep = await refused(() =>
        admin
          .put(`/api/spools/${spoolId}/draft`)
          .send({ design: { ...design, nodes: [{ ...design.nodes[0], [bad]: 1 }] }, version: 1 }),
      );
      expect(deep.error?.details?.issues?.[0]?.path).toEqual(['design', 'nodes', 0, bad]);
      await refused(() => admin.post(`/api/spools/${spoolId}/draft/issue`).send({ note: bad }));
    });
  }
});

describe('query strings that are not UTF-8', () => {
  // %ED%A0%80 is a lone high surrogate written as UTF-8 bytes; %00 is NUL.
  for (const qs of ['q=%ED%A0%80', 'q=%ED%B0%80x', 'q=%ff', 'q=%', 'q=%E0%A4%A']) {
    it(`?${qs}: 400 naming the query string`, async () => {
      const body = await refused(() => admin.get(`/api/jobs?${qs}`));
      expect(body.error?.message).toMatch(/query string/);
    });
  }
  it('?q=%00 on every list: 400 naming q', async () => {
    for (const list of ['/api/jobs', `/api/jobs/${jobId}/spools`, '/api/users', '/api/audit-events']) {
      const body = await refused(() => admin.get(`${list}?q=a%00b`));
      expect(body.error?.details?.issues?.[0]?.path, list).toEqual(['q']);
    }
  });
});

describe('bodies that cannot be read', () => {
  it('Content-Encoding: gzip with a body that is not gzip: 400', async () => {
    await refused(() =>
      admin
        .post('/api/jobs')
        .set('Content-Type', 'application/json')
        .set('Content-Encoding', 'gzip')
        .send('{"this is": "not gzip"}'),
    );
  });

  it('a real gzip body still works', async () => {
    const body = JSON.stringify({
      number: `GZ-${Date.now().toString(36)}`,
      title: 'T',
      client: 'C',
      spec: SPEC,
    });
    const res = await admin
      .post('/api/jobs')
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .serialize((b: unknown) => b as string)
      .send(gzipSync(body) as unknown as string);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it('an unknown Content-Encoding: 415', async () => {
    await refused(
      () =>
        admin
          .post('/api/jobs')
          .set('Content-Type', 'application/json')
          .set('Content-Encoding', 'zstd-nonsense')
          .send('{}'),
      415,
    );
  });
});

describe('design coordinates and lengths stay within a plant', () => {
  it('origin.z = 1e200 is refused before it is stored', async () => {
    const design = starterDesign({ mark: 'X-1', lineNumber: 'CW-1' });
    const res = await refused(
      () =>
        admin
          .put(`/api/spools/${spoolId}/draft`)
          .send({ design: { ...design, origin: { x: 0, y: 0, z: 1e200 } }, version: 1 }),
      422,
    );
    expect(res.error?.details?.issues?.[0]?.path).toEqual(['origin', 'z']);
  });

  it('runs adding up to more than 10 km, or a direction component past 10 km, are refused', async () => {
    const design = starterDesign({ mark: 'X-1', lineNumber: 'CW-1' });
    // Twelve 1 km runs (each within the per-run maximum) in one chain: 12 km in total.
    const nodes = Array.from({ length: 13 }, (_, i) => ({
      id: `n${i}`,
      kind: 'end',
      end: { type: 'bevel' },
    }));
    const runs = Array.from({ length: 12 }, (_, i) => ({
      id: `r${i}`,
      from: `n${i}`,
      to: `n${i + 1}`,
      direction: { x: 1, y: 0, z: 0 },
      length: { mm: 1_000_000, kind: 'centre-to-centre' },
    }));
    const long = await refused(
      () =>
        admin.put(`/api/spools/${spoolId}/draft`).send({ design: { ...design, nodes, runs }, version: 1 }),
      422,
    );
    expect(long.error?.details?.issues?.[0]?.path).toEqual(['runs']);
    const far = await refused(
      () =>
        admin.put(`/api/spools/${spoolId}/draft`).send({
          design: {
            ...design,
            nodes: nodes.slice(0, 2),
            runs: [{ ...runs[0], direction: { x: 1e8, y: 0, z: 0 } }],
          },
          version: 1,
        }),
      422,
    );
    expect(far.error?.details?.issues?.[0]?.path).toEqual(['runs', 0, 'direction', 'x']);
  });
});
