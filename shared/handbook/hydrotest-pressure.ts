import { fail, ok, type Calc } from './calc-result';

/**
 * Caution shown beside any test pressure Tackline computes.
 */
export const HYDROTEST_CAUTION =
  'Test pressure is decided by the engineer of record under the applicable code; this figure supports that decision and does not replace it. ' +
  'Check that the test does not stress any component beyond yield at test temperature (ASME B31.3 §345.2.1) and that flanges and valves are rated for it. ' +
  'A pressure test stores energy: vent the air, keep the exclusion zone clear and follow the written test procedure.';

/** Upper limit of ST/S in ASME B31.3 §345.4.2(b) (from memory: confirm against the code). */
export const MAX_STRESS_RATIO = 6.5;

/** A computed hydrostatic test pressure with the basis it rests on. */
export type HydrotestPressure = {
  testPressureBar: number;
  /** ST/S actually used (after limiting to 1 … 6.5). */
  stressRatioUsed: number;
  /** Code clause the figure follows. */
  basis: string;
  /** Notes on any limit applied. */
  notes: string[];
  caution: string;
};

/**
 * ASME B31.3 §345.4.2 hydrostatic test pressure: PT = 1.5 × P × ST/S, bar gauge, where
 * ST/S is the ratio of allowable stress at test temperature to that at design temperature
 * (default 1, i.e. PT = 1.5 × P). Never below 1.5 × P; ST/S limited to 6.5.
 */
export function hydrotestPressure(input: {
  designPressureBar: number;
  stressRatio?: number;
}): Calc<HydrotestPressure> {
  const p = input.designPressureBar;
  if (!Number.isFinite(p) || p <= 0)
    return fail(`Design pressure must be more than 0 bar gauge (got ${String(p)})`);
  const ratio = input.stressRatio ?? 1;
  if (!Number.isFinite(ratio) || ratio <= 0)
    return fail(`Stress ratio ST/S must be a positive number (got ${String(ratio)})`);
  const notes: string[] = [];
  let used = ratio;
  if (ratio < 1) {
    used = 1;
    notes.push('ST/S below 1 would give less than 1.5 × design pressure, the code minimum: 1 used.');
  } else if (ratio > MAX_STRESS_RATIO) {
    used = MAX_STRESS_RATIO;
    notes.push(`ST/S above ${MAX_STRESS_RATIO} is not used by the code: ${MAX_STRESS_RATIO} used.`);
  }
  return ok({
    testPressureBar: 1.5 * p * used,
    stressRatioUsed: used,
    basis: 'ASME B31.3 §345.4.2: PT = 1.5 × P × ST/S',
    notes,
    caution: HYDROTEST_CAUTION,
  });
}
