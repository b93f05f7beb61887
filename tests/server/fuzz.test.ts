import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spoolDesignSchema } from '../../shared/schemas/spool-design.schema';
import { createShop, PASSWORD, type Shop } from './helpers/fixtures';
import { ROUTES, type RouteCase } from './helpers/route-table';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

/**
 * Seeded fuzzing of every route: valid requests with one part made hostile (NUL, lone
 * surrogates, huge or non-finite numbers, wrong types, bad percent-encoding, bodies that
 * are not JSON…). Bounded by a request count and a wall-clock budget. Asserts: no 5xx,
 * every answer in time, the records consistent afterwards, and every stored revision's
 * sheet renders. FUZZ_SEED / FUZZ_REQUESTS override the defaults.
 */
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);
const MAX_REQUESTS = Number(process.env.FUZZ_REQUESTS ?? 2000);
const BUDGET_MS = 150_000;
const PER_REQUEST_TIMEOUT_MS = 15_000;

/** mulberry32: a small seeded PRNG, so a failing run can be replayed with its seed. */
function prng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (n: number) => Math.floor(next() * n),
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)]!,
    chance: (p: number) => next() < p,
  };
}
type Rng = ReturnType<typeof prng>;

const HOSTILE_STRINGS = [
  '',
  ' ',
  'a\u0000b',
  '\u0000',
  'x\uD800',
  '\uDC00y',
  '\uFFFE',
  '😀'.repeat(50),
  'x'.repeat(5000),
  '%zz',
  '../../etc/passwd',
  '<script>alert(1)</script>',
  "'; DROP TABLE job; --",
  'A'.repeat(300),
  '\u202Eevil',
  'ſ',
];
const HOSTILE_NUMBERS = [0, -0, -1, 1.5, 1e200, -1e200, 2 ** 53 + 1, 1e-320, 4e9, -4e9, 65536];
const HOSTILE_OTHER: unknown[] = [null, true, false, [], {}, [[[[[[]]]]]], { a: { b: { c: 1 } } }, ['x']];

function hostileValue(rng: Rng): unknown {
  const kind = rng.int(3);
  if (kind === 0) return rng.pick(HOSTILE_STRINGS);
  if (kind === 1) return rng.pick(HOSTILE_NUMBERS);
  return structuredClone(rng.pick(HOSTILE_OTHER));
}

/** Every path to a leaf (or a container) of a JSON value. */
function paths(value: unknown, prefix: Array<string | number> = [], out: Array<Array<string | number>> = []) {
  out.push(prefix);
  if (Array.isArray(value)) value.forEach((v, i) => paths(v, [...prefix, i], out));
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) paths(v, [...prefix, k], out);
  return out;
}

function setAt(root: unknown, at: Array<string | number>, value: unknown): unknown {
  if (at.length === 0) return value;
  let node = root as Record<string | number, unknown>;
  for (const key of at.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[at[at.length - 1]!] = value;
  return root;
}

/** A copy of `body` with one part made hostile (or a stray field, or the whole body replaced). */
function mutateBody(rng: Rng, body: unknown): unknown {
  const copy: unknown = body === undefined ? {} : structuredClone(body);
  const roll = rng.int(10);
  if (roll === 0) return hostileValue(rng);
  if (roll === 1 && copy && typeof copy === 'object') {
    return {
      ...(copy as object),
      [rng.pick(['organisationId', 'id', 'role', 'state', 'x\u0000', '__proto__'])]: hostileValue(rng),
    };
  }
  const all = paths(copy).filter((p) => p.length > 0);
  if (all.length === 0) return hostileValue(rng);
  return setAt(copy, rng.pick(all), hostileValue(rng));
}

const HOSTILE_SEGMENTS = [
  '%zz',
  '%E0%A4%A',
  '%ff',
  '%',
  '%00',
  'not-a-uuid',
  '00000000-0000-0000-0000-000000000000',
  'x'.repeat(400),
  '%ED%A0%80',
  '..',
  '%2e%2e',
];
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/g;

function mutatePath(rng: Rng, p: string): string {
  const ids = p.match(UUID);
  if (ids && rng.chance(0.8)) return p.replace(rng.pick(ids), rng.pick(HOSTILE_SEGMENTS));
  return `${p}/${rng.pick(HOSTILE_SEGMENTS)}`;
}

const QUERY_KEYS = [
  'q',
  'page',
  'pageSize',
  'sort',
  'order',
  'status',
  'includeArchived',
  'revision',
  'paper',
  'spools',
  'role',
  'active',
  'x',
];
const QUERY_VALUES = [
  'a%00b',
  '%ED%A0%80',
  '%ff',
  '-1',
  '1e308',
  '99999999999',
  'true',
  'desc',
  'A3',
  '%',
  'x'.repeat(300),
  '',
  'a,b,c',
];

function mutateQuery(rng: Rng, p: string): string {
  const parts = Array.from(
    { length: 1 + rng.int(3) },
    () => `${rng.pick(QUERY_KEYS)}=${rng.pick(QUERY_VALUES)}`,
  );
  return `${p}${p.includes('?') ? '&' : '?'}${parts.join('&')}`;
}

let db: TestDatabase;
let app: Express;
let shop: Shop;
let admin: Awaited<ReturnType<typeof signedIn>>;
let detailer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Fuzz');
  app = testApp(db.dataSource, db.url);
  admin = await signedIn(app, shop.email('admin'), PASSWORD);
  detailer = await signedIn(app, shop.email('detailer'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

const SAMPLE = JSON.parse(
  readFileSync(path.resolve(import.meta.dirname, '../../samples/cw-201-s03-return-14in.json'), 'utf8'),
) as unknown;

interface Outcome {
  route: string;
  method: string;
  path: string;
  status: number;
  body: string;
}

describe('seeded fuzz of every route', () => {
  it(`no 5xx and no hang in up to ${MAX_REQUESTS} hostile requests (seed ${SEED}); records consistent; every revision renders`, async () => {
    const rng = prng(SEED);
    const started = Date.now();
    const failures: Outcome[] = [];
    const statuses = new Map<number, number>();
    let sent = 0;
    const signedOut = request(app);

    const routes: RouteCase[] = [
      ...ROUTES,
      {
        name: 'POST /api/auth/sign-in',
        method: 'post',
        allowed: 'public',
        prepare: async () => ({
          path: '/api/auth/sign-in',
          body: { email: shop.email('viewer'), password: PASSWORD },
        }),
      },
    ];

    while (sent < MAX_REQUESTS && Date.now() - started < BUDGET_MS) {
      for (const route of routes) {
        if (sent >= MAX_REQUESTS || Date.now() - started >= BUDGET_MS) break;
        const { path: basePath, body } = await route.prepare(db.dataSource, shop, 'admin');
        // The draft routes get the richer sample design to mutate.
        const base =
          route.name === 'PUT /api/spools/:id/draft'
            ? { ...(body as object), design: structuredClone(SAMPLE) }
            : body;
        for (let k = 0; k < 12 && sent < MAX_REQUESTS; k++) {
          // Sign-in runs signed out: a signed-in agent would switch to the account it names.
          const who =
            route.allowed === 'public' || rng.chance(0.1) ? signedOut : rng.chance(0.3) ? detailer : admin;
          let p = basePath;
          let b: unknown = base;
          let raw: { type: string; text: string } | undefined;
          const roll = rng.int(10);
          if (roll < 5) b = mutateBody(rng, base);
          else if (roll < 7) p = mutatePath(rng, basePath);
          else if (roll < 8) p = mutateQuery(rng, basePath);
          else if (roll < 9)
            raw = rng.pick([
              { type: 'text/plain', text: 'x' },
              { type: 'application/x-www-form-urlencoded', text: 'title=x' },
              { type: 'application/json', text: '{"unterminated": ' },
              { type: 'application/json', text: '['.repeat(5000) },
              { type: 'application/json; charset=utf-16', text: '{}' },
            ]);
          // else: the valid request as prepared.
          const method = route.method === 'get' && rng.chance(0.05) ? 'post' : route.method;
          let req = who[method](p).timeout(PER_REQUEST_TIMEOUT_MS);
          if (raw) req = req.set('Content-Type', raw.type).send(raw.text);
          else if (method !== 'get')
            req = req.set('Content-Type', 'application/json').send(JSON.stringify(b ?? {}));
          sent++;
          let status: number;
          let text: string;
          try {
            const res = await req;
            status = res.status;
            text = res.text?.slice(0, 300) ?? '';
          } catch (error) {
            status = (error as { timeout?: number }).timeout
              ? -1
              : ((error as { status?: number }).status ?? -2);
            text = String(error);
          }
          statuses.set(status, (statuses.get(status) ?? 0) + 1);
          if (status >= 500 || status < 0)
            failures.push({ route: route.name, method, path: p, status, body: text });
        }
      }
    }

    const tally = Object.fromEntries([...statuses].sort((a, b) => a[0] - b[0]));
    console.info(
      `[fuzz] seed ${SEED}: ${sent} requests in ${Date.now() - started} ms; statuses ${JSON.stringify(tally)}`,
    );
    expect(failures.slice(0, 5), `seed ${SEED}`).toEqual([]);
    expect(sent).toBeGreaterThanOrEqual(Math.min(MAX_REQUESTS, 1000));

    // Records consistent: the links the services keep.
    const ds = db.dataSource;
    const badCurrent = await ds.query(`
        SELECT s.id FROM spool s LEFT JOIN spool_revision r ON r.id = s.current_revision_id
        WHERE s.current_revision_id IS NOT NULL AND (r.state <> 'issued' OR r.spool_id <> s.id)`);
    expect(badCurrent).toEqual([]);
    const issuedNotCurrent = await ds.query(`
        SELECT r.id FROM spool_revision r JOIN spool s ON s.id = r.spool_id
        WHERE r.state = 'issued' AND s.current_revision_id IS DISTINCT FROM r.id`);
    expect(issuedNotCurrent).toEqual([]);
    // No text was silently changed into U+FFFD or kept with a NUL.
    const replaced = await ds.query(`
        SELECT 'job' AS t, id FROM job WHERE (title || client || site || spec::text) ~ '\uFFFD'
        UNION ALL SELECT 'spool', id FROM spool WHERE line_number ~ '\uFFFD'
        UNION ALL SELECT 'revision', id FROM spool_revision WHERE (note || design::text) ~ '\uFFFD'
        UNION ALL SELECT 'user', id FROM app_user WHERE display_name ~ '\uFFFD'`);
    expect(replaced).toEqual([]);
    const orphans = await ds.query(`
        SELECT a.id FROM audit_event a WHERE a.entity_type = 'spool' AND NOT EXISTS (SELECT 1 FROM spool s WHERE s.id = a.entity_id)`);
    expect(orphans).toEqual([]);

    // Every stored revision is a valid design and its sheet renders.
    const revisions: Array<{ id: string; spool_id: string; design: unknown }> = await ds.query(
      `SELECT id, spool_id, design FROM spool_revision ORDER BY created_at`,
    );
    const unrendered: Array<{ id: string; status: number }> = [];
    for (const rev of revisions) {
      expect(spoolDesignSchema.safeParse(rev.design).success, rev.id).toBe(true);
      const res = await admin.get(`/api/spools/${rev.spool_id}/sheet.pdf?revision=${rev.id}`).timeout(60_000);
      if (res.status !== 200) unrendered.push({ id: rev.id, status: res.status });
    }
    console.info(`[fuzz] rendered the sheets of ${revisions.length} stored revisions`);
    expect(unrendered).toEqual([]);
  }, 400_000);
});
