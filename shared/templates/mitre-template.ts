import { fail, ok, positiveLengthProblem, type Calc } from '../handbook/calc-result';
import { degToRad } from '../units/angles';

/** Input of {@link mitreTemplate}; lengths in mm. */
export type MitreInput = {
  odMm: number;
  /** Total change of direction of the bend, degrees (more than 0, less than 180). */
  bendAngleDeg: number;
  /** Number of pipe pieces (2 … 12); welds = pieces − 1. */
  pieces: number;
  /** Number of stations round the pipe for the cut ordinates (4 … 720). */
  stations: number;
  /** Centreline bend radius; when given, the piece lengths are computed. */
  radiusMm?: number;
};

/** One station of the mitre cut. */
export type MitreStation = {
  index: number;
  angleDeg: number;
  /** Distance round the pipe's outside from station 0, mm. */
  wrapMm: number;
  /** Ordinate from the square line through the throat (short point) toward the cut, mm. */
  ordinateMm: number;
};

/** One pipe piece of the bend, lengths along the pipe between its two ends, mm. */
export type MitrePiece = {
  index: number;
  /** 'end' pieces have one square end (toward the tangent point) and one mitred end. */
  kind: 'end' | 'middle';
  centrelineMm: number;
  /** Throat (inside of the bend, short side). */
  throatMm: number;
  /** Back (outside of the bend, long side). */
  backMm: number;
};

/** A mitred-bend template. */
export type MitreTemplate = {
  welds: number;
  /** Change of direction at each weld, degrees. */
  deflectionPerWeldDeg: number;
  /** Angle of each cut face from square, degrees: deflection per weld / 2. */
  cutAngleDeg: number;
  /** Long-to-short difference across one cut face: OD × tan(cut angle), mm. */
  longShortDifferenceMm: number;
  circumferenceMm: number;
  stations: MitreStation[];
  /** Piece lengths at the given radius; absent when no radius was given. */
  pieces?: MitrePiece[];
  /** Tangent-point-to-intersection distance R·tan(bend/2), mm (with a radius). */
  centreToEndMm?: number;
  angleOrigin: string;
};

/**
 * Mitred bend: cut angle = (bend angle / welds) / 2 from square on each mitred face;
 * ordinates round the pipe for one cut face; with a radius, each piece's centreline,
 * throat and back lengths (end pieces are half segments ending at the tangent points).
 */
export function mitreTemplate(input: MitreInput): Calc<MitreTemplate> {
  const problem = positiveLengthProblem('OD', input.odMm);
  if (problem) return fail(problem);
  if (!Number.isFinite(input.bendAngleDeg) || input.bendAngleDeg <= 0 || input.bendAngleDeg >= 180) {
    return fail(`Bend angle must be more than 0° and less than 180° (got ${String(input.bendAngleDeg)}°)`);
  }
  if (!Number.isInteger(input.pieces) || input.pieces < 2 || input.pieces > 12) {
    return fail(`A mitred bend has 2 to 12 pieces (got ${String(input.pieces)})`);
  }
  if (!Number.isInteger(input.stations) || input.stations < 4 || input.stations > 720) {
    return fail(`Stations must be a whole number from 4 to 720 (got ${String(input.stations)})`);
  }
  const welds = input.pieces - 1;
  const deflection = input.bendAngleDeg / welds;
  const cut = deflection / 2;
  if (cut > 45)
    return fail(
      `A ${input.bendAngleDeg}° bend in ${input.pieces} pieces needs ${cut}° cuts: use more pieces (45° at most)`,
    );
  const tanCut = Math.tan(degToRad(cut));
  const od = input.odMm;
  const stations: MitreStation[] = [];
  for (let i = 0; i < input.stations; i++) {
    const angleDeg = (360 * i) / input.stations;
    stations.push({
      index: i,
      angleDeg,
      wrapMm: (angleDeg / 360) * Math.PI * od,
      ordinateMm: (od / 2) * tanCut * (1 - Math.cos(degToRad(angleDeg))),
    });
  }
  const result: MitreTemplate = {
    welds,
    deflectionPerWeldDeg: deflection,
    cutAngleDeg: cut,
    longShortDifferenceMm: od * tanCut,
    circumferenceMm: Math.PI * od,
    stations,
    angleOrigin:
      'Station 0 is the throat (inside of the bend, the short point) of a cut face; stations run round the pipe either way (the cut is symmetric). ' +
      'Ordinates are measured along the pipe from the square line through the throat toward the cut; the largest is at the back (station 180°).',
  };
  if (input.radiusMm !== undefined) {
    const rProblem = positiveLengthProblem('Bend radius', input.radiusMm);
    if (rProblem) return fail(rProblem);
    const R = input.radiusMm;
    if (R <= od / 2)
      return fail(
        `Bend radius ${R} mm must be more than half the OD (${od / 2} mm) or the throat has no length`,
      );
    const piece = (kind: 'end' | 'middle', index: number): MitrePiece => {
      const n = kind === 'end' ? 1 : 2;
      return {
        index,
        kind,
        centrelineMm: n * R * tanCut,
        throatMm: n * (R - od / 2) * tanCut,
        backMm: n * (R + od / 2) * tanCut,
      };
    };
    result.pieces = Array.from({ length: input.pieces }, (_, i) =>
      piece(i === 0 || i === input.pieces - 1 ? 'end' : 'middle', i),
    );
    result.centreToEndMm = R * Math.tan(degToRad(input.bendAngleDeg / 2));
  }
  return ok(result);
}
