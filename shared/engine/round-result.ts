/**
 * Final pass over a result: rounds every number to a fixed precision (stable JSON, no
 * float noise such as 535.9999999) and turns -0 into 0. A non-finite number would be an
 * engine bug: it becomes null and an `internal-error` issue, so no NaN ever leaves.
 */
import type { SpoolResult } from './compute-result';

/** Decimal places kept in results (mm, degrees, kg and unit vectors alike). */
export const RESULT_DECIMALS = 4;
const F = 10 ** RESULT_DECIMALS;

/** A copy of `result` with every number rounded. */
export function roundResult(result: SpoolResult): SpoolResult {
  const bad: string[] = [];
  const walk = (v: unknown, path: string): unknown => {
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) {
        bad.push(path);
        return null;
      }
      const r = Math.round(v * F) / F;
      return r === 0 ? 0 : r;
    }
    if (Array.isArray(v)) return v.map((x, i) => walk(x, `${path}.${i}`));
    if (v !== null && typeof v === 'object') {
      // Copy: shared constant vectors (frozen) and shared points must not be mutated.
      const out: Record<string, unknown> = {};
      for (const k of Object.keys(v)) out[k] = walk((v as Record<string, unknown>)[k], path ? `${path}.${k}` : k);
      return out;
    }
    return v;
  };
  const rounded = walk(result, '') as SpoolResult;
  if (bad.length > 0) {
    rounded.issues.push({ severity: 'error', code: 'internal-error', message: `Engine produced non-numbers at ${bad.slice(0, 5).join(', ')}` });
    rounded.ok = false;
  }
  return rounded;
}
