import type { Express } from 'express';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_DESIGN_NODES } from '../../../shared/schemas/spool-design.schema';
import type { TacklineApp } from '../../../server/app';
import { SpoolRevisionEntity } from '../../../server/modules/revisions/spool-revision.entity';
import { createJob, createShop, createSpool, PASSWORD, type Shop } from '../helpers/fixtures';
import { createTestDatabase, type TestDatabase } from '../helpers/test-db';
import { signedIn, testApp } from '../helpers/test-app';
import { elbowChainDesign } from './helpers/elbow-chain';

let db: TestDatabase;
let app: TacklineApp;
let strict: TacklineApp;
let shop: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  app = testApp(db.dataSource, db.url) as TacklineApp;
  // Same database, a render time limit no sheet can meet.
  strict = testApp(db.dataSource, db.url, { env: { SHEET_RENDER_TIMEOUT_MS: '1' } }) as TacklineApp;
  shop = await createShop(db.dataSource, 'Limits');
});
afterAll(async () => {
  await app?.locals.sheetRenderer.close();
  await strict?.locals.sheetRenderer.close();
  await db?.drop();
});

function binary(res: request.Response, cb: (err: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

async function draftOf(agent: ReturnType<typeof request.agent>, spoolId: string) {
  const res = await agent.get(`/api/spools/${spoolId}`);
  expect(res.status).toBe(200);
  return res.body.draft as { id: string; version: number };
}

describe('design size limits and sheet render limits', () => {
  it(`refuses a draft over ${MAX_DESIGN_NODES} nodes with a 422 naming the limit, and keeps the stored draft`, async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job);
    const detailer = await signedIn(app as Express, shop.email('detailer'), PASSWORD);
    const before = await draftOf(detailer, spool.id);
    const big = await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: elbowChainDesign(MAX_DESIGN_NODES + 1), version: before.version });
    expect(big.status).toBe(422);
    expect(big.body.error.message).toContain(`at most ${MAX_DESIGN_NODES} nodes`);
    expect(big.body.error.message).toContain(`this one has ${MAX_DESIGN_NODES + 1}`);
    const stored = await db.dataSource.getRepository(SpoolRevisionEntity).findOneByOrFail({ id: before.id });
    expect((stored.design as { nodes: unknown[] }).nodes).toHaveLength(1);
    // At the limit it is stored.
    const fits = await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: elbowChainDesign(MAX_DESIGN_NODES), version: before.version });
    expect(fits.status).toBe(200);
  });

  it('answers a render over the time limit with a JSON 422 of our own, and the draft keeps working', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool } = await createSpool(db.dataSource, shop, job);
    const detailer = await signedIn(strict as Express, shop.email('detailer'), PASSWORD);
    const draft = await draftOf(detailer, spool.id);
    const saved = await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: elbowChainDesign(200), version: draft.version });
    expect(saved.status).toBe(200);
    const sheet = await detailer.get(`/api/spools/${spool.id}/sheet.pdf`);
    expect(sheet.status).toBe(422);
    expect(sheet.headers['content-type']).toMatch(/application\/json/);
    expect(sheet.body.error.code).toBe('unprocessable');
    expect(sheet.body.error.message).toMatch(/took longer than .* to draw/);
    // The draft is untouched and still saves.
    const again = await draftOf(detailer, spool.id);
    expect(again.version).toBe(saved.body.version);
    const next = await detailer
      .put(`/api/spools/${spool.id}/draft`)
      .send({ design: elbowChainDesign(20), version: again.version });
    expect(next.status).toBe(200);
    // The same spool prints where the limit allows it.
    const ok = await (
      await signedIn(app as Express, shop.email('viewer'), PASSWORD)
    )
      .get(`/api/spools/${spool.id}/sheet.pdf`)
      .buffer(true)
      .parse(binary);
    expect(ok.status).toBe(200);
    expect((ok.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });

  it('prints a revision stored before the size limits (over the limit, written directly)', async () => {
    const job = await createJob(db.dataSource, shop);
    const { spool, draft } = await createSpool(db.dataSource, shop, job);
    await db.dataSource
      .getRepository(SpoolRevisionEntity)
      .update({ id: draft.id }, { design: elbowChainDesign(MAX_DESIGN_NODES + 100) as never });
    const viewer = await signedIn(app as Express, shop.email('viewer'), PASSWORD);
    const res = await viewer.get(`/api/spools/${spool.id}/sheet.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
  });
});
