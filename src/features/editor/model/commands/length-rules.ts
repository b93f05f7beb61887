import type { RunLengthKind } from '../../../../../shared/schemas/spool-design-run.schema';

/** Longest run the editor accepts, mm (the document allows 1 km; no shop spool is longer than this). */
export const MAX_RUN_MM = 100_000;

/**
 * Why a typed run length cannot be used, or null. A cut length of 0 is allowed: it
 * welds two fittings straight together. A work-point distance of 0 is not a run.
 */
export function lengthError(mm: number, kind: RunLengthKind): string | null {
  if (!Number.isFinite(mm)) return 'Type a length';
  if (mm < 0) return 'A length cannot be negative';
  if (mm === 0 && kind !== 'cut') return 'A run needs a length; a cut length of 0 welds the fittings together';
  if (mm > MAX_RUN_MM) return `A run is at most ${MAX_RUN_MM.toLocaleString('en-GB')} mm here`;
  return null;
}
