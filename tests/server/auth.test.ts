import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SESSION_COOKIE } from '../../server/app';
import { createShop, createUser, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Auth');
});
afterAll(async () => {
  await db?.drop();
});

const app = () => testApp(db.dataSource, db.url);

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password, sets an HttpOnly SameSite=Lax session cookie and returns the user', async () => {
    const res = await request(app())
      .post('/api/auth/sign-in')
      .send({ email: shop.email('detailer'), password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({
      email: shop.email('detailer'),
      role: 'detailer',
      active: true,
      organisation: { id: shop.id, name: shop.name },
    });
    expect(res.body.user).not.toHaveProperty('passwordHash');
    expect(res.body.user.lastSignInAt).not.toBeNull();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toContain(`${SESSION_COOKIE}=`);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i);
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const res = await request(app())
      .post('/api/auth/sign-in')
      .send({ email: `  ${shop.email('viewer').toUpperCase()} `, password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('viewer');
  });

  it('gives a wrong password, an unknown e-mail and an inactive account the very same 401', async () => {
    const inactive = await createUser(db.dataSource, shop, 'fabricator', false);
    const a = app();
    const wrong = await request(a)
      .post('/api/auth/sign-in')
      .send({ email: shop.email('admin'), password: 'not-the-password' });
    const unknown = await request(a)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@nowhere.example', password: PASSWORD });
    const off = await request(a)
      .post('/api/auth/sign-in')
      .send({ email: inactive.email, password: PASSWORD });
    for (const res of [wrong, unknown, off]) {
      expect(res.status).toBe(401);
      expect(res.headers['set-cookie']).toBeUndefined();
    }
    expect(unknown.body).toEqual(wrong.body);
    expect(off.body).toEqual(wrong.body);
    expect(wrong.body.error.code).toBe('unauthenticated');
  });

  it('issues a new session id at sign-in (no session fixation)', async () => {
    const agent = request.agent(app());
    await agent
      .post('/api/auth/sign-in')
      .send({ email: shop.email('admin'), password: PASSWORD })
      .expect(200);
    const first = (await db.dataSource.query(`SELECT sid FROM session`)) as Array<{ sid: string }>;
    await agent
      .post('/api/auth/sign-in')
      .send({ email: shop.email('admin'), password: PASSWORD })
      .expect(200);
    const second = (await db.dataSource.query(`SELECT sid FROM session`)) as Array<{ sid: string }>;
    const newSids = second.map((r) => r.sid).filter((sid) => !first.some((f) => f.sid === sid));
    expect(newSids).toHaveLength(1);
    // the session the agent held before the second sign-in is gone
    expect(second.length).toBe(first.length);
  });

  it('refuses a body with unknown fields or a missing password with 400, and records nothing', async () => {
    const before = await snapshot(db.dataSource);
    const a = app();
    const extra = await request(a)
      .post('/api/auth/sign-in')
      .send({ email: shop.email('admin'), password: PASSWORD, role: 'admin' });
    const missing = await request(a)
      .post('/api/auth/sign-in')
      .send({ email: shop.email('admin') });
    expect(extra.status).toBe(400);
    expect(missing.status).toBe(400);
    expect(extra.body.error.code).toBe('invalid_request');
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('slows an account down with 429 after its limit of failures, even for the right password, until Retry-After', async () => {
    const limited = testApp(db.dataSource, db.url, { env: { SIGN_IN_MAX_ATTEMPTS: '3' } });
    const email = shop.email('inspector');
    for (let i = 0; i < 3; i++) {
      await request(limited)
        .post('/api/auth/sign-in')
        .send({ email, password: 'wrong-password' })
        .expect(401);
    }
    const blocked = await request(limited).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(blocked.headers['retry-after']).toBe('1');
    // another account from the same address is not locked by the first one's failures
    await request(limited)
      .post('/api/auth/sign-in')
      .send({ email: shop.email('viewer'), password: PASSWORD })
      .expect(200);
  });

  it('cannot be dodged by sending a different X-Forwarded-For each time', async () => {
    const limited = testApp(db.dataSource, db.url, { env: { SIGN_IN_MAX_ATTEMPTS: '2' } });
    const email = shop.email('detailer');
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) {
      const res = await request(limited)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', `203.0.113.${i + 1}`)
        .send({ email, password: 'wrong-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 429, 429]);
  });

  it('does not count successful sign-ins against the limit', async () => {
    const limited = testApp(db.dataSource, db.url, { env: { SIGN_IN_MAX_ATTEMPTS: '2' } });
    for (let i = 0; i < 4; i++) {
      await request(limited)
        .post('/api/auth/sign-in')
        .send({ email: shop.email('admin'), password: PASSWORD })
        .expect(200);
    }
  });
});

describe('GET /api/auth/me and POST /api/auth/sign-out', () => {
  it('answers 401 without a session', async () => {
    const res = await request(app()).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('returns the signed-in user, then 401 after sign-out (204) with the session removed', async () => {
    const agent = await signedIn(app(), shop.email('fabricator'), PASSWORD);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ email: shop.email('fabricator'), role: 'fabricator' });
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    await agent.get('/api/auth/me').expect(401);
    const rows = (await db.dataSource.query(
      `SELECT count(*)::int AS n FROM session WHERE sess -> 'passport' ->> 'user' = $1`,
      [shop.users.fabricator.id],
    )) as Array<{ n: number }>;
    expect(rows[0]!.n).toBe(0);
  });

  it('ends an existing session once the user is deactivated', async () => {
    const user = await createUser(db.dataSource, shop, 'detailer');
    const agent = await signedIn(app(), user.email, PASSWORD);
    await agent.get('/api/auth/me').expect(200);
    await db.dataSource.query(`UPDATE app_user SET active = false WHERE id = $1`, [user.id]);
    await agent.get('/api/auth/me').expect(401);
  });

  it('sets Secure on the cookie when the public URL is https', async () => {
    const secure = testApp(db.dataSource, db.url, {
      env: { PUBLIC_URL: 'https://tackline.kestrel.example', COOKIE_SECURE: 'auto' },
    });
    const res = await request(secure)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .send({ email: shop.email('admin'), password: PASSWORD });
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/Secure/i);
  });

  it('COOKIE_SECURE=false keeps the cookie usable over plain http behind an https public URL', async () => {
    const plain = testApp(db.dataSource, db.url, {
      env: { PUBLIC_URL: 'https://tackline.kestrel.example', COOKIE_SECURE: 'false' },
    });
    const agent = await signedIn(plain, shop.email('viewer'), PASSWORD);
    await agent.get('/api/auth/me').expect(200);
  });
});
