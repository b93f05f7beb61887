import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from '../../server/modules/auth/password';
import { AuthService } from '../../server/modules/auth/auth.service';
import { writeAuditEvent } from '../../server/modules/audit/audit.service';
import { UserEntity } from '../../server/modules/users/user.entity';
import { createShop, createUser, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Throttle');
});
afterAll(async () => {
  await db?.drop();
});

// Ten failures per account, fifty per address (five times as many), as in production.
// TRUST_PROXY lets a test speak from several addresses through X-Forwarded-For.
const limited = () =>
  testApp(db.dataSource, db.url, { env: { SIGN_IN_MAX_ATTEMPTS: '10', TRUST_PROXY: 'true' } });

function attempt(app: ReturnType<typeof limited>, email: string, password: string, address = '198.51.100.7') {
  return request(app).post('/api/auth/sign-in').set('X-Forwarded-For', address).send({ email, password });
}

/** Ends every back-off as if its Retry-After had passed. */
async function waitOutBackOff(): Promise<void> {
  await db.dataSource.query(`UPDATE sign_in_failure SET blocked_until = now() - interval '1 second'`);
}

describe('sign-in back-off', () => {
  it('after ten wrong passwords slows the account down with Retry-After, then lets the right password in', async () => {
    const app = limited();
    const user = await createUser(db.dataSource, shop, 'inspector');
    for (let i = 0; i < 10; i++) await attempt(app, user.email, 'wrong-password').expect(401);
    const slowed = await attempt(app, user.email, PASSWORD);
    expect(slowed.status).toBe(429);
    expect(slowed.body.error.code).toBe('too_many_attempts');
    expect(Number(slowed.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    await waitOutBackOff();
    await attempt(app, user.email, PASSWORD).expect(200);
    // the success cleared the account's count: one more wrong password is a plain 401
    await attempt(app, user.email, 'wrong-password').expect(401);
  });

  it('fifty failures from one address at other e-mails never refuse the admin the right password from it', async () => {
    const app = limited();
    const address = '198.51.100.50';
    for (let i = 0; i < 50; i++) {
      await attempt(app, `nobody-${i}@spray.example`, 'wrong-password', address).expect(401);
    }
    await attempt(app, shop.email('admin'), PASSWORD, address).expect(200);
    // the address's own failing attempts are what gets slowed down
    const viewer = await createUser(db.dataSource, shop, 'viewer');
    const failing = await attempt(app, viewer.email, 'wrong-password', address);
    expect(failing.status).toBe(429);
    expect(Number(failing.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    // …while that account's right password from the same address still signs in
    await attempt(app, viewer.email, PASSWORD, address).expect(200);
    // and another address is not touched by this one's failures
    await attempt(app, 'nobody-x@spray.example', 'wrong-password', '198.51.100.51').expect(401);
  });

  it('ninety guesses at one account from ten addresses are slowed down after the tenth', async () => {
    const app = limited();
    const user = await createUser(db.dataSource, shop, 'detailer');
    const statuses: number[] = [];
    for (let a = 0; a < 10; a++) {
      for (let i = 0; i < 9; i++) {
        statuses.push((await attempt(app, user.email, `guess-${a}-${i}`, `203.0.113.${a + 1}`)).status);
      }
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses.every((s) => s === 401 || s === 429)).toBe(true);
    // The back-off doubles from 1 s with each failure let through, so only a few more
    // guesses are even looked at, however slow this machine is.
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(15);
  });

  it('shares the counts between server processes (two apps on one database)', async () => {
    const first = limited();
    const second = limited();
    const user = await createUser(db.dataSource, shop, 'fabricator');
    for (let i = 0; i < 5; i++) await attempt(first, user.email, 'wrong-password').expect(401);
    for (let i = 0; i < 5; i++) await attempt(second, user.email, 'wrong-password').expect(401);
    await attempt(first, user.email, PASSWORD).expect(429);
  });

  it('forgets failures older than the window and deletes their rows', async () => {
    const app = limited();
    const user = await createUser(db.dataSource, shop, 'viewer');
    for (let i = 0; i < 9; i++) await attempt(app, user.email, 'wrong-password').expect(401);
    await db.dataSource.query(
      `INSERT INTO sign_in_failure (key, failures, first_failure_at, last_failure_at)
       VALUES ('account:stale@old.example', 3, now() - interval '2 hours', now() - interval '1 hour')`,
    );
    // every failure of this account is now older than the 15-minute window
    await db.dataSource.query(
      `UPDATE sign_in_failure SET last_failure_at = now() - interval '20 minutes' WHERE key = $1`,
      [`account:${user.email}`],
    );
    await attempt(app, user.email, 'wrong-password').expect(401);
    const rows = (await db.dataSource.query(
      `SELECT key, failures FROM sign_in_failure WHERE key IN ($1, 'account:stale@old.example')`,
      [`account:${user.email}`],
    )) as Array<{ key: string; failures: number }>;
    expect(rows).toEqual([{ key: `account:${user.email}`, failures: 1 }]);
  });
});

describe('sign-in timing: the same bcrypt work on every path', () => {
  function countingService(): { service: AuthService; compares: () => number } {
    let n = 0;
    const service = new AuthService(db.dataSource, writeAuditEvent, 4, (password, hash) => {
      n++;
      return verifyPassword(password, hash);
    });
    return { service, compares: () => n };
  }

  it('makes as many comparisons for an unknown e-mail, a wrong password, a right one and an e-mail in two shops', async () => {
    const other = await createShop(db.dataSource, 'Other');
    const email = 'both.shops@throttle.example';
    for (const [s, password] of [
      [shop, 'password-in-first'],
      [other, 'password-in-second'],
    ] as const) {
      await db.dataSource.getRepository(UserEntity).save({
        organisationId: s.id,
        email,
        displayName: 'In two shops',
        role: 'viewer',
        passwordHash: await hashPassword(password, 4),
        active: true,
      });
    }
    const inactive = await createUser(db.dataSource, shop, 'viewer', false);
    const cases: Array<[string, string, string | null]> = [
      ['nobody@nowhere.example', PASSWORD, null],
      [shop.email('admin'), 'wrong-password', null],
      [shop.email('admin'), PASSWORD, shop.id],
      [inactive.email, PASSWORD, null],
      [email, 'wrong-password', null],
      [email, 'password-in-first', shop.id],
      [email, 'password-in-second', other.id],
    ];
    const counts: number[] = [];
    for (const [e, password, organisationId] of cases) {
      const { service, compares } = countingService();
      const actor = await service.verifyCredentials(e, password);
      expect(actor?.organisationId ?? null).toBe(organisationId);
      counts.push(compares());
    }
    expect(new Set(counts).size).toBe(1);
    expect(counts[0]).toBeGreaterThanOrEqual(2);
  });
});
