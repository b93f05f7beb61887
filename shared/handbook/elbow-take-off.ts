import { degToRad } from '../units/angles';
import { fail, ok, positiveLengthProblem, type Calc } from './calc-result';

/**
 * Centre-to-end of an elbow cut to `angleDeg` from a 90° elbow of centreline radius
 * `bendRadiusMm`: R·tan(θ/2), mm. For whole 90° and 45° elbows use the ASME B16.9 table
 * values instead: the 45° B is longer than R·tan 22.5°.
 */
export function elbowTakeOff(bendRadiusMm: number, angleDeg: number): Calc<number> {
  const problem = positiveLengthProblem('Bend radius', bendRadiusMm);
  if (problem) return fail(problem);
  if (!Number.isFinite(angleDeg) || angleDeg <= 0 || angleDeg > 90) {
    return fail(
      `An elbow cut from a 90° elbow turns more than 0° and at most 90° (got ${String(angleDeg)}°)`,
    );
  }
  return ok(bendRadiusMm * Math.tan(degToRad(angleDeg) / 2));
}
