import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/role.schema';
import { auditCount, createShop, PASSWORD, ROLES, snapshot, type Shop } from './helpers/fixtures';
import { ROUTES, type RouteCase } from './helpers/route-table';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let app: ReturnType<typeof testApp>;
const agents = {} as Record<Role, Awaited<ReturnType<typeof signedIn>>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Matrix');
  app = testApp(db.dataSource, db.url);
  for (const role of ROLES) agents[role] = await signedIn(app, shop.email(role), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

function call(
  agent: ReturnType<typeof request.agent> | ReturnType<typeof request>,
  route: RouteCase,
  path: string,
  body: unknown,
) {
  // Like the client, every request declares JSON (writes without it are refused).
  const send = (agent as ReturnType<typeof request.agent>)[route.method];
  const req = send.call(agent, path).set('Content-Type', 'application/json');
  return body === undefined ? req : req.send(body as object);
}

const cases = ROUTES.flatMap((route) => ROLES.map((role) => ({ route, role })));

describe('role × route matrix', () => {
  it('covers every route and every role', () => {
    expect(ROUTES.length).toBeGreaterThanOrEqual(22);
    expect(cases.length).toBe(ROUTES.length * ROLES.length);
  });

  it.each(cases.map((c) => [c.route.name, c.role, c] as const))(
    '%s as %s',
    async (_name, role, { route }) => {
      const { path, body } = await route.prepare(db.dataSource, shop, role);
      const allowed = route.allowed === 'public' || route.allowed.includes(role);
      const before = await snapshot(db.dataSource);
      const eventsBefore = await auditCount(db.dataSource);
      const res = await call(agents[role], route, path, body);
      if (allowed) {
        expect(res.status, JSON.stringify(res.body)).toBeGreaterThanOrEqual(200);
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
        // every write leaves an audit event (opening an already open draft writes nothing)
        if (route.method !== 'get' && route.name !== 'POST /api/spools/:id/draft') {
          expect(await auditCount(db.dataSource)).toBeGreaterThan(eventsBefore);
        }
      } else {
        expect(res.status, JSON.stringify(res.body)).toBe(403);
        expect(res.body.error.code).toBe('forbidden');
        expect(await snapshot(db.dataSource)).toBe(before);
      }
    },
  );
});

describe('without a session', () => {
  it.each(ROUTES.filter((r) => r.allowed !== 'public').map((r) => [r.name, r] as const))(
    '%s answers 401 and changes nothing',
    async (_name, route) => {
      const { path, body } = await route.prepare(db.dataSource, shop, 'admin');
      const before = await snapshot(db.dataSource);
      const res = await call(request(app), route, path, body);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
      expect(await snapshot(db.dataSource)).toBe(before);
    },
  );
});
