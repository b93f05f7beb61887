import { describe, expect, it } from 'vitest';
import { elbowTakeOff } from '../../../shared/handbook/elbow-take-off';
import { elbowDimensions } from '../../../shared/standards/butt-weld-fittings';

describe('elbowTakeOff', () => {
  it("NPS 4 LR elbow cut to 60°: 152 × tan 30° = 87.8 mm (fitting maker's worked example)", () => {
    const r = elbowTakeOff(152, 60);
    expect(r.ok && r.value).toBeCloseTo(87.76, 2);
  });

  it('at 90° it equals the radius, i.e. the B16.9 LR 90° A', () => {
    const e = elbowDimensions('10', 'LR90');
    if (!e.ok) throw new Error(e.missing);
    const r = elbowTakeOff(e.value.bendRadiusMm, 90);
    expect(r.ok && r.value).toBeCloseTo(e.value.centreToEndMm, 9);
  });

  it('rejects angles outside (0°, 90°] and bad radii', () => {
    for (const [radius, angle] of [
      [152, 0],
      [152, 91],
      [152, Number.NaN],
      [0, 45],
      [-1, 45],
      [Number.NaN, 45],
    ] as const) {
      const r = elbowTakeOff(radius, angle);
      expect(r.ok).toBe(false);
    }
  });
});
