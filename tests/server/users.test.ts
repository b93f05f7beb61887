import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditCount, createShop, createUser, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let app: ReturnType<typeof testApp>;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Users');
  app = testApp(db.dataSource, db.url);
  admin = await signedIn(app, shop.email('admin'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

describe('user administration', () => {
  it('creates a user (e-mail lower-cased, bcrypt hash stored, never returned) who can then sign in', async () => {
    const res = await admin.post('/api/users').send({
      currentPassword: PASSWORD,
      email: 'New.Fitter@Users.Example',
      displayName: 'New Fitter',
      role: 'fabricator',
      password: 'bench-password-1',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      email: 'new.fitter@users.example',
      role: 'fabricator',
      active: true,
      lastSignInAt: null,
    });
    expect(JSON.stringify(res.body)).not.toMatch(/\$2[aby]\$/);
    const [row] = await db.dataSource.query(`SELECT password_hash FROM app_user WHERE id = $1`, [
      res.body.id,
    ]);
    expect(row.password_hash).toMatch(/^\$2[aby]\$04\$/);
    await request(app)
      .post('/api/auth/sign-in')
      .send({ email: 'new.fitter@users.example', password: 'bench-password-1' })
      .expect(200);
    const dup = await admin.post('/api/users').send({
      currentPassword: PASSWORD,
      email: 'NEW.FITTER@users.example',
      displayName: 'Again',
      role: 'viewer',
      password: 'bench-password-1',
    });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('duplicate');
  });

  it('changes a role and deactivates a user; a deactivated user is signed out and cannot sign in', async () => {
    const user = await createUser(db.dataSource, shop, 'viewer');
    const agent = await signedIn(app, user.email, PASSWORD);
    const role = await admin
      .patch(`/api/users/${user.id}`)
      .send({ currentPassword: PASSWORD, role: 'inspector' });
    expect(role.body).toMatchObject({ role: 'inspector', version: 2 });
    const me = await agent.get('/api/auth/me');
    expect(me.body.user.role).toBe('inspector');
    const off = await admin.patch(`/api/users/${user.id}`).send({ currentPassword: PASSWORD, active: false });
    expect(off.body).toMatchObject({ active: false, version: 3 });
    await agent.get('/api/auth/me').expect(401);
    await request(app).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(401);
  });

  it('an admin cannot deactivate themselves or drop their own admin role (422, nothing changed)', async () => {
    const before = await snapshot(db.dataSource);
    const off = await admin
      .patch(`/api/users/${shop.users.admin.id}`)
      .send({ currentPassword: PASSWORD, active: false });
    const demote = await admin
      .patch(`/api/users/${shop.users.admin.id}`)
      .send({ currentPassword: PASSWORD, role: 'viewer' });
    for (const res of [off, demote]) {
      expect(res.status).toBe(422);
      expect(res.body.error.code).toBe('unprocessable');
    }
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it("resets a password: the old one stops working, the user's sessions end, the new one works", async () => {
    const user = await createUser(db.dataSource, shop, 'detailer');
    const agent = await signedIn(app, user.email, PASSWORD);
    const events = await auditCount(db.dataSource, 'user.reset-password');
    await admin
      .post(`/api/users/${user.id}/reset-password`)
      .send({ currentPassword: PASSWORD, password: 'fresh-password-22' })
      .expect(204);
    await agent.get('/api/auth/me').expect(401);
    await request(app).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(401);
    await request(app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'fresh-password-22' })
      .expect(200);
    expect(await auditCount(db.dataSource, 'user.reset-password')).toBe(events + 1);
  });

  it('an admin resetting their own password stays signed in', async () => {
    const other = await createUser(db.dataSource, shop, 'admin');
    const agent = await signedIn(app, other.email, PASSWORD);
    await agent
      .post(`/api/users/${other.id}/reset-password`)
      .send({ currentPassword: PASSWORD, password: 'my-own-new-password' })
      .expect(204);
    await agent.get('/api/auth/me').expect(200);
  });

  it('lists users with role filter, search and sorting', async () => {
    const res = await admin.get('/api/users?role=admin&sort=email&order=desc');
    expect(res.status).toBe(200);
    expect(res.body.items.every((u: { role: string }) => u.role === 'admin')).toBe(true);
    const emails = res.body.items.map((u: { email: string }) => u.email);
    expect(emails).toEqual([...emails].sort().reverse());
    const search = await admin.get(`/api/users?q=${encodeURIComponent('Users inspector')}`);
    expect(search.body.items.map((u: { email: string }) => u.email)).toEqual([shop.email('inspector')]);
  });

  it('same e-mail in two shops with different passwords: each password opens its own shop', async () => {
    const other = await createShop(db.dataSource, 'Other');
    const otherAdmin = await signedIn(app, other.email('admin'), PASSWORD);
    const email = 'shared.person@twoshops.example';
    await admin
      .post('/api/users')
      .send({
        currentPassword: PASSWORD,
        email,
        displayName: 'In Users',
        role: 'viewer',
        password: 'password-for-users',
      })
      .expect(201);
    await otherAdmin
      .post('/api/users')
      .send({
        currentPassword: PASSWORD,
        email,
        displayName: 'In Other',
        role: 'viewer',
        password: 'password-for-other',
      })
      .expect(201);
    const a = await request(app).post('/api/auth/sign-in').send({ email, password: 'password-for-users' });
    const b = await request(app).post('/api/auth/sign-in').send({ email, password: 'password-for-other' });
    expect(a.body.user.organisation.id).toBe(shop.id);
    expect(b.body.user.organisation.id).toBe(other.id);
  });
});

describe("user administration asks again for the admin's own password", () => {
  /** Each write with a body that is valid apart from `currentPassword`, against fresh records. */
  async function writes() {
    const target = await createUser(db.dataSource, shop, 'viewer');
    return [
      {
        name: 'POST /api/users',
        send: (extra: object) =>
          admin.post('/api/users').send({
            email: `reauth-${Math.random().toString(36).slice(2)}@users.example`,
            displayName: 'Reauth Person',
            role: 'viewer',
            password: 'reauth-password-1',
            ...extra,
          }),
        ok: 201,
      },
      {
        name: 'PATCH /api/users/:id',
        send: (extra: object) =>
          admin.patch(`/api/users/${target.id}`).send({ role: 'inspector', active: false, ...extra }),
        ok: 200,
      },
      {
        name: 'POST /api/users/:id/reset-password',
        send: (extra: object) =>
          admin
            .post(`/api/users/${target.id}/reset-password`)
            .send({ password: 'reauth-password-2', ...extra }),
        ok: 204,
      },
    ];
  }

  it('a missing current password is 400 naming the field, and nothing is written', async () => {
    for (const w of await writes()) {
      const before = await snapshot(db.dataSource);
      const res = await w.send({});
      expect(res.status, w.name).toBe(400);
      expect(res.body.error.code).toBe('invalid_request');
      expect(res.body.error.details.issues.map((i: { path: string[] }) => i.path.join('.'))).toContain(
        'currentPassword',
      );
      expect(await snapshot(db.dataSource), w.name).toBe(before);
    }
  });

  it('a wrong current password is 403 reauthentication_failed, nothing is written, and it counts as a failed sign-in', async () => {
    const key = `account:${shop.email('admin')}`;
    const failures = async () => {
      const rows = await db.dataSource.query(`SELECT failures FROM sign_in_failure WHERE key = $1`, [key]);
      return (rows[0]?.failures as number | undefined) ?? 0;
    };
    for (const w of await writes()) {
      const before = await snapshot(db.dataSource);
      const counted = await failures();
      const res = await w.send({ currentPassword: 'not-my-password' });
      expect(res.status, w.name).toBe(403);
      expect(res.body.error.code).toBe('reauthentication_failed');
      expect(await snapshot(db.dataSource), w.name).toBe(before);
      expect(await failures(), w.name).toBe(counted + 1);
    }
    // The admin's session is untouched: a wrong password asked again is not a sign-out.
    await admin.get('/api/auth/me').expect(200);
  });

  it('the right current password lets each write through', async () => {
    for (const w of await writes()) {
      const before = await snapshot(db.dataSource);
      const res = await w.send({ currentPassword: PASSWORD });
      expect(res.status, w.name).toBe(w.ok);
      expect(await snapshot(db.dataSource), w.name).not.toBe(before);
    }
  });

  it('past the sign-in limit the account is slowed down here and at sign-in, even with the right password', async () => {
    const limited = testApp(db.dataSource, db.url, { env: { SIGN_IN_MAX_ATTEMPTS: '3' } });
    const slow = await createShop(db.dataSource, 'ReauthSlow');
    const agent = await signedIn(limited, slow.email('admin'), PASSWORD);
    const body = { password: 'slow-password-11' };
    const path = `/api/users/${slow.users.viewer.id}/reset-password`;
    for (let i = 0; i < 3; i++) {
      await agent
        .post(path)
        .send({ ...body, currentPassword: `guess-${i}` })
        .expect(403);
    }
    const before = await snapshot(db.dataSource);
    const blocked = await agent.post(path).send({ ...body, currentPassword: PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect(await snapshot(db.dataSource)).toBe(before);
    const signIn = await request(limited)
      .post('/api/auth/sign-in')
      .send({ email: slow.email('admin'), password: PASSWORD });
    expect(signIn.status).toBe(429);
  });
});
