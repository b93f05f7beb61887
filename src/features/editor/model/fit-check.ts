import type { RunResult, SpoolResult } from '../../../../shared/engine/compute-result';
import { componentMarks } from '../../../../shared/engine/component-marks';
import { formatFtIn, formatMm, type LengthUnits } from '../../../../shared/units/length-format';

/** Engine issue codes that mean "the fittings do not leave room for a pipe piece". */
const FIT_CODES = new Set(['overlapping-fittings', 'piece-too-short']);

/** One run that a change left without room for its fittings and a pipe piece. */
export type Misfit = {
  runId: string;
  /** Shop marks of the run's two ends ("T1", "E2"); never node ids. */
  fromMark: string;
  toMark: string;
  /** Work point to work point, mm. */
  availableMm: number;
  /** Take-offs + root gaps + the shortest pipe piece the spec allows, mm. */
  neededMm: number;
  /** neededMm − availableMm, mm (> 0). */
  missingMm: number;
  /** The spec's shortest pipe piece counted in `neededMm`, mm. */
  minPieceMm: number;
};

function fitErrorRuns(result: SpoolResult | null): Set<string> {
  const out = new Set<string>();
  if (!result) return out;
  for (const i of result.issues) {
    if (i.severity === 'error' && FIT_CODES.has(i.code) && i.componentId) out.add(i.componentId);
  }
  return out;
}

/**
 * Runs that do not fit after a change but did before (or are new): a run whose stated
 * length is shorter than the take-offs of its two fittings, the root gaps and the
 * spec's shortest pipe piece. Runs that were already misfits stay out, so a warning is
 * about what this change does. Lengths in mm.
 */
export function newMisfits(before: SpoolResult | null, after: SpoolResult): Misfit[] {
  const was = fitErrorRuns(before);
  const now = fitErrorRuns(after);
  const marks = componentMarks(after);
  const minPieceMm = after.spec.minPieceLengthMm;
  const out: Misfit[] = [];
  for (const run of after.runs) {
    if (!now.has(run.runId) || was.has(run.runId)) continue;
    const neededMm = neededLength(run, after, minPieceMm);
    const missingMm = neededMm - run.workPointDistanceMm;
    if (!(missingMm > 0)) continue;
    out.push({
      runId: run.runId,
      fromMark: marks.get(run.from) ?? 'the fitting',
      toMark: marks.get(run.to) ?? 'the fitting',
      availableMm: run.workPointDistanceMm,
      neededMm,
      missingMm,
      minPieceMm,
    });
  }
  return out;
}

function neededLength(run: RunResult, result: SpoolResult, minPieceMm: number): number {
  // A piece the cut list sized (too short, not impossible): what it lacks of the minimum.
  const piece = result.pieces.find((p) => p.runIds.includes(run.runId) && p.nodeId === null);
  if (run.pipeLengthMm !== null && piece?.cutLengthMm != null) {
    return run.workPointDistanceMm + Math.max(0, minPieceMm - piece.cutLengthMm);
  }
  return (run.takeOffFromMm ?? 0) + (run.takeOffToMm ?? 0) + run.gapsMm + minPieceMm;
}

/** A length in mm, and in ft-in too when the user works in feet and inches. */
export function lengthInBoth(mm: number, units: LengthUnits): string {
  return units === 'ft-in' ? `${formatMm(mm)} (${formatFtIn(mm)})` : formatMm(mm);
}

/**
 * Plain words for the misfits of one change, e.g. "The tee does not fit: the run from F1
 * to T1 is 120.0 mm, it needs 250.5 mm (the take-offs, root gaps and a 50 mm shortest
 * piece): 130.5 mm missing."
 */
export function describeMisfits(what: string, misfits: Misfit[], units: LengthUnits): string {
  const parts = misfits.map(
    (m) =>
      `the run from ${m.fromMark} to ${m.toMark} is ${lengthInBoth(m.availableMm, units)} and needs ${lengthInBoth(m.neededMm, units)} (take-offs, root gaps and the ${formatMm(m.minPieceMm, 0)} shortest piece): ${lengthInBoth(m.missingMm, units)} missing`,
  );
  return `${capitalise(what)} does not fit: ${parts.join('; ')}.`;
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
