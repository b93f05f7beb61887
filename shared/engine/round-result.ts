/**
 * Final pass over a result: rounds every number to a fixed precision (stable JSON, no
 * float noise such as 535.9999999) and turns -0 into 0. A non-finite number would be an
 * engine bug: it becomes null and an `internal-error` issue, so no NaN ever leaves.
 */
import type { SpoolResult } from './compute-result';

/** Decimal places kept in results (mm, degrees, kg and unit vectors alike). */
export const RESULT_DECIMALS = 4;
const F = 10 ** RESULT_DECIMALS;

/** Rounds every number of `result` (in place) and returns it. */
export function roundResult(result: SpoolResult): SpoolResult {
  let bad = 0;
  // In place, writing only values that change: constants (frozen, already round) are never
  // written, and nothing from the caller's design reaches the result uncopied.
  const fix = (v: number): number | null => {
    if (!Number.isFinite(v)) {
      bad++;
      return null;
    }
    return Math.round(v * F) / F || 0;
  };
  const walk = (o: Record<string, unknown>): void => {
    for (const k in o) {
      const v = o[k];
      if (typeof v === 'number') {
        const r = fix(v);
        if (r !== v) o[k] = r;
      } else if (Array.isArray(v)) {
        for (let i = 0; i < v.length; i++) {
          const x: unknown = v[i];
          if (typeof x === 'number') {
            const r = fix(x);
            if (r !== x) v[i] = r;
          } else if (x !== null && typeof x === 'object') walk(x as Record<string, unknown>);
        }
      } else if (v !== null && typeof v === 'object') walk(v as Record<string, unknown>);
    }
  };
  walk(result as unknown as Record<string, unknown>);
  if (bad > 0) {
    result.issues.push({
      severity: 'error',
      code: 'internal-error',
      message: `Engine produced ${bad} non-finite number(s)`,
    });
    result.ok = false;
  }
  return result;
}
