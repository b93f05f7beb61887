import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import {
  between,
  bevel,
  design,
  EAST,
  elbow,
  NORTH,
  plain,
  run,
  socket,
  UP,
  wn,
} from './helpers/design-builder';

const runOf = (r: ReturnType<typeof computeSpool>, id: string) => r.runs.find((x) => x.runId === id)!;
const pos = (r: ReturnType<typeof computeSpool>, id: string) =>
  r.workPoints.find((w) => w.nodeId === id)!.position;

describe('cut length between fittings', () => {
  // Rule: "Cut length = C–C − Takeout A − Takeout B … subtract root gaps too" (tnbpositioners
  // fitting takeout calculator); A = 229 mm for NPS 6 LR 90° (ASME B16.9). Number computed:
  // 1000 − 229 − 229 − 2 × 3 = 536 mm.
  it('subtracts both LR 90° take-offs and one root gap per weld (NPS 6 STD, C–C 1000, gap 3 → 536 mm)', () => {
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), elbow('e2'), bevel('b')],
        [run('r1', 'a', 'e1', EAST, 500), run('r2', 'e1', 'e2', NORTH, 1000), run('r3', 'e2', 'b', UP, 500)],
        { nps: '6', rootGapMm: 3 },
      ),
    );
    expect(r.ok).toBe(true);
    const r2 = runOf(r, 'r2');
    expect(r2.takeOffFromMm).toBe(229);
    expect(r2.takeOffToMm).toBe(229);
    expect(r2.pipeLengthMm).toBe(536);
    expect(r.pieces.find((p) => p.runIds.includes('r2'))!.cutLengthMm).toBe(536);
  });

  // ASME B16.11 Class 3000 90° elbow NPS 1: centre to socket bottom A = 22.5 mm (vaibhavfitting
  // B16.11-2016 table); gap g = 1.6 mm (B31.3 "approximately 1/16 in"). L = C–C − (A₁ + g) − (A₂ + g).
  it('socket welds: L = C–C − (A₁ + g) − (A₂ + g) (NPS 1, C–C 300 → 251.8 mm)', () => {
    const r = computeSpool(
      design(
        [plain('a'), socket('s1'), socket('s2'), plain('b')],
        [run('r1', 'a', 's1', EAST, 200), run('r2', 's1', 's2', NORTH, 300), run('r3', 's2', 'b', UP, 200)],
        { nps: '1', schedule: '80' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r2').pipeLengthMm).toBeCloseTo(300 - (22.5 + 1.6) * 2, 6);
    expect(r.welds.filter((w) => w.type === 'socket')).toHaveLength(4);
    expect(r.pieces.every((p) => p.ends.every((e) => e.type === 'square'))).toBe(true);
  });
});

describe('two 90° LR elbows welded into a return', () => {
  // Domain brief: "two 90° elbows welded into a 180° return: centre-to-centre = 2A + gap".
  // A = 533 mm for NPS 14 LR (ASME B16.9): 2 × 533 + 3 = 1069 mm.
  it('places the second elbow 2A + one root gap from the first when the cut length is 0', () => {
    const r = computeSpool(
      design(
        [wn('f1'), elbow('e1'), elbow('e2'), wn('f2')],
        [
          run('r1', 'f1', 'e1', EAST, 1500),
          run('r2', 'e1', 'e2', NORTH, 0, 'cut'),
          run('r3', 'e2', 'f2', { x: -1, y: 0, z: 0 }, 1500),
        ],
        { nps: '14', rootGapMm: 3 },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r2').workPointDistanceMm).toBe(1069);
    expect(runOf(r, 'r2').closeCoupled).toBe(true);
    expect(pos(r, 'e2').y - pos(r, 'e1').y).toBe(1069);
    // One weld joins the elbows; no pipe piece for r2.
    expect(r.welds.filter((w) => w.joins.includes('(no pipe)'))).toHaveLength(1);
    expect(r.pieces.some((p) => p.runIds.includes('r2'))).toBe(false);
  });

  it('recognises a stated centre-to-centre of 2A + gap as fittings welded together (NPS 6: 461 mm)', () => {
    const r = computeSpool(
      design(
        [wn('f1'), elbow('e1'), elbow('e2'), wn('f2')],
        [
          run('r1', 'f1', 'e1', EAST, 900),
          run('r2', 'e1', 'e2', NORTH, 461),
          run('r3', 'e2', 'f2', { x: -1, y: 0, z: 0 }, 900),
        ],
        { nps: '6', rootGapMm: 3 },
      ),
    );
    expect(r.ok).toBe(true);
    expect(runOf(r, 'r2').closeCoupled).toBe(true);
    expect(runOf(r, 'r2').pipeLengthMm).toBe(0);
  });

  it('reports overlapping fittings, not a negative length, when the elbows cannot fit', () => {
    const r = computeSpool(
      design(
        [wn('f1'), elbow('e1'), elbow('e2'), wn('f2')],
        [
          run('r1', 'f1', 'e1', EAST, 900),
          run('r2', 'e1', 'e2', NORTH, 400),
          run('r3', 'e2', 'f2', { x: -1, y: 0, z: 0 }, 900),
        ],
        { nps: '6' },
      ),
    );
    expect(r.ok).toBe(false);
    expect(runOf(r, 'r2').pipeLengthMm).toBeNull();
    expect(r.issues.find((i) => i.code === 'overlapping-fittings')?.componentId).toBe('r2');
  });
});

describe('elbows cut to an angle', () => {
  // Worked example (fitting maker's page, jsfittings): NPS 4 LR at 60° → 152 × tan 30° = 87.8 mm.
  it('uses R·tan(θ/2): NPS 4 LR cut to 60° → 87.8 mm', () => {
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), bevel('b')],
        [run('r1', 'a', 'e1', EAST, 600), run('r2', 'e1', 'b', between(EAST, UP, 60), 600)],
        { nps: '4' },
      ),
    );
    expect(runOf(r, 'r1').takeOffToMm).toBeCloseTo(87.8, 1);
    expect(r.issues.map((i) => i.code)).toContain('cut-elbow');
    expect(r.ok).toBe(true);
  });

  it('uses the B16.9 45° table value B, not R·tan 22.5° (NPS 2: 35 mm, not 31.6)', () => {
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), bevel('b')],
        [run('r1', 'a', 'e1', EAST, 600), run('r2', 'e1', 'b', between(EAST, UP, 45), 600)],
        { nps: '2' },
      ),
    );
    expect(runOf(r, 'r1').takeOffToMm).toBe(35);
  });

  it('refuses a bend no single elbow makes (120°) with an error on the elbow', () => {
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), bevel('b')],
        [run('r1', 'a', 'e1', EAST, 600), run('r2', 'e1', 'b', between(EAST, UP, 120), 600)],
        { nps: '4' },
      ),
    );
    expect(r.ok).toBe(false);
    expect(r.issues.find((i) => i.code === 'angle-not-made')?.componentId).toBe('e1');
  });
});

describe('offsets', () => {
  // 45° offset: travel = set × 1.414; worked example set 12 in → travel 16.97 in
  // (masterplumbers forum; knowt "Piping Offsets").
  it('a 45° offset of travel 16.97 in (431.04 mm) has a set of 12 in (304.8 mm)', () => {
    const travel = 16.97 * 25.4;
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), elbow('e2'), bevel('b')],
        [
          run('r1', 'a', 'e1', EAST, 600),
          run('r2', 'e1', 'e2', between(EAST, UP, 45), travel),
          run('r3', 'e2', 'b', EAST, 600),
        ],
        { nps: '2' },
      ),
    );
    expect(pos(r, 'e2').z - pos(r, 'e1').z).toBeCloseTo(304.8, 0);
    expect(r.components.find((c) => c.nodeId === 'e1')!.description).toContain('45°');
  });

  // Rolling offset: true offset = √(rise² + roll²); rise 8, roll 12 → 14.42 in
  // (602apprentice "Rolling offsets"; hunker). With 45° fittings the run equals the true offset.
  it('a rolling offset with rise 8 in and roll 12 in uses 45° elbows over a true offset of 14.42 in', () => {
    const rise = 8 * 25.4;
    const roll = 12 * 25.4;
    const trueOffset = Math.hypot(rise, roll);
    expect(trueOffset / 25.4).toBeCloseTo(14.42, 2);
    const dir = { x: trueOffset, y: roll, z: rise };
    const travel = Math.hypot(trueOffset, roll, rise);
    const r = computeSpool(
      design(
        [wn('f1'), elbow('e1'), elbow('e2'), wn('f2')],
        [
          run('r1', 'f1', 'e1', EAST, 800),
          run('r2', 'e1', 'e2', dir, travel),
          run('r3', 'e2', 'f2', EAST, 800),
        ],
        { nps: '4' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(r.components.filter((c) => c.description.startsWith('Elbow 45°'))).toHaveLength(2);
    const d = {
      x: pos(r, 'e2').x - pos(r, 'e1').x,
      y: pos(r, 'e2').y - pos(r, 'e1').y,
      z: pos(r, 'e2').z - pos(r, 'e1').z,
    };
    expect(d.y).toBeCloseTo(roll, 3);
    expect(d.z).toBeCloseTo(rise, 3);
    expect(travel).toBeCloseTo(trueOffset * Math.SQRT2, 6);
    // Cut length on the offset: travel − 2B − 2 gaps (B = 64 mm for NPS 4 LR 45°, from the B16.9 table in shared/standards).
    expect(runOf(r, 'r2').pipeLengthMm).toBeCloseTo(travel - 2 * 64 - 2 * 3, 3);
  });
});
