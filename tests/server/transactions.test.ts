import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditWriter } from '../../server/modules/audit/audit.service';
import { writeAuditEvent } from '../../server/modules/audit/audit.service';
import { createJob, createShop, createSpool, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Tx');
});
afterAll(async () => {
  await db?.drop();
});

/** An audit writer that fails on one action, after the change itself was written. */
function failingOn(action: string): AuditWriter {
  return async (m, event) => {
    if (event.action === action) throw new Error(`simulated crash while auditing ${action}`);
    await writeAuditEvent(m, event);
  };
}

describe('a crash in the middle of a multi-row write', () => {
  it('issuing revision B: supersede A, issue B, move the spool, all rolled back when the audit write fails', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job);
    const good = await signedIn(testApp(db.dataSource, db.url), shop.email('detailer'), PASSWORD);
    await good.post(`/api/spools/${spool.id}/draft/issue`).send({ note: 'A for fabrication' }).expect(200);
    await good.post(`/api/spools/${spool.id}/draft`).expect(201);

    const crashing = testApp(db.dataSource, db.url, { audit: failingOn('revision.issue') });
    const agent = await signedIn(crashing, shop.email('detailer'), PASSWORD);
    const before = await snapshot(db.dataSource);
    const res = await agent.post(`/api/spools/${spool.id}/draft/issue`).send({ note: 'B' });
    expect(res.status).toBe(500);
    expect(res.body.error).toEqual({
      code: 'internal_error',
      message: 'Something went wrong on the server. Nothing was saved.',
    });
    expect(await snapshot(db.dataSource)).toBe(before);

    const states = await db.dataSource.query(
      `SELECT letter, state FROM spool_revision WHERE spool_id = $1 ORDER BY letter`,
      [spool.id],
    );
    expect(states).toEqual([
      { letter: 'A', state: 'issued' },
      { letter: 'B', state: 'draft' },
    ]);
    // and once the fault is gone the same request goes through
    await good.post(`/api/spools/${spool.id}/draft/issue`).send({ note: 'B' }).expect(200);
  });

  it.each([
    [
      'job.create',
      'post',
      () => '/api/jobs',
      () => ({
        number: 'TX-1',
        title: 'T',
        client: 'C',
        spec: {
          material: 'ASTM A106 Gr B',
          schedule: 'STD',
          flangeClass: 150,
          rootGapMm: 3,
          sawKerfMm: 3,
          minPieceLengthMm: 100,
        },
      }),
    ],
    [
      'spool.create',
      'post',
      (ids: Ids) => `/api/jobs/${ids.job}/spools`,
      () => ({ mark: 'TX-S1', lineNumber: 'TX' }),
    ],
    [
      'spool.update',
      'patch',
      (ids: Ids) => `/api/spools/${ids.spool}`,
      () => ({ mark: 'TX-S2', version: 1 }),
    ],
    [
      'revision.save-draft',
      'put',
      (ids: Ids) => `/api/spools/${ids.spool}/draft`,
      (ids: Ids) => ({ design: ids.design, note: 'x', version: 1 }),
    ],
    [
      'user.create',
      'post',
      () => '/api/users',
      () => ({
        email: 'tx@tx.example',
        displayName: 'Tx',
        role: 'viewer',
        password: 'long-password-1',
        currentPassword: PASSWORD,
      }),
    ],
  ] as const)('%s leaves nothing behind when its audit write fails', async (action, method, path, body) => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    const ids: Ids = { job: job.id, spool: spool.id, design: draft.design };
    const agent = await signedIn(
      testApp(db.dataSource, db.url, { audit: failingOn(action) }),
      shop.email('admin'),
      PASSWORD,
    );
    const before = await snapshot(db.dataSource);
    const res = await agent[method](path(ids)).send(body(ids));
    expect(res.status).toBe(500);
    expect(await snapshot(db.dataSource)).toBe(before);
  });
});

interface Ids {
  job: string;
  spool: string;
  design: Record<string, unknown>;
}
