import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createShop, createUser, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Lifetime');
});
afterAll(async () => {
  await db?.drop();
});

const DAY_MS = 24 * 60 * 60 * 1000;

/** Moves the stored sign-in time of `userId`'s sessions `ms` into the past. */
async function signedInAgo(userId: string, ms: number): Promise<void> {
  await db.dataSource.query(
    `UPDATE session SET sess = jsonb_set(sess::jsonb, '{signedInAt}', to_jsonb($2::bigint))::json
      WHERE sess -> 'passport' ->> 'user' = $1`,
    [userId, Date.now() - ms],
  );
}

async function sessionRows(userId: string): Promise<number> {
  const rows = (await db.dataSource.query(
    `SELECT count(*)::int AS n FROM session WHERE sess -> 'passport' ->> 'user' = $1`,
    [userId],
  )) as Array<{ n: number }>;
  return rows[0]!.n;
}

describe('absolute session lifetime', () => {
  it('refuses a session 7 days after its sign-in even while it is in use, and removes it', async () => {
    const user = await createUser(db.dataSource, shop, 'detailer');
    const agent = await signedIn(testApp(db.dataSource, db.url), user.email, PASSWORD);
    await signedInAgo(user.id, 7 * DAY_MS - 60_000);
    // a minute before the end: still fine, and the activity does not move the end
    await agent.get('/api/auth/me').expect(200);
    await agent.get('/api/auth/me').expect(200);
    await signedInAgo(user.id, 7 * DAY_MS + 1000);
    const res = await agent.get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
    expect(await sessionRows(user.id)).toBe(0);
    await agent.get('/api/jobs').expect(401);
    // signing in again starts a new lifetime
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(200);
    await agent.get('/api/auth/me').expect(200);
  });

  it('treats a signed-in session without a sign-in time as expired', async () => {
    const user = await createUser(db.dataSource, shop, 'viewer');
    const agent = await signedIn(testApp(db.dataSource, db.url), user.email, PASSWORD);
    await db.dataSource.query(
      `UPDATE session SET sess = (sess::jsonb - 'signedInAt')::json WHERE sess -> 'passport' ->> 'user' = $1`,
      [user.id],
    );
    await agent.get('/api/auth/me').expect(401);
  });

  it('takes its length from SESSION_LIFETIME_DAYS', async () => {
    const user = await createUser(db.dataSource, shop, 'inspector');
    const app = testApp(db.dataSource, db.url, { env: { SESSION_LIFETIME_DAYS: '1' } });
    const agent = await signedIn(app, user.email, PASSWORD);
    await signedInAgo(user.id, DAY_MS - 60_000);
    await agent.get('/api/auth/me').expect(200);
    await signedInAgo(user.id, DAY_MS + 1000);
    await agent.get('/api/auth/me').expect(401);
  });
});
