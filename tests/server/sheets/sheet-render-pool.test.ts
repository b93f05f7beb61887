import { afterEach, describe, expect, it } from 'vitest';
import { AppError } from '../../../server/common/app-error';
import type { SheetRenderJob } from '../../../server/modules/sheets/render/sheet-render-job';
import { PooledSheetRenderer } from '../../../server/modules/sheets/render/sheet-render-pool';
import type { SheetRenderLimits } from '../../../server/modules/sheets/render/sheet-render-limits';
import { elbowChainDesign } from './helpers/elbow-chain';
import { loadSample, testHeader } from './helpers/sheet-fixtures';

const LIMITS: SheetRenderLimits = {
  threads: 1,
  timeoutMs: 60_000,
  memoryMb: 512,
  queueLength: 8,
  waitMs: 60_000,
};

function job(design: unknown, mark = 'T-1'): SheetRenderJob {
  return {
    kind: 'spool-sheet',
    header: testHeader(mark, 'draft'),
    design,
    previous: null,
    jobSpec: {},
    units: 'mm',
    paper: 'A3',
  };
}

const open: PooledSheetRenderer[] = [];
function renderer(limits: Partial<SheetRenderLimits>): PooledSheetRenderer {
  const r = new PooledSheetRenderer({ ...LIMITS, ...limits });
  open.push(r);
  return r;
}
afterEach(async () => {
  await Promise.all(open.splice(0).map((r) => r.close()));
});

async function refusal(p: Promise<unknown>): Promise<AppError> {
  const err = await p.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

describe('sheet rendering on worker threads', () => {
  it('draws a sample sheet on a render thread', async () => {
    const out = await renderer({}).render(job(loadSample('cw-201-s03-return-14in.json')));
    expect(out.pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(out.pageCount).toBeGreaterThan(1);
  });

  it('stops a render over the time limit with a 422 that says so', async () => {
    const r = renderer({ timeoutMs: 50 });
    const err = await refusal(r.render(job(elbowChainDesign(400))));
    expect(err.status).toBe(422);
    expect(err.message).toMatch(/longer than 0\.05 s/);
    expect(err.message).toMatch(/Nothing was changed/);
    expect(err.details).toEqual({ limit: 'time', limitMs: 50 });
    // The stopped thread is replaced; a render that fits the limit goes through.
    const quick = renderer({ timeoutMs: 60_000 });
    await expect(quick.render(job(loadSample('cw-201-s03-return-14in.json')))).resolves.toHaveProperty(
      'pageCount',
    );
  });

  it('stops a render over the memory limit with a 422 that says so, and the pool still works', async () => {
    const r = renderer({ memoryMb: 64 });
    // A 5,000-node design (stored before the size limits) needs far more than 64 MB to draw.
    const err = await refusal(r.render(job(elbowChainDesign(5000))));
    expect(err.status).toBe(422);
    expect(err.message).toMatch(/more than 64 MB/);
    expect(err.details).toEqual({ limit: 'memory', limitMb: 64 });
    // The thread that ran out is replaced: a small sheet still draws.
    const out = await r.render(job(loadSample('cw-201-s03-return-14in.json')));
    expect(out.pageCount).toBeGreaterThan(1);
  });

  it('turns a request away with 503 when the queue is full, and serves the ones it took', async () => {
    const r = renderer({ threads: 1, queueLength: 1 });
    const design = loadSample('cw-201-s03-return-14in.json');
    const results = await Promise.allSettled([
      r.render(job(design)),
      r.render(job(design)),
      r.render(job(design)),
    ]);
    expect(results.map((x) => x.status)).toEqual(['fulfilled', 'fulfilled', 'rejected']);
    const third = (results[2] as PromiseRejectedResult).reason as AppError;
    expect(third.status).toBe(503);
    expect(third.code).toBe('service_unavailable');
    expect(third.message).toMatch(/busy/);
  });

  it('turns a request away with 503 when no thread frees up within the wait limit', async () => {
    const r = renderer({ threads: 1, queueLength: 4, waitMs: 1 });
    const design = loadSample('cw-201-s03-return-14in.json');
    const results = await Promise.allSettled([r.render(job(design)), r.render(job(design))]);
    expect(results[0]!.status).toBe('fulfilled');
    expect(((results[1] as PromiseRejectedResult).reason as AppError).status).toBe(503);
  });

  it('answers a stored design that no longer validates with 422, not a crash', async () => {
    const err = await refusal(renderer({}).render(job({ format: 'tackline.spool', version: 1, nodes: 'x' })));
    expect(err.status).toBe(422);
    expect(err.message).toMatch(/does not hold a valid spool design/);
  });

  it('still prints a valid design stored before the size limits (over 500 nodes)', async () => {
    const out = await renderer({}).render(job(elbowChainDesign(600)));
    expect(out.pageCount).toBeGreaterThan(1);
  });
});
