import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { setOnBranchReach } from '../../../shared/engine/set-on-branch-geometry';
import {
  bevel,
  design,
  DOWN,
  EAST,
  elbow as elbowNode,
  NORTH,
  run,
  SOUTH,
  UP,
  wn,
  WEST,
} from './helpers/design-builder';

const runOf = (r: ReturnType<typeof computeSpool>, id: string) => r.runs.find((x) => x.runId === id)!;
const pos = (r: ReturnType<typeof computeSpool>, id: string) =>
  r.workPoints.find((w) => w.nodeId === id)!.position;

describe('set-on branches', () => {
  // Saddle depth R − √(R² − r²): NPS 4 on NPS 6 (r 57.15, R 84.15) → 22.38 mm; NPS 6 on NPS 12
  // → 23.59 mm (gera and machinecalcs saddle calculators; calcady 4-on-6 worked example 22.4 mm).
  it.each([
    [84.15, 57.15, 22.38],
    [161.9, 84.15, 23.59],
  ])(
    'the crotch is %f − √(R² − r²) shorter than the flank (header R %f, branch r %f → %f mm)',
    (R, r, depth) => {
      const reach = setOnBranchReach(R, r, 90)!;
      expect(reach.shortPointMm - reach.longPointMm).toBeCloseTo(depth, 2);
    },
  );

  it('an equal branch reaches down to the header axis at its flanks (depth = header radius)', () => {
    const reach = setOnBranchReach(84.15, 84.15, 90)!;
    expect(reach.longPointMm).toBeCloseTo(0, 6);
    expect(reach.shortPointMm).toBeCloseTo(84.15, 6);
  });

  it('an angled branch reaches further along its axis than a square one', () => {
    const square = setOnBranchReach(84.15, 57.15, 90)!;
    const angled = setOnBranchReach(84.15, 57.15, 60)!;
    expect(angled.shortPointMm).toBeGreaterThan(square.shortPointMm);
  });

  it('keeps the header one piece and cuts the branch to its flank, with the crotch length too', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'b1', kind: 'set-on-branch' }, wn('f2'), wn('f3')],
        [
          run('r1', 'f1', 'b1', EAST, 1000, 'centre-to-face'),
          run('r2', 'b1', 'f2', EAST, 1000, 'centre-to-face'),
          run('r3', 'b1', 'f3', UP, 600, 'centre-to-face', { nps: '4' }),
        ],
        { nps: '6', rootGapMm: 3 },
      ),
    );
    expect(r.ok).toBe(true);
    const header = r.pieces.find((p) => p.runIds.includes('r1'))!;
    expect(header.runIds).toEqual(['r1', 'r2']);
    const branch = r.pieces.find((p) => p.runIds.includes('r3'))!;
    // 600 − √(84.15² − 57.15²) − 3 − (WN NPS 4 face to weld end) − 3.
    const flangeTakeOff = runOf(r, 'r3').takeOffToMm!;
    expect(branch.cutLengthMm).toBeCloseTo(600 - Math.sqrt(84.15 ** 2 - 57.15 ** 2) - 6 - flangeTakeOff, 3);
    expect(branch.cutLengthMm! - branch.shortPointLengthMm!).toBeCloseTo(22.38, 2);
    expect(branch.ends[0]!.type).toBe('saddle');
    expect(r.welds.filter((w) => w.type === 'branch')).toHaveLength(1);
  });

  it('refuses a branch larger than its header', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'b1', kind: 'set-on-branch' }, wn('f2'), wn('f3')],
        [
          run('r1', 'f1', 'b1', EAST, 1000),
          run('r2', 'b1', 'f2', EAST, 1000),
          run('r3', 'b1', 'f3', UP, 600, 'centre-to-face', { nps: '10' }),
        ],
        { nps: '6' },
      ),
    );
    expect(r.issues.some((i) => i.code === 'size-mismatch' && i.componentId === 'b1')).toBe(true);
  });
});

describe('tees, reducers and returns', () => {
  it('uses run C and outlet M of an NPS 6 equal tee (143 mm, ASME B16.9)', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 't1', kind: 'tee' }, wn('f2'), wn('f3')],
        [
          run('r1', 'f1', 't1', EAST, 800, 'centre-to-face'),
          run('r2', 't1', 'f2', EAST, 800, 'centre-to-face'),
          run('r3', 't1', 'f3', SOUTH, 500, 'centre-to-face'),
        ],
        { nps: '6' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r1').takeOffToMm).toBe(143);
    expect(runOf(r, 'r3').takeOffFromMm).toBe(143);
  });

  it('refuses a tee branch that is not square to the run', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 't1', kind: 'tee' }, wn('f2'), wn('f3')],
        [
          run('r1', 'f1', 't1', EAST, 800),
          run('r2', 't1', 'f2', EAST, 800),
          run('r3', 't1', 'f3', { x: 1, y: 1, z: 0 }, 800),
        ],
        { nps: '6' },
      ),
    );
    expect(r.issues.find((i) => i.code === 'angle-not-made')?.componentId).toBe('t1');
  });

  it('takes half of a reducer length H from each side and drops the small axis of an eccentric reducer (10 × 6, H 178 mm)', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'x1', kind: 'reducer', toNps: '6', type: 'eccentric', flatSide: 'top' }, wn('f2')],
        [
          run('r1', 'f1', 'x1', EAST, 600, 'centre-to-face'),
          run('r2', 'x1', 'f2', EAST, 600, 'centre-to-face'),
        ],
        { nps: '10' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r1').takeOffToMm).toBe(89);
    expect(runOf(r, 'r2').nps).toBe('6');
    // Flat on top: the 6" axis is (273.0 − 168.3)/2 = 52.35 mm below the 10" axis (B36.10M ODs).
    expect(pos(r, 'f2').z - pos(r, 'f1').z).toBeCloseTo(-52.35, 3);
  });

  it('a reducer with the same size both ends is a size mismatch', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'x1', kind: 'reducer', toNps: '10' }, wn('f2')],
        [run('r1', 'f1', 'x1', EAST, 600), run('r2', 'x1', 'f2', EAST, 600)],
        { nps: '10' },
      ),
    );
    expect(r.issues.some((i) => i.code === 'size-mismatch')).toBe(true);
  });

  it('offsets the legs of a 180° LR return by O (NPS 6: 457 mm, ASME B16.9)', () => {
    const r = computeSpool(
      design(
        [bevel('a'), { id: 'u1', kind: 'return', offsetDirection: NORTH }, bevel('b')],
        [run('r1', 'a', 'u1', EAST, 1000), run('r2', 'u1', 'b', WEST, 1000)],
        { nps: '6' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(pos(r, 'b').y - pos(r, 'a').y).toBe(457);
    expect(pos(r, 'b').x).toBe(pos(r, 'a').x);
    expect(runOf(r, 'r1').pipeLengthMm).toBe(1000 - 3);
  });

  it('a return whose legs are not parallel is an angle no fitting makes', () => {
    const r = computeSpool(
      design(
        [bevel('a'), { id: 'u1', kind: 'return', offsetDirection: NORTH }, bevel('b')],
        [run('r1', 'a', 'u1', EAST, 1000), run('r2', 'u1', 'b', DOWN, 1000)],
        { nps: '6' },
      ),
    );
    expect(r.issues.find((i) => i.code === 'angle-not-made')?.componentId).toBe('u1');
  });
});

describe('slip-on flanges and tree shapes', () => {
  it('sets the pipe back from a slip-on face by wall + 3 mm, square cut, with two fillet welds', () => {
    const r = computeSpool(
      design(
        [{ id: 'f1', kind: 'end', end: { type: 'slip-on-flange' } }, bevel('b')],
        [run('r1', 'f1', 'b', EAST, 1000, 'centre-to-face')],
        { nps: '6' },
      ),
    );
    // NPS 6 STD wall 7.11 mm (B36.10M); setback = wall + 3 mm (common practice, no source).
    expect(runOf(r, 'r1').takeOffFromMm).toBeCloseTo(10.11, 6);
    expect(r.pieces[0]!.cutLengthMm).toBeCloseTo(1000 - 10.11, 6);
    expect(r.pieces[0]!.ends[0]!.type).toBe('square');
    expect(r.welds.filter((w) => w.type === 'slip-on-fillet')).toHaveLength(2);
  });

  it('computes a tree whose root is the branch flange of a tee', () => {
    const r = computeSpool(
      design(
        [wn('f3'), { id: 't1', kind: 'tee', branchNps: '4' }, wn('f1'), wn('f2')],
        [
          run('r3', 'f3', 't1', DOWN, 500, 'centre-to-face', { nps: '4' }),
          run('r1', 't1', 'f1', WEST, 800, 'centre-to-face', { nps: '6' }),
          run('r2', 't1', 'f2', EAST, 800, 'centre-to-face'),
        ],
      ),
    );
    expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
    expect(runOf(r, 'r2').nps).toBe('6');
    expect(pos(r, 'f2').x - pos(r, 'f1').x).toBe(1600);
    // Reducing tee 6 × 4: run C 143 mm (ASME B16.9 Table 8, as carried in shared/standards).
    expect(runOf(r, 'r1').takeOffFromMm).toBe(143);
  });

  it('computes a tree whose root is an elbow', () => {
    const r = computeSpool(
      design(
        [elbowNode('e1'), wn('f1'), wn('f2')],
        [run('r1', 'e1', 'f1', WEST, 800), run('r2', 'e1', 'f2', NORTH, 800)],
        { nps: '6' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r1').takeOffFromMm).toBe(229);
    expect(r.welds).toHaveLength(4);
  });
});

describe('small-bore connections', () => {
  it('places an open half coupling at its stated orientation around the header', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'c1', kind: 'half-coupling', branchNps: '1', orientationDeg: 90 }, wn('f2')],
        [run('r1', 'f1', 'c1', NORTH, 500), run('r2', 'c1', 'f2', NORTH, 500)],
        { nps: '6' },
      ),
    );
    const c = r.components.find((x) => x.nodeId === 'c1')!;
    expect(c.shape.type).toBe('branch-connection');
    // Looking north along the header, 90° clockwise from the top is east.
    if (c.shape.type === 'branch-connection') expect(c.shape.branchAxis).toEqual(EAST);
    expect(r.welds.filter((w) => w.type === 'branch' && w.nps === '1')).toHaveLength(1);
  });

  it('asks for an orientation when an open half coupling has none', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'c1', kind: 'half-coupling', branchNps: '1' }, wn('f2')],
        [run('r1', 'f1', 'c1', NORTH, 500), run('r2', 'c1', 'f2', NORTH, 500)],
        { nps: '6' },
      ),
    );
    expect(r.issues.find((i) => i.code === 'orientation-missing')?.componentId).toBe('c1');
  });

  it('takes a butt-weld outlet branch off at header radius + stated height', () => {
    const r = computeSpool(
      design(
        [
          wn('f1'),
          { id: 'o1', kind: 'branch-outlet', branchNps: '2', outletEnd: 'butt', heightMm: 38 },
          wn('f2'),
          bevel('b'),
        ],
        [run('r1', 'f1', 'o1', EAST, 800), run('r2', 'o1', 'f2', EAST, 800), run('r3', 'o1', 'b', UP, 400)],
        { nps: '10' },
      ),
    );
    expect(runOf(r, 'r3').takeOffFromMm).toBeCloseTo(273 / 2 + 38, 6);
    expect(runOf(r, 'r3').nps).toBe('2');
  });
});

describe('end preparations', () => {
  it('bevels butt-weld ends above 3 mm wall and cuts them square at or below (ASME B16.25)', () => {
    const thin = computeSpool(
      design([bevel('a'), bevel('b')], [run('r1', 'a', 'b', EAST, 500, 'cut')], { nps: '1', schedule: '10' }),
    );
    const std = computeSpool(
      design([bevel('a'), bevel('b')], [run('r1', 'a', 'b', EAST, 500, 'cut')], { nps: '6' }),
    );
    expect(thin.pieces[0]!.wallMm).toBeLessThanOrEqual(3);
    expect(thin.pieces[0]!.ends[0]!.type).toBe('square');
    expect(std.pieces[0]!.ends[0]!.label).toBe('bevel 37.5°');
  });

  it('adds the field-fit allowance to the cut length only', () => {
    const r = computeSpool(
      design(
        [wn('f1'), { id: 'a', kind: 'end', end: { type: 'bevel', fieldFitAllowanceMm: 75 } }],
        [run('r1', 'f1', 'a', EAST, 1000, 'centre-to-face')],
        { nps: '6' },
      ),
    );
    expect(r.pieces[0]!.cutLengthMm).toBe(runOf(r, 'r1').pipeLengthMm! + 75);
    expect(r.openEnds.find((e) => e.nodeId === 'a')!.centreToFaceMm).toBe(1000);
    expect(r.welds.at(-1)!.location).toBe('field');
  });
});
