import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SpoolEntity } from '../../server/modules/spools/spool.entity';
import type { SpoolDesign } from '../../shared/schemas/spool-design.schema';
import type { SpoolStatus } from '../../shared/schemas/spool-status.schema';
import { auditCount, createJob, createShop, PASSWORD, snapshot, type Shop } from './helpers/fixtures';
import { readPdfText } from './sheets/helpers/pdf-reading';
import { loadSample } from './sheets/helpers/sheet-fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

// Issuing a revision over a spool the bay has already worked on must hand it back explicitly:
// which stage a change undoes is common practice, no source (a new cut length means the piece
// is cut again; a turned flange or outlet means a new fit-up; a new weld means more welding).

let db: TestDatabase;
let shop: Shop;
let detailer: Agent;
let fabricator: Agent;
type Agent = Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Rework');
  const app = testApp(db.dataSource, db.url);
  detailer = await signedIn(app, shop.email('detailer'), PASSWORD);
  fabricator = await signedIn(app, shop.email('fabricator'), PASSWORD);
});
afterAll(async () => {
  await db?.drop();
});

const sample = loadSample('cw-201-s03-return-14in.json');

/** A spool issued at revision A with the sample design, then moved to `status`; draft B opened with `edit` applied. */
async function spoolAt(status: SpoolStatus, edit: (d: SpoolDesign) => void) {
  const job = await createJob(db.dataSource, shop);
  const spool = (
    await detailer.post(`/api/jobs/${job.id}/spools`).send({ mark: 'CW-201-S03', lineNumber: 'CW-201' }).expect(201)
  ).body as { id: string };
  await detailer.post(`/api/spools/${spool.id}/draft`).expect(201);
  await detailer.put(`/api/spools/${spool.id}/draft`).send({ design: sample, version: 1 }).expect(200);
  await detailer.post(`/api/spools/${spool.id}/draft/issue`).send({}).expect(200);
  await db.dataSource.getRepository(SpoolEntity).update({ id: spool.id }, { status });
  const draft = (await detailer.post(`/api/spools/${spool.id}/draft`).expect(201)).body as {
    design: SpoolDesign;
    version: number;
  };
  const design = structuredClone(draft.design);
  edit(design);
  await detailer.put(`/api/spools/${spool.id}/draft`).send({ design, version: draft.version }).expect(200);
  return spool.id;
}

const longerR4 = (d: SpoolDesign) => {
  d.runs.find((r) => r.id === 'R4')!.length.mm += 100;
};
const rolledF2 = (d: SpoolDesign) => {
  const f = d.nodes.find((n) => n.id === 'F2');
  if (f?.kind !== 'end' || f.end.type !== 'weld-neck-flange') throw new Error('fixture');
  f.end.boltRotationDeg = 0;
  f.end.mustTwoHole = false;
};

async function spool(id: string) {
  return (await detailer.get(`/api/spools/${id}`).expect(200)).body as {
    status: SpoolStatus;
    version: number;
    rework: null | { letter: string; sinceLetter: string; fromStatus: string; toStatus: string; changes: string[] };
    currentRevision: { letter: string } | null;
  };
}

function issue(agent: request.Agent, id: string, body: Record<string, unknown> = {}) {
  return agent.post(`/api/spools/${id}/draft/issue`).send(body);
}

describe('issuing over work in progress', () => {
  it('asks for confirmation naming the stage a new cut length sends a welded spool back to, writing nothing', async () => {
    const id = await spoolAt('welded', longerR4);
    const before = await snapshot(db.dataSource);
    const res = await issue(detailer, id);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('rework_confirmation_required');
    expect(res.body.error.message).toMatch(/goes back from welded to issued/);
    expect(res.body.error.details).toMatchObject({ from: 'welded', to: 'issued', letter: 'B', sinceLetter: 'A' });
    expect(res.body.error.details.changes.some((l: string) => /cut length was .*, now /.test(l))).toBe(true);
    expect(await snapshot(db.dataSource)).toBe(before);
    // Confirming another stage is not confirming this one.
    expect((await issue(detailer, id, { confirmReworkTo: 'cut' })).status).toBe(409);
    expect(await snapshot(db.dataSource)).toBe(before);
  });

  it('once confirmed: issues B, sends the spool back, flags it with what changed, and the sheet shows it', async () => {
    const id = await spoolAt('released', longerR4);
    const issued = await issue(detailer, id, { confirmReworkTo: 'issued' });
    expect(issued.status).toBe(200);
    const s = await spool(id);
    expect(s.status).toBe('issued');
    expect(s.currentRevision?.letter).toBe('B');
    expect(s.rework).toMatchObject({ letter: 'B', sinceLetter: 'A', fromStatus: 'released', toStatus: 'issued' });
    expect(s.rework!.changes.length).toBeGreaterThan(0);
    for (const line of s.rework!.changes) expect(line).not.toMatch(/\bn\d+\b/);
    const pdf = await fabricator.get(`/api/spools/${id}/sheet.pdf`).buffer(true).parse(binary);
    expect(pdf.status).toBe(200);
    const text = (await readPdfText(pdf.body as Buffer)).map((p) => p.text).join(' ');
    expect(text).toContain('CHANGED SINCE REVISION A');
    expect(text).toMatch(/REWORK: WAS RELEASED, BACK TO ISSUED/i);
  });

  it('a flange turned on a welded spool sends it back to cut (pieces stand, fit-up again)', async () => {
    const id = await spoolAt('welded', rolledF2);
    const res = await issue(detailer, id);
    expect(res.status).toBe(409);
    expect(res.body.error.details.to).toBe('cut');
    await issue(detailer, id, { confirmReworkTo: 'cut' }).expect(200);
    expect((await spool(id)).status).toBe('cut');
  });

  it('the same flange turned on a spool only cut so far needs no rework: nothing was fitted', async () => {
    const id = await spoolAt('cut', rolledF2);
    await issue(detailer, id).expect(200);
    const s = await spool(id);
    expect(s).toMatchObject({ status: 'cut', rework: null });
  });

  it('a spool not yet cut takes the new revision without confirmation or flag', async () => {
    const id = await spoolAt('issued', longerR4);
    await issue(detailer, id).expect(200);
    expect(await spool(id)).toMatchObject({ status: 'issued', rework: null });
  });

  it('a new revision that changes nothing the bay works to keeps the status and sets no flag', async () => {
    const id = await spoolAt('shipped', (d) => {
      d.description = `${d.description} (client reference added)`;
    });
    await issue(detailer, id).expect(200);
    expect(await spool(id)).toMatchObject({ status: 'shipped', rework: null });
  });

  it('a spool on hold stays on hold but is flagged', async () => {
    const id = await spoolAt('on-hold', longerR4);
    const res = await issue(detailer, id);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/stays on-hold and is flagged for rework/);
    await issue(detailer, id, { confirmReworkTo: 'on-hold' }).expect(200);
    expect(await spool(id)).toMatchObject({ status: 'on-hold', rework: { fromStatus: 'on-hold' } });
  });
});

describe('POST /api/spools/:id/rework/done', () => {
  it('the bay clears the flag (audited); stale version 409; no flag 422; detailers may not', async () => {
    const id = await spoolAt('welded', longerR4);
    await issue(detailer, id, { confirmReworkTo: 'issued' }).expect(200);
    const s = await spool(id);
    expect((await detailer.post(`/api/spools/${id}/rework/done`).send({ version: s.version })).status).toBe(403);
    expect((await fabricator.post(`/api/spools/${id}/rework/done`).send({ version: s.version - 1 })).status).toBe(409);
    const events = await auditCount(db.dataSource, 'spool.rework-done');
    const done = await fabricator.post(`/api/spools/${id}/rework/done`).send({ version: s.version });
    expect(done.status).toBe(200);
    expect(done.body.rework).toBeNull();
    expect(await auditCount(db.dataSource, 'spool.rework-done')).toBe(events + 1);
    const again = await fabricator.post(`/api/spools/${id}/rework/done`).send({ version: done.body.version });
    expect(again.status).toBe(422);
  });
});

const binary = ((res: NodeJS.ReadableStream, callback: (err: Error | null, body: Buffer) => void): void => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
}) as unknown as Parameters<request.Test['parse']>[0];
