import { degToRad, radToDeg } from '../units/angles';
import { fail, ok, positiveLengthProblem, type Calc } from './calc-result';

/** Fitting angles a fitter can buy or cut commonly, degrees. */
export const COMMON_FITTING_ANGLES_DEG = [11.25, 22.5, 30, 45, 60, 90] as const;

/** A simple (two-dimensional) offset made with two fittings of the same angle. */
export type SimpleOffset = {
  /** Centre-to-centre length of the diagonal between the two fittings, mm. */
  travelMm: number;
  /** Distance the offset advances along the original line, mm (0 for 90° fittings). */
  runMm: number;
};

function angleProblem(angleDeg: number): string | null {
  if (!Number.isFinite(angleDeg) || angleDeg <= 0 || angleDeg > 90) {
    return `Fitting angle must be more than 0° and at most 90° (got ${String(angleDeg)}°)`;
  }
  return null;
}

/**
 * Simple offset: travel = set / sin θ and run = set / tan θ, mm. For 45° fittings
 * travel = 1.414 × set and run = set. Take-offs are not subtracted here.
 */
export function simpleOffset(input: { setMm: number; fittingAngleDeg: number }): Calc<SimpleOffset> {
  const problem = positiveLengthProblem('Set', input.setMm) ?? angleProblem(input.fittingAngleDeg);
  if (problem) return fail(problem);
  const a = degToRad(input.fittingAngleDeg);
  const run = input.fittingAngleDeg === 90 ? 0 : input.setMm / Math.tan(a);
  return ok({ travelMm: input.setMm / Math.sin(a), runMm: run });
}

/** A rolling offset: the set lies in neither the vertical nor the horizontal plane. */
export type RollingOffset = {
  /** √(rise² + roll²), mm: the set of the equivalent simple offset. */
  trueOffsetMm: number;
  /** Centre-to-centre travel, mm. */
  travelMm: number;
  /** Advance along the original line, mm. */
  runMm: number;
  /** Fitting angle the offset needs (or was given), degrees. */
  angleDeg: number;
};

/**
 * Rolling offset. true offset = √(rise² + roll²). Give the run to get the fitting angle
 * it needs (travel = √(true² + run²)), or a fitting angle to get run and travel
 * (default 45°, travel = 1.414 × true offset). Not both.
 */
export function rollingOffset(input: {
  riseMm: number;
  rollMm: number;
  runMm?: number;
  fittingAngleDeg?: number;
}): Calc<RollingOffset> {
  const { riseMm, rollMm, runMm, fittingAngleDeg } = input;
  for (const [name, v] of [
    ['Rise', riseMm],
    ['Roll', rollMm],
  ] as const) {
    if (!Number.isFinite(v)) return fail(`${name} must be a number of mm (got ${String(v)})`);
    if (v < 0)
      return fail(`${name} must be 0 or more mm: give its size, the drawing gives its direction (got ${v})`);
  }
  const trueOffset = Math.hypot(riseMm, rollMm);
  if (trueOffset === 0) return fail('Rise and roll are both 0: there is no offset');
  if (runMm !== undefined && fittingAngleDeg !== undefined) {
    return fail('Give the run or the fitting angle, not both: each fixes the other');
  }
  if (runMm !== undefined) {
    if (!Number.isFinite(runMm) || runMm < 0) return fail(`Run must be 0 or more mm (got ${String(runMm)})`);
    return ok({
      trueOffsetMm: trueOffset,
      travelMm: Math.hypot(trueOffset, runMm),
      runMm,
      angleDeg: radToDeg(Math.atan2(trueOffset, runMm)),
    });
  }
  const angle = fittingAngleDeg ?? 45;
  const problem = angleProblem(angle);
  if (problem) return fail(problem);
  const simple = simpleOffset({ setMm: trueOffset, fittingAngleDeg: angle });
  if (!simple.ok) return simple;
  return ok({
    trueOffsetMm: trueOffset,
    travelMm: simple.value.travelMm,
    runMm: simple.value.runMm,
    angleDeg: angle,
  });
}

/**
 * The fitting angle a simple offset with this set and run needs: atan(set / run), degrees,
 * with the travel and the nearest common fitting angle. A run of 0 needs 90° fittings.
 */
export function offsetAngleFor(input: { setMm: number; runMm: number }): Calc<{
  angleDeg: number;
  travelMm: number;
  nearestCommonAngleDeg: number;
}> {
  const problem = positiveLengthProblem('Set', input.setMm);
  if (problem) return fail(problem);
  if (!Number.isFinite(input.runMm) || input.runMm < 0)
    return fail(`Run must be 0 or more mm (got ${String(input.runMm)})`);
  const angleDeg = radToDeg(Math.atan2(input.setMm, input.runMm));
  let nearest: number = COMMON_FITTING_ANGLES_DEG[0];
  for (const a of COMMON_FITTING_ANGLES_DEG)
    if (Math.abs(a - angleDeg) < Math.abs(nearest - angleDeg)) nearest = a;
  return ok({ angleDeg, travelMm: Math.hypot(input.setMm, input.runMm), nearestCommonAngleDeg: nearest });
}
