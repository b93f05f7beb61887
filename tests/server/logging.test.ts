import { Writable } from 'node:stream';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SESSION_COOKIE } from '../../server/app';
import { createLogger } from '../../server/common/logger';
import { createShop, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

/** Everything the server logs, as text (pino writes one JSON line per event). */
let logText = '';
const sink = new Writable({
  write(chunk: Buffer, _enc, done) {
    logText += chunk.toString();
    done();
  },
});

let db: TestDatabase;
let shop: Shop;
let app: ReturnType<typeof testApp>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Logs');
  app = testApp(db.dataSource, db.url, { logger: createLogger('info', sink) });
  // A database failure on the user insert itself: TypeORM's error then carries the INSERT's
  // parameters, the new user's password hash among them.
  await db.dataSource.query(`
    CREATE FUNCTION refuse_user_insert() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN RAISE EXCEPTION 'injected failure for the log test'; END $$;
    CREATE TRIGGER refuse_user_insert BEFORE INSERT ON app_user
      FOR EACH ROW EXECUTE FUNCTION refuse_user_insert();`);
});
afterAll(async () => {
  await db?.drop();
});

describe('server log', () => {
  it('logs a failing POST /api/users as JSON with no password, hash, session id or cookie', async () => {
    const signIn = await request(app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send({ email: shop.email('admin'), password: PASSWORD });
    expect(signIn.status).toBe(200);
    const setCookie = ([] as string[]).concat(signIn.headers['set-cookie'] ?? []);
    const cookie = setCookie.find((c) => c.startsWith(`${SESSION_COOKIE}=`))!.split(';')[0]!;
    const cookieValue = cookie.slice(SESSION_COOKIE.length + 1);
    // express-session signs "s:<id>.<signature>"; the id alone must not appear either.
    const sessionId = decodeURIComponent(cookieValue).slice(2).split('.')[0]!;
    expect(sessionId.length).toBeGreaterThan(10);

    const newPassword = 'log-test-password-7';
    const res = await request(app)
      .post('/api/users')
      .set('Content-Type', 'application/json')
      .set('Cookie', cookie)
      .send({
        email: 'new.user@logs.example',
        displayName: 'New User',
        role: 'viewer',
        password: newPassword,
        currentPassword: PASSWORD,
      });
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal_error');

    const [adminRow] = await db.dataSource.query(`SELECT password_hash FROM app_user WHERE email = $1`, [
      shop.email('admin'),
    ]);
    const lines = logText
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l) as Record<string, unknown>);
    // The failure is logged, with the database's message, so the grep below looks at a real log.
    const failure = lines.find((l) => l.msg === 'POST /api/users failed');
    expect(failure).toBeDefined();
    expect(JSON.stringify(failure)).toContain('injected failure for the log test');
    expect(lines.some((l) => (l.req as { path?: string } | undefined)?.path === '/api/auth/sign-in')).toBe(
      true,
    );

    for (const secret of [newPassword, PASSWORD, adminRow.password_hash as string, cookieValue, sessionId]) {
      expect(logText).not.toContain(secret);
    }
    expect(logText).not.toMatch(/\$2[aby]\$\d\d\$/); // no bcrypt hash of anyone
    expect(logText).not.toContain('"parameters"');
  });
});
