import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { offsetAngleFor, rollingOffset, simpleOffset } from '../../../shared/handbook/offsets';

const IN = 25.4;

function ok<T>(r: { ok: true; value: T } | { ok: false; message: string }): T {
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe('simpleOffset', () => {
  it('45° offset: travel = 1.414 × set, set 12 in → 16.97 in (masterplumbers forum; fitter maths text 12.0 × 1.414)', () => {
    const o = ok(simpleOffset({ setMm: 12 * IN, fittingAngleDeg: 45 }));
    expect(o.travelMm / IN).toBeCloseTo(16.97, 2);
    expect(o.runMm / IN).toBeCloseTo(12, 9);
  });

  it('60° and 22.5° multipliers 1.155 and 2.613 (trigonometry, computed)', () => {
    expect(ok(simpleOffset({ setMm: 100, fittingAngleDeg: 60 })).travelMm / 100).toBeCloseTo(1.155, 3);
    expect(ok(simpleOffset({ setMm: 100, fittingAngleDeg: 22.5 })).travelMm / 100).toBeCloseTo(2.613, 3);
  });

  it('90° fittings: travel = set, run 0', () => {
    expect(ok(simpleOffset({ setMm: 300, fittingAngleDeg: 90 }))).toEqual({ travelMm: 300, runMm: 0 });
  });

  it.each([
    [{ setMm: 0, fittingAngleDeg: 45 }, 'Set'],
    [{ setMm: -5, fittingAngleDeg: 45 }, 'Set'],
    [{ setMm: Number.NaN, fittingAngleDeg: 45 }, 'Set'],
    [{ setMm: 100, fittingAngleDeg: 0 }, 'Fitting angle'],
    [{ setMm: 100, fittingAngleDeg: 95 }, 'Fitting angle'],
    [{ setMm: 100, fittingAngleDeg: Number.NaN }, 'Fitting angle'],
  ])('%j → error containing %j', (input, fragment) => {
    const r = simpleOffset(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});

describe('rollingOffset', () => {
  it('rise 30 5/8, roll 17 5/8 → true offset 35.33 in, travel ≈ 50.0 in at 45° (602apprentice "Rolling offsets")', () => {
    const o = ok(rollingOffset({ riseMm: 30.625 * IN, rollMm: 17.625 * IN }));
    expect(o.trueOffsetMm / IN).toBeCloseTo(35.33, 2);
    expect(Math.abs(o.travelMm / IN - 50.0)).toBeLessThan(0.05);
    expect(o.angleDeg).toBe(45);
  });

  it('rise 8, roll 12 → true offset 14.42 in (hunker "How to figure a rolling offset")', () => {
    expect(ok(rollingOffset({ riseMm: 8 * IN, rollMm: 12 * IN })).trueOffsetMm / IN).toBeCloseTo(14.42, 2);
  });

  it('with a run, travel = √(rise² + roll² + run²) and the angle is what the offset needs', () => {
    const o = ok(rollingOffset({ riseMm: 300, rollMm: 400, runMm: 500 }));
    expect(o.travelMm).toBeCloseTo(Math.sqrt(300 ** 2 + 400 ** 2 + 500 ** 2), 9);
    expect(o.angleDeg).toBeCloseTo(45, 9);
  });

  it('travel is the 3D distance for any fitting angle (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 5, max: 90, noNaN: true }),
        (rise, roll, angle) => {
          const o = ok(rollingOffset({ riseMm: rise, rollMm: roll, fittingAngleDeg: angle }));
          expect(o.travelMm).toBeCloseTo(Math.sqrt(rise ** 2 + roll ** 2 + o.runMm ** 2), 6);
          expect(o.runMm).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it.each([
    [{ riseMm: 0, rollMm: 0 }, 'no offset'],
    [{ riseMm: -1, rollMm: 10 }, 'Rise'],
    [{ riseMm: 10, rollMm: Number.NaN }, 'Roll'],
    [{ riseMm: 10, rollMm: 10, runMm: 10, fittingAngleDeg: 45 }, 'not both'],
    [{ riseMm: 10, rollMm: 10, runMm: -1 }, 'Run'],
    [{ riseMm: 10, rollMm: 10, fittingAngleDeg: 0 }, 'Fitting angle'],
  ])('%j → error containing %j', (input, fragment) => {
    const r = rollingOffset(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});

describe('offsetAngleFor', () => {
  it('set = run needs 45° fittings; the nearest common fitting is named', () => {
    const a = ok(offsetAngleFor({ setMm: 500, runMm: 500 }));
    expect(a.angleDeg).toBeCloseTo(45, 12);
    expect(a.travelMm).toBeCloseTo(500 * Math.SQRT2, 9);
    expect(ok(offsetAngleFor({ setMm: 100, runMm: 240 })).nearestCommonAngleDeg).toBe(22.5);
    expect(ok(offsetAngleFor({ setMm: 100, runMm: 0 })).angleDeg).toBe(90);
  });

  it('rejects a zero set and a negative run', () => {
    expect(offsetAngleFor({ setMm: 0, runMm: 10 }).ok).toBe(false);
    expect(offsetAngleFor({ setMm: 10, runMm: -10 }).ok).toBe(false);
  });
});
