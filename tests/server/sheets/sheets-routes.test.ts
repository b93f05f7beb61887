import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatMm } from '../../../shared/units/length-format';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { jobSpecOverrides } from '../../../shared/engine/job-spec-overrides';
import { SpoolRevisionEntity } from '../../../server/modules/revisions/spool-revision.entity';
import { SpoolEntity } from '../../../server/modules/spools/spool.entity';
import { createJob, createShop, createSpool, PASSWORD, ROLES, type Shop } from '../helpers/fixtures';
import { createTestDatabase, type TestDatabase } from '../helpers/test-db';
import { signedIn, testApp } from '../helpers/test-app';
import { readPdfText } from './helpers/pdf-reading';
import { loadSample } from './helpers/sheet-fixtures';

let db: TestDatabase;
let app: Express;
let shop: Shop;
let other: Shop;

beforeAll(async () => {
  db = await createTestDatabase();
  app = testApp(db.dataSource, db.url, { env: { PUBLIC_URL: 'https://tackline.example' } });
  shop = await createShop(db.dataSource, 'Sheets');
  other = await createShop(db.dataSource, 'Elsewhere');
});
afterAll(async () => {
  await db?.drop();
});

/** A spool whose draft holds a sample design; `issued` adds an issued revision A (draft becomes B). */
async function sampleSpool(target: Shop, opts: { issued?: boolean; units?: 'mm' | 'ft-in' } = {}) {
  const ds = db.dataSource;
  const job = await createJob(ds, target, { units: opts.units ?? 'mm' });
  const { spool, draft } = await createSpool(ds, target, job, { mark: 'CW-201-S03' });
  const design = loadSample('cw-201-s03-return-14in.json');
  await ds.getRepository(SpoolRevisionEntity).update({ id: draft.id }, { design: design as never });
  let issuedId: string | null = null;
  if (opts.issued) {
    // Revision A issued (with a different design note), then a new draft B.
    await ds
      .getRepository(SpoolRevisionEntity)
      .update(
        { id: draft.id },
        { state: 'issued', issuedAt: new Date('2026-11-30T10:00:00Z'), note: 'First issue' },
      );
    await ds
      .getRepository(SpoolEntity)
      .update({ id: spool.id }, { currentRevisionId: draft.id, status: 'issued' });
    issuedId = draft.id;
    const b = await ds.getRepository(SpoolRevisionEntity).save({
      organisationId: target.id,
      spoolId: spool.id,
      letter: 'B',
      state: 'draft',
      design: design as unknown as Record<string, unknown>,
      note: 'Working on B',
      authorId: target.users.detailer.id,
    });
    return { job, spool, draftId: b.id, issuedId, design };
  }
  return { job, spool, draftId: draft.id, issuedId, design };
}

function expectJsonError(res: request.Response, status: number, code: string) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/application\/json/);
  expect(res.body.error.code).toBe(code);
}

describe('GET /api/spools/:id/sheet.pdf', () => {
  it('gives every role the PDF, with the engine cut lengths in it', async () => {
    const { spool, design, job } = await sampleSpool(shop);
    const result = computeSpool(design, { jobSpec: jobSpecOverrides(job.spec as never) });
    for (const role of ROLES) {
      const agent = await signedIn(app, shop.email(role), PASSWORD);
      const res = await agent.get(`/api/spools/${spool.id}/sheet.pdf`).buffer(true).parse(binary);
      expect(res.status, role).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      expect(res.headers['content-disposition']).toContain('CW-201-S03-rev-A-draft.pdf');
      const pdf = res.body as Buffer;
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      if (role === 'viewer') {
        const text = (await readPdfText(pdf)).map((p) => p.text).join(' ');
        for (const piece of result.pieces) expect(text).toContain(formatMm(piece.cutLengthMm!));
        expect(text).toContain('DRAFT — revision A is not issued');
      }
    }
  });

  it('prints the latest issued revision by default, and the draft when asked by id', async () => {
    const { spool, draftId } = await sampleSpool(shop, { issued: true });
    const agent = await signedIn(app, shop.email('fabricator'), PASSWORD);
    const issued = await agent.get(`/api/spools/${spool.id}/sheet.pdf?paper=A4`).buffer(true).parse(binary);
    expect(issued.status).toBe(200);
    expect(issued.headers['content-disposition']).toContain('CW-201-S03-rev-A.pdf');
    const issuedText = (await readPdfText(issued.body as Buffer)).map((p) => p.text).join(' ');
    expect(issuedText).toContain('ISSUED FOR FABRICATION');
    expect(issuedText).not.toContain('DRAFT — revision');
    const draft = await agent
      .get(`/api/spools/${spool.id}/sheet.pdf?revision=${draftId}`)
      .buffer(true)
      .parse(binary);
    expect(draft.status).toBe(200);
    expect(draft.headers['content-disposition']).toContain('rev-B-draft');
    // B is compared with A, the issued revision before it (same design here: nothing changed).
    const draftText = (await readPdfText(draft.body as Buffer)).map((p) => p.text).join(' ');
    expect(draftText).toContain('CHANGED SINCE REVISION A');
    expect(draftText).toContain('No change to any component, run, cut length');
  });

  it('marks a superseded revision, asked for by id, with the revision that replaced it', async () => {
    const { spool, issuedId, draftId } = await sampleSpool(shop, { issued: true });
    const ds = db.dataSource;
    // Issue B: A becomes superseded.
    await ds.getRepository(SpoolRevisionEntity).update({ id: issuedId! }, { state: 'superseded' });
    await ds
      .getRepository(SpoolRevisionEntity)
      .update({ id: draftId }, { state: 'issued', issuedAt: new Date('2026-12-01T08:00:00Z') });
    await ds.getRepository(SpoolEntity).update({ id: spool.id }, { currentRevisionId: draftId });
    const agent = await signedIn(app, shop.email('inspector'), PASSWORD);
    const res = await agent
      .get(`/api/spools/${spool.id}/sheet.pdf?revision=${issuedId}`)
      .buffer(true)
      .parse(binary);
    expect(res.status).toBe(200);
    const pages = await readPdfText(res.body as Buffer);
    for (const p of pages) expect(p.text).toContain('SUPERSEDED by revision B');
    const current = await agent.get(`/api/spools/${spool.id}/sheet.pdf`).buffer(true).parse(binary);
    expect(current.headers['content-disposition']).toContain('CW-201-S03-rev-B.pdf');
  });

  it('still prints a design with engine errors, marked NOT FOR FABRICATION with the errors listed', async () => {
    const { spool, draftId, design } = await sampleSpool(shop);
    const broken = structuredClone(design);
    broken.runs[0]!.length = { mm: 10, kind: 'centre-to-face' };
    await db.dataSource
      .getRepository(SpoolRevisionEntity)
      .update({ id: draftId }, { design: broken as never });
    const agent = await signedIn(app, shop.email('fabricator'), PASSWORD);
    const res = await agent.get(`/api/spools/${spool.id}/sheet.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = (await readPdfText(res.body as Buffer)).map((p) => p.text).join(' ');
    expect(text).toContain('NOT FOR FABRICATION');
    const errors = computeSpool(broken).issues.filter((i) => i.severity === 'error');
    expect(errors.length).toBeGreaterThan(0);
    for (const e of errors) expect(text.replace(/\s+/g, '')).toContain(e.message.replace(/\s+/g, ''));
  });

  it('answers an unknown spool, another shop’s spool or revision with a 404 JSON error', async () => {
    const mine = await sampleSpool(shop);
    const theirs = await sampleSpool(other);
    const agent = await signedIn(app, shop.email('admin'), PASSWORD);
    expectJsonError(
      await agent.get('/api/spools/00000000-0000-4000-8000-000000000000/sheet.pdf'),
      404,
      'not_found',
    );
    expectJsonError(await agent.get(`/api/spools/${theirs.spool.id}/sheet.pdf`), 404, 'not_found');
    expectJsonError(
      await agent.get(`/api/spools/${mine.spool.id}/sheet.pdf?revision=${theirs.draftId}`),
      404,
      'not_found',
    );
  });

  it('refuses bad queries with 400 and anonymous callers with 401, as JSON', async () => {
    const { spool } = await sampleSpool(shop);
    const agent = await signedIn(app, shop.email('inspector'), PASSWORD);
    expectJsonError(await agent.get(`/api/spools/${spool.id}/sheet.pdf?paper=A0`), 400, 'invalid_request');
    expectJsonError(
      await agent.get(`/api/spools/${spool.id}/sheet.pdf?revision=nope`),
      400,
      'invalid_request',
    );
    expectJsonError(await agent.get(`/api/spools/${spool.id}/sheet.pdf?colour=red`), 400, 'invalid_request');
    expectJsonError(await agent.get('/api/spools/not-a-uuid/sheet.pdf'), 400, 'invalid_request');
    expectJsonError(await request(app).get(`/api/spools/${spool.id}/sheet.pdf`), 401, 'unauthenticated');
  });
});

describe('GET /api/jobs/:id/saw-list.pdf', () => {
  it('lists the chosen spools’ pieces, and refuses spools of another job or shop with 404', async () => {
    const a = await sampleSpool(shop);
    const theirs = await sampleSpool(other);
    const agent = await signedIn(app, shop.email('fabricator'), PASSWORD);
    const res = await agent
      .get(`/api/jobs/${a.job.id}/saw-list.pdf?spools=${a.spool.id}&paper=Tabloid`)
      .buffer(true)
      .parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = (await readPdfText(res.body as Buffer)).map((p) => p.text).join(' ');
    const result = computeSpool(a.design, { jobSpec: jobSpecOverrides(a.job.spec as never) });
    for (const piece of result.pieces) expect(text).toContain(formatMm(piece.cutLengthMm!));
    const b = await sampleSpool(shop);
    expectJsonError(
      await agent.get(`/api/jobs/${a.job.id}/saw-list.pdf?spools=${b.spool.id}`),
      404,
      'not_found',
    );
    expectJsonError(
      await agent.get(`/api/jobs/${a.job.id}/saw-list.pdf?spools=${theirs.spool.id}`),
      404,
      'not_found',
    );
    expectJsonError(await agent.get(`/api/jobs/${theirs.job.id}/saw-list.pdf`), 404, 'not_found');
    expectJsonError(await agent.get(`/api/jobs/${a.job.id}/saw-list.pdf?spools=1,2`), 400, 'invalid_request');
  });

  it('takes every open spool of the job when none are named', async () => {
    const a = await sampleSpool(shop);
    const agent = await signedIn(app, shop.email('viewer'), PASSWORD);
    const res = await agent.get(`/api/jobs/${a.job.id}/saw-list.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const text = (await readPdfText(res.body as Buffer)).map((p) => p.text).join(' ');
    expect(text).toContain('CW-201-S03 rev A');
  });
});

// supertest buffers unknown types as text; collect the raw PDF bytes instead.
const binary = ((res: NodeJS.ReadableStream, callback: (err: Error | null, body: Buffer) => void): void => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
}) as unknown as Parameters<request.Test['parse']>[0];
