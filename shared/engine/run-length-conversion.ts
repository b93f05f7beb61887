/**
 * Converting a run's length between the ways an isometric states it, for editors that
 * let the user switch a dimension from centre-to-centre to cut length and back without
 * moving anything. All lengths in mm.
 */
import type { RunLengthKind } from '../schemas/spool-design-run.schema';
import type { RunResult } from './compute-result';

/** Work-point distance from a cut length: cut + both take-offs + the run's root gaps, mm. */
export function runLengthFromCut(
  cutMm: number,
  takeOffFromMm: number,
  takeOffToMm: number,
  gapsMm: number,
): number {
  return cutMm + takeOffFromMm + takeOffToMm + gapsMm;
}

/** Cut length from a work-point distance; null when the fittings leave no room (never negative), mm. */
export function cutFromRunLength(
  workPointDistanceMm: number,
  takeOffFromMm: number,
  takeOffToMm: number,
  gapsMm: number,
): number | null {
  const cut = workPointDistanceMm - takeOffFromMm - takeOffToMm - gapsMm;
  return cut >= 0 ? cut : null;
}

/**
 * The value a computed run would have if stated as `kind`: its pipe length for `cut`, its
 * work-point distance for the other kinds. null when the pipe length is not known.
 * Use it to rewrite `run.length` with a new kind and the same geometry.
 */
export function runLengthAs(run: RunResult, kind: RunLengthKind): number | null {
  return kind === 'cut' ? run.pipeLengthMm : run.workPointDistanceMm;
}
