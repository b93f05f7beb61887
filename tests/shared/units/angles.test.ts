import { describe, expect, it } from 'vitest';
import { degToRad, normaliseDegrees, normaliseSignedDegrees, radToDeg } from '../../../shared/units/angles';

describe('angles', () => {
  it('converts degrees and radians both ways', () => {
    expect(degToRad(180)).toBeCloseTo(Math.PI, 12);
    expect(radToDeg(Math.PI / 2)).toBeCloseTo(90, 12);
  });

  it.each([
    [-90, 270],
    [360, 0],
    [725, 5],
    [-0, 0],
    [359.5, 359.5],
  ])('normaliseDegrees(%f) = %f', (a, b) => {
    expect(normaliseDegrees(a)).toBeCloseTo(b, 12);
  });

  it.each([
    [270, -90],
    [180, 180],
    [-180, 180],
    [190, -170],
  ])('normaliseSignedDegrees(%f) = %f', (a, b) => {
    expect(normaliseSignedDegrees(a)).toBeCloseTo(b, 12);
  });
});
