import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { design, EAST, elbow, NORTH, run, UP, wn } from '../helpers/design-builder';

// One convention for every correction: signed degrees clockwise looking at the face, from
// the flange as designed, so boltRotationDeg + correction is the corrected design. The
// checks below apply each correction to the design and recompute: the problem must be gone.

function withRotation(d: SpoolDesign, flangeId: string, deg: number): SpoolDesign {
  return {
    ...d,
    nodes: d.nodes.map((n) =>
      n.id === flangeId && n.kind === 'end' && n.end.type === 'weld-neck-flange'
        ? { ...n, end: { ...n.end, boltRotationDeg: deg } }
        : n,
    ),
  };
}

// NPS 10 Class 150: 12 holes (ASME B16.5 Table 7), so straddling is 15° off the vertical.
const straight = (f2Deg: number) =>
  design(
    [wn('f1'), wn('f2', { boltRotationDeg: f2Deg, mustTwoHole: false })],
    [run('r1', 'f1', 'f2', EAST, 1500, 'face-to-face')],
    { nps: '10' },
  );

// Through a bend: flange east, LR 90, flange turning north then up a rolled leg.
const bent = (f2Deg: number) =>
  design(
    [wn('f1'), elbow('e1'), elbow('e2'), wn('f2', { boltRotationDeg: f2Deg, mustTwoHole: false })],
    [
      run('r1', 'f1', 'e1', EAST, 1200, 'centre-to-face'),
      run('r2', 'e1', 'e2', NORTH, 1500),
      run('r3', 'e2', 'f2', UP, 1000, 'centre-to-face'),
    ],
    { nps: '10' },
  );

describe('flange-pair correction, same sense as the two-hole correction', () => {
  it.each([
    ['straight spool, f2 3° clockwise of matched', straight, 18],
    ['straight spool, f2 5° counter-clockwise of matched', straight, 10],
    ['through two 90° bends', bent, 22],
  ] as const)('%s: applying the correction leaves no error', (_name, build, deg) => {
    const d = build(deg);
    const before = computeSpool(d);
    const pair = before.flangePairs[0]!;
    expect(Math.abs(pair.errorDeg!)).toBeGreaterThan(1);
    const c = pair.correction!;
    expect(c.flangeId).toBe('f2');
    const f2 = before.flanges.find((f) => f.nodeId === 'f2')!;
    const after = computeSpool(withRotation(d, 'f2', f2.rotationDeg + c.rotateClockwiseLookingAtFaceDeg));
    expect(after.flangePairs[0]!.errorDeg).toBeCloseTo(0, 6);
    expect(after.flangePairs[0]!.correction).toBeNull();
  });

  it('the two-hole correction applied to the design makes the flange straddle', () => {
    const d = design(
      [wn('f1', { boltRotationDeg: 4 }), wn('f2')],
      [run('r1', 'f1', 'f2', EAST, 1500, 'face-to-face')],
      { nps: '10' },
    );
    const f1 = computeSpool(d).flanges.find((f) => f.nodeId === 'f1')!;
    // 15° straddle − 4° = +11°, clockwise looking at the face.
    expect(f1.correction!.rotateClockwiseLookingAtFaceDeg).toBeCloseTo(11, 6);
    const after = computeSpool(withRotation(d, 'f1', 4 + f1.correction!.rotateClockwiseLookingAtFaceDeg));
    expect(after.flanges.find((f) => f.nodeId === 'f1')!.straddles).toBe(true);
  });

  it('the pair message names the turn in the same convention', () => {
    const r = computeSpool(straight(18));
    const w = r.issues.find((i) => i.code === 'flange-rotation-mismatch')!;
    expect(w.message).toContain('3° counter-clockwise looking at its face');
  });
});
