import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';
import { between, design, EAST, elbow, NORTH, run, wn } from '../helpers/design-builder';

// Flange → elbow → flange, the second leg turned `deg` from east towards north.
const bend = (deg: number, nps = '2', spec: SpecOverrides = {}) =>
  design(
    [wn('f1'), elbow('e1'), wn('f2')],
    [
      run('r1', 'f1', 'e1', EAST, 600, 'centre-to-face'),
      run('r2', 'e1', 'f2', between(EAST, NORTH, deg), 600, 'centre-to-face'),
    ],
    { nps, ...spec },
  );

const codes = (r: ReturnType<typeof computeSpool>, code: string) => r.issues.filter((i) => i.code === code);

describe('bends within the shop tolerance of a standard fitting angle', () => {
  it('uses a 90° LR elbow for a 90.15° bend, pulled 0.15° at the welds (not an error)', () => {
    // ASME B16.9 metric table: NPS 2 LR 90° A = 76 mm. Tolerance 1°: common practice, no source.
    const r = computeSpool(bend(90.15));
    expect(codes(r, 'angle-not-made')).toEqual([]);
    expect(r.ok).toBe(true);
    expect(r.runs.find((x) => x.runId === 'r1')!.takeOffToMm).toBeCloseTo(76, 6);
    const w = codes(r, 'angle-pulled');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.message).toContain('0.15° is pulled');
    expect(w[0]!.message).not.toContain('e1');
  });

  it('uses a 45° LR elbow for 44.8° instead of cutting a 90°', () => {
    // ASME B16.9 metric table: NPS 2 LR 45° B = 35 mm (a 90° cut to 44.8° would be 76·tan 22.4° = 31.3).
    const r = computeSpool(bend(44.8));
    expect(codes(r, 'cut-elbow')).toEqual([]);
    expect(r.runs.find((x) => x.runId === 'r1')!.takeOffToMm).toBeCloseTo(35, 6);
    expect(r.components.find((c) => c.nodeId === 'e1')!.description).toContain('45°');
    expect(codes(r, 'angle-pulled')[0]!.message).toContain('0.2° is pulled');
  });

  it('follows the shop setting: with 0.1° the 44.8° bend is cut from a 90°', () => {
    const r = computeSpool(bend(44.8, '2', { fittingAngleToleranceDeg: 0.1 }));
    expect(codes(r, 'cut-elbow')).toHaveLength(1);
    expect(r.runs.find((x) => x.runId === 'r1')!.takeOffToMm).toBeCloseTo(
      76 * Math.tan((22.4 * Math.PI) / 180),
      4,
    );
  });

  it('still refuses a bend beyond 90° + the tolerance', () => {
    const r = computeSpool(bend(91.5));
    expect(codes(r, 'angle-not-made')).toHaveLength(1);
  });

  it('says nothing about a bend within the geometric tolerance (0.05° of typed-direction noise)', () => {
    const r = computeSpool(bend(90.05));
    expect(codes(r, 'angle-pulled')).toEqual([]);
  });
});

describe('tiny bends', () => {
  it('warns that a 2° bend is better taken up at a straight butt weld', () => {
    // Default minimum 3°: common practice, no source. NPS 4 LR radius 152 mm: the cut elbow
    // would be 2 × 152 · tan 1° ≈ 5.3 mm along its centreline.
    const r = computeSpool(bend(2, '4'));
    const w = codes(r, 'bend-too-small');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.message).toContain('straight butt joint');
    expect(w[0]!.componentId).toBe('e1');
  });

  it('follows the shop minimum', () => {
    expect(codes(computeSpool(bend(2, '4', { minBendAngleDeg: 1.5 })), 'bend-too-small')).toEqual([]);
    expect(codes(computeSpool(bend(5, '4')), 'bend-too-small')).toEqual([]);
  });
});
