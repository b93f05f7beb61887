import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { Nps } from '../../../shared/standards/nps';
import { design, EAST, run, UP, wn } from './helpers/design-builder';

/** A straight spool: flange f1 facing west at the origin, flange f2 facing east. */
function straight(
  nps: Nps,
  flangeClass: 150 | 300,
  f1: Record<string, unknown> = {},
  f2: Record<string, unknown> = {},
) {
  return computeSpool(
    design([wn('f1', f1), wn('f2', f2)], [run('r1', 'f1', 'f2', EAST, 1500, 'face-to-face')], {
      nps,
      flangeClass,
    }),
  );
}

describe('bolt holes straddle the centrelines', () => {
  // Reference values (C, from straddling: first hole 180/n° off the vertical):
  // x = (BC/2)·sin(180/n), y = (BC/2)·cos(180/n), y vertical, first hole right of top dead
  // centre, seen facing the flange. Bolt circles and counts: ASME B16.5 Table 7 (Class 150)
  // and the Class 300 drilling in shared/reference.
  it.each([
    ['2', 150, 4, 45, 42.67, 42.67],
    ['6', 150, 8, 22.5, 46.17, 111.47],
    ['24', 150, 20, 9, 58.61, 370.04],
    ['24', 300, 24, 7.5, 53.05, 402.92],
  ] as const)('NPS %s Class %i (%i bolts): first hole at %f°, at (%f, %f) mm', (nps, cls, n, deg, x, y) => {
    const r = straight(nps, cls);
    const f = r.flanges.find((q) => q.nodeId === 'f1')!;
    expect(f.boltCount).toBe(n);
    expect(f.reference).toBe('plant-vertical');
    expect(f.rotationDeg).toBeCloseTo(deg, 6);
    expect(f.straddles).toBe(true);
    // Facing f1 (from the west, looking east) "up" is +z and "right" is south (−y).
    const half = f.boltCircleMm! / 2;
    const hole = { right: -f.firstHoleDirection.y * half, up: f.firstHoleDirection.z * half };
    expect(hole.right).toBeCloseTo(x, 1);
    expect(hole.up).toBeCloseTo(y, 1);
  });

  it('measures a flange facing up from plant north', () => {
    const r = computeSpool(
      design([wn('f1'), wn('f2')], [run('r1', 'f1', 'f2', UP, 1000, 'face-to-face')], { nps: '6' }),
    );
    const top = r.flanges.find((q) => q.nodeId === 'f2')!;
    expect(top.outward).toEqual(UP);
    expect(top.reference).toBe('plant-north');
    expect(top.rotationDeg).toBe(22.5);
  });

  it('flags a flange that must be two-holed but is one-holed, with the correction in degrees and mm', () => {
    const r = straight('6', 150, { boltRotationDeg: 0, mustTwoHole: true });
    const f = r.flanges.find((q) => q.nodeId === 'f1')!;
    expect(f.straddles).toBe(false);
    // Exactly half a pitch off: either sense straddles; the engine turns back (−22.5°).
    expect(Math.abs(f.correction!.rotateClockwiseLookingAtFaceDeg)).toBeCloseTo(22.5, 6);
    // 241.3/2 × 22.5° in radians = 47.38 mm at the bolt circle (C).
    expect(f.correction?.atBoltCircleMm).toBeCloseTo(47.38, 2);
    expect(r.issues.find((i) => i.code === 'flange-not-two-holed')?.severity).toBe('error');
  });

  it('accepts a one-holed flange that is not required to be two-holed', () => {
    const r = straight('6', 150, { boltRotationDeg: 0, mustTwoHole: false });
    expect(r.issues.filter((i) => i.code === 'flange-not-two-holed')).toHaveLength(0);
  });
});

describe('flange pairs', () => {
  it('finds no rotation error between two two-holed flanges on a straight spool', () => {
    const r = straight('10', 150);
    expect(r.flangePairs).toHaveLength(1);
    expect(r.flangePairs[0]!.errorDeg).toBe(0);
    expect(r.flangePairs[0]!.withinTolerance).toBe(true);
  });

  // NPS 10 Class 150: 12 bolts on a 362.0 mm circle (B16.5 Table 7). 3° off → 181 × 3π/180 = 9.48 mm (C).
  it('states a 3° mismatch as 9.48 mm at the bolt circle and the rotation that corrects it', () => {
    const r = straight('10', 150, {}, { boltRotationDeg: 18, mustTwoHole: false });
    const pair = r.flangePairs[0]!;
    expect(pair.parallelFaces).toBe(true);
    expect(pair.errorDeg).toBeCloseTo(3, 6);
    expect(pair.errorMm).toBeCloseTo(9.48, 2);
    expect(pair.withinTolerance).toBe(false);
    // f2 sits 3° clockwise of the matched position: the turn back is 3° counter-clockwise.
    expect(pair.correction?.flangeId).toBe('f2');
    expect(pair.correction?.rotateClockwiseLookingAtFaceDeg).toBeCloseTo(-3, 6);
    expect(r.issues.some((i) => i.code === 'flange-rotation-mismatch' && i.componentId === 'f2')).toBe(true);
  });

  it('treats an error under the 1.6 mm tolerance as within tolerance', () => {
    // 0.4° on a 362 mm circle = 1.26 mm.
    const r = straight('10', 150, {}, { boltRotationDeg: 15.4, mustTwoHole: false });
    expect(r.flangePairs[0]!.errorMm).toBeCloseTo(1.26, 2);
    expect(r.flangePairs[0]!.withinTolerance).toBe(true);
  });

  it('reads the rolling-offset sample: both flanges two-holed, bench angles from the offset plane', async () => {
    const sample = JSON.parse(
      await import('node:fs/promises').then((fs) =>
        fs.readFile('samples/cw-305-s01-rolling-offset-10in.json', 'utf8'),
      ),
    );
    const r = computeSpool(sample);
    const [f1, f2] = [r.flanges[0]!, r.flanges[1]!];
    expect(f1.straddles && f2.straddles).toBe(true);
    // The offset plane is rolled atan(800/600) = 53.13° from the vertical (C), so the first
    // hole sits 15° + 53.13° from it at the first flange.
    expect(f1.bendPlaneRotationDeg).toBeCloseTo(15 + (Math.atan2(800, 600) * 180) / Math.PI, 2);
    expect(r.flangePairs[0]!.withinTolerance).toBe(true);
  });
});
