import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { SpoolNode } from '../../../shared/schemas/spool-design-node.schema';
import { design, EAST, NORTH, plain, run, socket, UP, wn } from './helpers/design-builder';

const half = (id: string, branchNps: string, extra: Record<string, unknown> = {}): SpoolNode =>
  ({ id, kind: 'half-coupling', branchNps, ...extra }) as SpoolNode;

// 6" header with a 1" half coupling on top and a 1" pipe up into it, open at its end.
const headerWithBranch = () =>
  design(
    [wn('f1'), half('c1', '1'), wn('f2'), plain('b')],
    [
      run('r1', 'f1', 'c1', EAST, 500, 'centre-to-face'),
      run('r2', 'c1', 'f2', EAST, 500, 'centre-to-face'),
      run('r3', 'c1', 'b', UP, 300),
    ],
    { nps: '6' },
  );

describe('pipe into a half coupling', () => {
  it('cuts the branch pipe to header radius + F + 1.6 mm gap (F: socket bottom to the face on the header)', () => {
    // NPS 6 OD 168.3 mm (B36.10M). ASME B16.11 defines the half-coupling dimension F as
    // "bottom of socket to opposite face" (its socket-welding dimensional tolerances); NPS 1
    // F = 28.5 mm (maker's B16.11 table, unconfirmed: status M). Gap 1.6 mm (B31.3
    // socket-weld figure, about 1/16 in). Pipe end from the header axis:
    // 84.15 + 28.5 + 1.6 = 114.25 mm; cut = 300 − 114.25 = 185.75 mm. Reading F as the
    // overall length (28.5 − J 12.5) put the pipe end at 101.75: 12.5 mm too long, bottomed.
    const r = computeSpool(headerWithBranch());
    expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
    const r3 = r.runs.find((x) => x.runId === 'r3')!;
    expect(r3.takeOffFromMm).toBeCloseTo(114.25, 6);
    expect(r3.pipeLengthMm).toBeCloseTo(185.75, 6);
    expect(r.pieces.find((p) => p.runIds.includes('r3'))!.cutLengthMm).toBeCloseTo(185.75, 6);
    expect(r.welds.filter((w) => w.type === 'socket' && w.nps === '1')).toHaveLength(1);
  });

  it('flags the half-coupling F as unconfirmed until it is checked against ASME B16.11', () => {
    const r = computeSpool(headerWithBranch());
    const w = r.issues.find((i) => i.code === 'standard-data-unconfirmed' && i.componentId === 'c1');
    expect(w?.severity).toBe('warning');
    expect(w?.message).toContain('half coupling F');
    expect(w?.message).toContain('28.5 mm');
  });

  it('draws the coupling F + J proud of the header', () => {
    const r = computeSpool(headerWithBranch());
    const c = r.components.find((x) => x.nodeId === 'c1')!;
    expect(c.shape).toMatchObject({ heightMm: 28.5 + 12.5 });
  });

  it('a shop gap setting moves the cut length by the difference', () => {
    const d = headerWithBranch();
    const r = computeSpool({ ...d, spec: { ...d.spec, socketGapMm: 3 } });
    expect(r.runs.find((x) => x.runId === 'r3')!.pipeLengthMm).toBeCloseTo(185.75 - 1.4, 6);
  });

  it('a half coupling larger than the table (NPS 6 on 10) is a clear missing-data error', () => {
    const r = computeSpool(
      design(
        [wn('f1'), half('c1', '6'), wn('f2'), plain('b')],
        [
          run('r1', 'f1', 'c1', EAST, 500, 'centre-to-face'),
          run('r2', 'c1', 'f2', EAST, 500, 'centre-to-face'),
          run('r3', 'c1', 'b', UP, 400),
        ],
        { nps: '10' },
      ),
    );
    const miss = r.issues.find((i) => i.code === 'standard-data-missing' && i.componentId === 'c1');
    expect(miss?.message).toContain('NPS 6');
    expect(r.runs.find((x) => x.runId === 'r3')!.pipeLengthMm).toBeNull();
  });
});

describe('socket caps', () => {
  it('stay a standard-data-missing error: no sourced B16.11 cap lengths are carried', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'c', kind: 'end', end: { type: 'socket-cap' } } as SpoolNode],
        [run('r1', 'f1', 'c', EAST, 400, 'centre-to-face')],
        { nps: '1' },
      ),
    );
    expect(r.ok).toBe(false);
    expect(r.issues.find((i) => i.code === 'standard-data-missing')?.componentId).toBe('c');
  });
});

describe('weights of socket-weld fittings (geometric estimates)', () => {
  // B16.11-2016 Class 3000 NPS 1: socket bore B 33.9, socket wall C 5.69 (average), bore D 26.7,
  // depth J 12.5, 90° A 22.5, coupling E 12.5 mm (vaibhavfitting tables). Each arm is a tube
  // of OD B + 2C from the socket face to the centre, less the socket and the bore.
  const q = Math.PI / 4;
  const od = 33.9 + 2 * 5.69;
  const arm = (beyond: number) => q * (od * od * (12.5 + beyond) - 33.9 ** 2 * 12.5 - 26.7 ** 2 * beyond);
  const kg = (mm3: number) => mm3 * 7850e-9;

  it('weighs an open half coupling on the header and puts its centroid on its axis', () => {
    const r = computeSpool(
      design(
        [wn('f1'), half('c1', '1', { orientationDeg: 0 }), wn('f2')],
        [
          run('r1', 'f1', 'c1', EAST, 500, 'centre-to-face'),
          run('r2', 'c1', 'f2', EAST, 500, 'centre-to-face'),
        ],
        { nps: '6' },
      ),
    );
    const item = r.weights.items.find((i) => i.ref === 'c1')!;
    // Overall F + J = 28.5 + 12.5 = 41 mm: socket 12.5 + 28.5 mm of bore.
    expect(item.massKg).toBeCloseTo(kg(arm(28.5)), 3);
    expect(item.massKg).toBeGreaterThan(0.1);
    expect(item.massKg).toBeLessThan(0.5);
    // On top of the header (orientation 0 = up): 84.15 + 41 / 2 above the axis.
    expect(item.centroid.z).toBeCloseTo(84.15 + 20.5, 6);
    expect(r.weights.notIncluded).toEqual([]);
  });

  it('weighs a 1" socket elbow as two arms of A + J, centroid inside the bend', () => {
    const r = computeSpool(
      design(
        [plain('a'), socket('s1'), plain('b')],
        [run('r1', 'a', 's1', EAST, 300), run('r2', 's1', 'b', NORTH, 300)],
        { nps: '1' },
      ),
    );
    const item = r.weights.items.find((i) => i.ref === 's1')!;
    expect(item.massKg).toBeCloseTo(2 * kg(arm(22.5)), 3);
    const wp = r.workPoints.find((w) => w.nodeId === 's1')!.position;
    // Arms point back west (to a) and north (to b), each centroid (A + J) / 2 = 17.5 mm out.
    expect(item.centroid.x - wp.x).toBeCloseTo(-17.5 / 2, 6);
    expect(item.centroid.y - wp.y).toBeCloseTo(17.5 / 2, 6);
  });

  it('weighs a 1" socket coupling as two sockets with half the laying length each', () => {
    const r = computeSpool(
      design(
        [plain('a'), socket('s1'), plain('b')],
        [run('r1', 'a', 's1', EAST, 300), run('r2', 's1', 'b', EAST, 300)],
        { nps: '1' },
      ),
    );
    expect(r.weights.items.find((i) => i.ref === 's1')!.massKg).toBeCloseTo(2 * kg(arm(6.25)), 3);
  });
});
