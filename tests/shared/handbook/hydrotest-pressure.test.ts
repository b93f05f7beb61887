import { describe, expect, it } from 'vitest';
import {
  HYDROTEST_CAUTION,
  hydrotestPressure,
  MAX_STRESS_RATIO,
} from '../../../shared/handbook/hydrotest-pressure';

describe('hydrotestPressure (ASME B31.3 §345.4.2, via industrialmonitordirect summary)', () => {
  it('is 1.5 × design pressure when test and design temperatures give ST/S = 1: 10 bar → 15 bar', () => {
    const r = hydrotestPressure({ designPressureBar: 10 });
    expect(r.ok && r.value.testPressureBar).toBe(15);
  });

  it('applies PT = 1.5 × P × ST/S', () => {
    const r = hydrotestPressure({ designPressureBar: 10, stressRatio: 1.2 });
    expect(r.ok && r.value.testPressureBar).toBeCloseTo(18, 9);
  });

  it('never goes below 1.5 × P, and caps ST/S at 6.5 (from memory), saying so', () => {
    const low = hydrotestPressure({ designPressureBar: 10, stressRatio: 0.8 });
    expect(low.ok && low.value.testPressureBar).toBe(15);
    expect(low.ok && low.value.notes.length).toBe(1);
    const high = hydrotestPressure({ designPressureBar: 10, stressRatio: 9 });
    expect(high.ok && high.value.testPressureBar).toBeCloseTo(1.5 * 10 * MAX_STRESS_RATIO, 9);
  });

  it('carries the engineer-of-record caution', () => {
    const r = hydrotestPressure({ designPressureBar: 10 });
    expect(r.ok && r.value.caution).toBe(HYDROTEST_CAUTION);
    expect(HYDROTEST_CAUTION).toMatch(/engineer of record/);
    expect(HYDROTEST_CAUTION).toMatch(/exclusion zone/);
  });

  it('rejects zero, negative and non-numeric inputs', () => {
    for (const input of [
      { designPressureBar: 0 },
      { designPressureBar: -3 },
      { designPressureBar: Number.NaN },
      { designPressureBar: 10, stressRatio: 0 },
    ]) {
      expect(hydrotestPressure(input).ok).toBe(false);
    }
  });
});
