import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';
import { design, EAST, elbow, NORTH, run, WEST, wn } from '../helpers/design-builder';

// Flange → LR 90 → LR 90 → flange: a return made of two elbows, `cc` centre to centre.
const twoElbows = (nps: string, cc: number, spec: SpecOverrides = {}) =>
  design(
    [wn('f1'), elbow('e1'), elbow('e2'), wn('f2')],
    [
      run('r1', 'f1', 'e1', EAST, 1500, 'centre-to-face'),
      run('r2', 'e1', 'e2', NORTH, cc),
      run('r3', 'e2', 'f2', WEST, 1500, 'centre-to-face'),
    ],
    { nps, ...spec },
  );

const codes = (r: ReturnType<typeof computeSpool>, code: string) => r.issues.filter((i) => i.code === code);
const r2 = (r: ReturnType<typeof computeSpool>) => r.runs.find((x) => x.runId === 'r2')!;

describe('fittings welded straight together', () => {
  it('with root gap 0, two 2" LR 90s at exactly 2A weld together: no 0 mm pipe piece', () => {
    // ASME B16.9 NPS 2 LR 90° A = 76 mm: 2A = 152 mm.
    const r = computeSpool(twoElbows('2', 152, { rootGapMm: 0 }));
    expect(r2(r).closeCoupled).toBe(true);
    expect(r2(r).pieceMark).toBeNull();
    expect(r.pieces.some((p) => p.runIds.includes('r2'))).toBe(false);
    expect(r.welds.filter((w) => w.joins.includes('(no pipe)'))).toHaveLength(1);
    expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
    expect(codes(r, 'close-coupled-gap')).toEqual([]);
  });

  it('14" LR 90s at the inch value 1069.8 mm (2 × 21 in + 3) are close-coupled with a warning giving the gap', () => {
    // ASME B16.9 metric table: NPS 14 LR 90° A = 533 mm, so 2A + 3 mm root gap = 1069.0;
    // the inch table's 21 in = 533.4 mm gives 1069.8. Fitting tolerance 2 mm: B16.9
    // centre-to-end ±2 mm (from memory).
    const r = computeSpool(twoElbows('14', 1069.8));
    expect(codes(r, 'piece-too-short')).toEqual([]);
    expect(r.ok).toBe(true);
    expect(r2(r).closeCoupled).toBe(true);
    const w = codes(r, 'close-coupled-gap');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.message).toContain('3.8 mm apart');
    expect(w[0]!.message).toContain('root gap is 3 mm');
    expect(w[0]!.message).toContain('elbow 90° LR, NPS 14');
    expect(w[0]!.message).not.toMatch(/\be1\b|\be2\b/);
  });

  it('no warning at exactly 2A + one root gap', () => {
    const r = computeSpool(twoElbows('14', 1069));
    expect(r2(r).closeCoupled).toBe(true);
    expect(codes(r, 'close-coupled-gap')).toEqual([]);
  });

  it('beyond the tolerance it stays an error (3 mm more than one gap, too short for a pipe)', () => {
    const r = computeSpool(twoElbows('14', 1072));
    expect(codes(r, 'piece-too-short')).toHaveLength(1);
    expect(r2(r).closeCoupled).toBe(false);
  });

  it('follows the shop tolerance', () => {
    const r = computeSpool(twoElbows('14', 1069.8, { closeCoupleToleranceMm: 0.5 }));
    expect(codes(r, 'piece-too-short')).toHaveLength(1);
  });

  it('a tighter fit within tolerance (1 mm less) is close-coupled, the gap reported tighter', () => {
    const r = computeSpool(twoElbows('14', 1068));
    expect(r2(r).closeCoupled).toBe(true);
    expect(codes(r, 'close-coupled-gap')[0]!.message).toContain('tighter by 1 mm');
  });
});
