/**
 * Standard fitting angles: a bend within the shop's tolerance of 90° or 45° uses that
 * fitting and the difference is pulled at the welds, rather than cutting an elbow to a
 * fraction of a degree.
 */
import { addWarning, type IssueSink } from './issues';

/** The standard angle chosen for a bend, and how far the bend is from it, degrees. */
export type StandardAngle = { angleDeg: number; pulledDeg: number };

/**
 * The nearest of `standards` (degrees) within `toleranceDeg` of `angleDeg`, or null.
 * `toleranceDeg` is the shop's pull tolerance, never less than the geometric one.
 */
export function standardAngleFor(
  angleDeg: number,
  standards: readonly number[],
  toleranceDeg: number,
): StandardAngle | null {
  let best: StandardAngle | null = null;
  for (const s of standards) {
    const d = angleDeg - s;
    if (Math.abs(d) <= toleranceDeg && (!best || Math.abs(d) < Math.abs(best.pulledDeg)))
      best = { angleDeg: s, pulledDeg: d };
  }
  return best;
}

/**
 * Warns that `what` (shop words) is a standard `chosen.angleDeg` fitting on a bend of
 * `actualDeg`, so the fitter pulls the difference at its welds. Silent below `quietDeg`
 * (the geometric tolerance: float noise of typed directions).
 */
export function warnPulled(
  issues: IssueSink,
  what: string,
  nodeId: string,
  actualDeg: number,
  chosen: StandardAngle,
  quietDeg: number,
): void {
  if (Math.abs(chosen.pulledDeg) <= quietDeg) return;
  const pull = Math.abs(chosen.pulledDeg);
  addWarning(
    issues,
    'angle-pulled',
    `${what}: the runs turn ${r2(actualDeg)}°; a standard ${chosen.angleDeg}° fitting is used and ${r2(pull)}° is pulled at its welds (${chosen.pulledDeg > 0 ? 'opened' : 'closed'} by ${r2(pull)}°): check the fit-up`,
    nodeId,
  );
}

function r2(x: number): number {
  return Math.round(x * 100) / 100;
}
