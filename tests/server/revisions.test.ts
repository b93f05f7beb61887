import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { starterDesign } from '../../server/modules/revisions/starter-design';
import { spoolDesignSchema } from '../../shared/schemas/spool-design.schema';
import { createJob, createShop, createSpool, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

let db: TestDatabase;
let shop: Shop;
let detailer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Rev');
  detailer = await signedIn(testApp(db.dataSource, db.url), shop.email('detailer'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

async function newSpool() {
  const job = await createJob(db.dataSource, shop);
  const res = await detailer
    .post(`/api/jobs/${job.id}/spools`)
    .send({ mark: 'CW-201-S03', lineNumber: 'CW-201' });
  expect(res.status).toBe(201);
  return res.body as { id: string; draft: unknown; currentRevision: unknown; status: string };
}

describe('spool revisions', () => {
  it('a new spool has no draft; POST /draft creates revision A from a valid starter design (201), then returns it (200)', async () => {
    const spool = await newSpool();
    expect(spool).toMatchObject({ status: 'drafting', draft: null, currentRevision: null });
    const created = await detailer.post(`/api/spools/${spool.id}/draft`);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ letter: 'A', state: 'draft', version: 1, issuedAt: null });
    expect(created.body.author.displayName).toBe('Rev detailer');
    expect(spoolDesignSchema.safeParse(created.body.design).success).toBe(true);
    expect(created.body.design.mark).toBe('CW-201-S03');
    const again = await detailer.post(`/api/spools/${spool.id}/draft`);
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(created.body.id);
    const after = await detailer.get(`/api/spools/${spool.id}`);
    expect(after.body.draft).toMatchObject({ id: created.body.id, letter: 'A', version: 1 });
  });

  it('issue A, draft B copies A, issue B: A superseded, spool points at B, letters newest first', async () => {
    const spool = await newSpool();
    const a = (await detailer.post(`/api/spools/${spool.id}/draft`)).body;
    const designA = { ...a.design, description: 'rev A design' };
    await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: designA, note: 'first', version: 1 })
      .expect(200);
    const issuedA = await detailer
      .post(`/api/spools/${spool.id}/draft/issue`)
      .send({ note: 'Issued for fabrication' });
    expect(issuedA.status).toBe(200);
    expect(issuedA.body).toMatchObject({ letter: 'A', state: 'issued', note: 'Issued for fabrication' });
    expect(issuedA.body.issuedAt).not.toBeNull();

    const spoolAfterA = (await detailer.get(`/api/spools/${spool.id}`)).body;
    expect(spoolAfterA).toMatchObject({
      status: 'issued',
      draft: null,
      currentRevision: { id: a.id, letter: 'A' },
    });

    const b = await detailer.post(`/api/spools/${spool.id}/draft`);
    expect(b.status).toBe(201);
    expect(b.body.letter).toBe('B');
    expect(b.body.design.description).toBe('rev A design');
    await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(200);

    const list = await detailer.get(`/api/spools/${spool.id}/revisions`);
    expect(list.body.items.map((r: { letter: string; state: string }) => [r.letter, r.state])).toEqual([
      ['B', 'issued'],
      ['A', 'superseded'],
    ]);
    expect(list.body.items[0]).not.toHaveProperty('design');
    const one = await detailer.get(`/api/spools/${spool.id}/revisions/${a.id}`);
    expect(one.body).toMatchObject({ letter: 'A', state: 'superseded' });
    expect(one.body.design.description).toBe('rev A design');
    expect((await detailer.get(`/api/spools/${spool.id}`)).body.currentRevision.letter).toBe('B');
  });

  it('saving or issuing without a draft is 404; an issued revision cannot be edited through the draft', async () => {
    const spool = await newSpool();
    const valid = starterDesign({ mark: 'CW-201-S03', lineNumber: 'CW-201' });
    await detailer.put(`/api/spools/${spool.id}/draft`).send({ design: valid, version: 1 }).expect(404);
    await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(404);
    const a = (await detailer.post(`/api/spools/${spool.id}/draft`)).body;
    await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(200);
    const res = await detailer.put(`/api/spools/${spool.id}/draft`).send({ design: a.design, version: 2 });
    expect(res.status).toBe(404);
  });

  it('the database itself refuses to change an issued revision', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job);
    const issued = (await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({})).body;
    await expect(
      db.dataSource.query(`UPDATE spool_revision SET note = 'tampered' WHERE id = $1`, [issued.id]),
    ).rejects.toThrow(/cannot be changed/);
    await expect(
      db.dataSource.query(`DELETE FROM spool_revision WHERE id = $1`, [issued.id]),
    ).rejects.toThrow(/cannot be deleted/);
  });

  it('refuses to issue a draft whose stored design is not a valid spool design (422)', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    await db.dataSource.query(`UPDATE spool_revision SET design = '{}'::jsonb WHERE id = $1`, [draft.id]);
    const res = await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({});
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('unprocessable');
  });

  it('an archived spool keeps its revisions readable but takes no new draft', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job);
    await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(200);
    await detailer.post(`/api/spools/${spool.id}/archive`).expect(200);
    await detailer.get(`/api/spools/${spool.id}/revisions`).expect(200);
    const res = await detailer.post(`/api/spools/${spool.id}/draft`);
    expect(res.status).toBe(422);
  });

  it('writes an audit event for each draft open, save and issue', async () => {
    const spool = await newSpool();
    const draft = (await detailer.post(`/api/spools/${spool.id}/draft`)).body;
    await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: draft.design, version: 1 })
      .expect(200);
    await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(200);
    const rows = await db.dataSource.query(
      `SELECT action, actor_id FROM audit_event WHERE entity_id = $1 ORDER BY at, action`,
      [draft.id],
    );
    expect(rows.map((r: { action: string }) => r.action).sort()).toEqual([
      'revision.issue',
      'revision.open-draft',
      'revision.save-draft',
    ]);
    for (const r of rows) expect(r.actor_id).toBe(shop.users.detailer.id);
  });
});
