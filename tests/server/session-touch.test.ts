import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createShop, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

// Every API read used to cost an UPDATE of the session row (the rolling idle expiry) and two
// queries for the user and their shop; reads now touch the session at most once a minute and
// load the user with one query.

let db: TestDatabase;
let shop: Shop;
beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Touch');
});
afterAll(async () => {
  await db?.drop();
});

describe('queries per signed-in read', () => {
  it('ten reads in a row write the session row at most once and read the user once each', async () => {
    const agent = await signedIn(testApp(db.dataSource, db.url), shop.email('viewer'), PASSWORD);
    await agent.get('/api/auth/me').expect(200);
    const seen: string[] = [];
    const original = pg.Client.prototype.query;
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      const first = args[0] as string | { text?: string };
      seen.push(typeof first === 'string' ? first : (first.text ?? ''));
      return (original as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof original;
    try {
      for (let i = 0; i < 10; i++) await agent.get('/api/auth/me').expect(200);
    } finally {
      pg.Client.prototype.query = original;
    }
    expect(seen.filter((q) => /UPDATE "session"/.test(q)).length).toBeLessThanOrEqual(1);
    expect(seen.filter((q) => /FROM app_user u JOIN organisation/.test(q)).length).toBe(10);
    expect(seen.filter((q) => /FROM "organisation"/.test(q)).length).toBe(0);
  });
});
