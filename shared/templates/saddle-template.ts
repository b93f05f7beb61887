import { fail, ok, positiveLengthProblem, type Calc } from '../handbook/calc-result';
import { degToRad } from '../units/angles';

/** Input of {@link setOnBranchTemplate}; all lengths in mm. */
export type SetOnBranchInput = {
  headerOdMm: number;
  branchOdMm: number;
  /** Number of equally spaced stations around the branch (4 … 720), e.g. 16 or 32. */
  stations: number;
  /** Acute angle between the branch and header axes, degrees; 90 = square branch. */
  branchAngleDeg?: number;
  /** Branch wall: when given, the header hole is cut to the branch bore (set-on practice). */
  wallMm?: number;
};

/** One station of the template. */
export type SaddleStation = {
  index: number;
  /** Angle around the branch from station 0, degrees. */
  angleDeg: number;
  /** Distance round the branch's outside from station 0 (position on the wrap), mm. */
  branchWrapMm: number;
  /** Branch cut-back ordinate: along the branch from the datum line toward the header, mm. */
  branchCutBackMm: number;
  /** Header hole point: distance along the header axis from where the branch axis meets the header surface, mm (+ toward station 180). */
  headerHoleAlongMm: number;
  /** Header hole point: arc length round the header's outside from its crest line, mm (+ toward station 90). */
  headerHoleArcMm: number;
};

/** A complete saddle template. */
export type SetOnBranchTemplate = {
  stations: SaddleStation[];
  /** Where station 0 is and how stations and ordinates run, in words for the sheet. */
  angleOrigin: string;
  /** Wrap length of the branch template (π × branch OD), mm. */
  branchCircumferenceMm: number;
  /** Wrap length of the header template (π × header OD), mm. */
  headerCircumferenceMm: number;
  /** The largest cut-back ordinate (at the long point), mm. */
  maxCutBackMm: number;
  /**
   * Distance along the branch axis from the header axis to the datum line (the branch's
   * shortest point), mm: the branch's take-off from the header centreline.
   */
  datumFromHeaderAxisMm: number;
  /** Diameter the header hole is laid out for (branch bore or OD), mm. */
  holeDiameterMm: number;
  /** Caveats for the sheet. */
  notes: string[];
};

function stationsProblem(stations: number): string | null {
  if (!Number.isInteger(stations) || stations < 4 || stations > 720) {
    return `Stations must be a whole number from 4 to 720 (got ${String(stations)})`;
  }
  return null;
}

/**
 * Set-on branch saddle template: the branch end's cut-back and the header hole, as
 * wrap-around ordinates at equally spaced stations, for a 1:1 printed template.
 *
 * Square branch: cut-back y(θ) = R − √(R² − r² sin²θ), R = header OD / 2, r = branch OD / 2.
 * Angled branch (β from the header axis): w(θ) = (−r cos θ cos β + √(R² − r² sin²θ)) / sin β
 * is the distance along the branch axis from the header axis to the cut; cut-back = max(w) − w.
 * The branch outside is laid onto the header outside (the usual template); the weld
 * bevel is then dressed to the WPS.
 */
export function setOnBranchTemplate(input: SetOnBranchInput): Calc<SetOnBranchTemplate> {
  const problem =
    positiveLengthProblem('Header OD', input.headerOdMm) ??
    positiveLengthProblem('Branch OD', input.branchOdMm) ??
    stationsProblem(input.stations);
  if (problem) return fail(problem);
  const R = input.headerOdMm / 2;
  const r = input.branchOdMm / 2;
  if (r > R) {
    return fail(
      `A set-on branch cannot be larger than its header (branch OD ${input.branchOdMm} mm > header OD ${input.headerOdMm} mm)`,
    );
  }
  const beta = input.branchAngleDeg ?? 90;
  if (!Number.isFinite(beta) || beta <= 0 || beta > 90) {
    return fail(
      `Branch angle must be more than 0° and at most 90°, the acute angle between the axes (got ${String(input.branchAngleDeg)}°)`,
    );
  }
  let holeR = r;
  const notes: string[] = [];
  if (input.wallMm !== undefined) {
    const wallProblem = positiveLengthProblem('Branch wall', input.wallMm);
    if (wallProblem) return fail(wallProblem);
    if (input.wallMm >= r)
      return fail(`Branch wall ${input.wallMm} mm leaves no bore in a ${input.branchOdMm} mm OD branch`);
    holeR = r - input.wallMm;
    notes.push('Header hole laid out to the branch bore (OD − 2 × wall).');
  } else {
    notes.push(
      'No branch wall given: header hole laid out to the branch OD; cut it to the bore for a set-on branch.',
    );
  }
  if (beta < 90 && r === R)
    notes.push(
      'Equal-size angled branch: check the fit-up at the flanks, the cut runs to the header centreline there.',
    );

  const b = degToRad(beta);
  const sinB = Math.sin(b);
  const cosB = beta === 90 ? 0 : Math.cos(b);
  const w = (t: number, radius: number) =>
    (-radius * Math.cos(t) * cosB + Math.sqrt(Math.max(0, R * R - radius * radius * Math.sin(t) ** 2))) /
    sinB;
  // w is largest at θ = 180° when angled (both terms peak there) and at θ = 0 when square.
  const wMax = beta === 90 ? R : (R + r * cosB) / sinB;
  const axisMeetsSurfaceAlong = R * (cosB / sinB);

  const stations: SaddleStation[] = [];
  let maxCut = 0;
  for (let i = 0; i < input.stations; i++) {
    const angleDeg = (360 * i) / input.stations;
    const t = degToRad(angleDeg);
    const cut = clean(wMax - w(t, r));
    maxCut = Math.max(maxCut, cut);
    const y = holeR * Math.sin(t);
    const z = Math.sqrt(Math.max(0, R * R - y * y));
    const along = z * (cosB / sinB) - (holeR * Math.cos(t)) / sinB - axisMeetsSurfaceAlong;
    stations.push({
      index: i,
      angleDeg,
      branchWrapMm: (angleDeg / 360) * Math.PI * input.branchOdMm,
      branchCutBackMm: cut,
      headerHoleAlongMm: clean(along),
      headerHoleArcMm: clean(R * Math.asin(Math.max(-1, Math.min(1, y / R)))),
    });
  }
  return ok({
    stations,
    angleOrigin:
      beta === 90
        ? 'Station 0 is on the branch in the plane of both axes, over the header crest, where nothing is cut back (ordinate 0). ' +
          'Stations run clockwise seen from the free end of the branch. Cut-back ordinates are measured along the branch from the square line through station 0 toward the header; ' +
          'the deepest cut-back is at the flanks (stations 90° and 270°). Header hole: along the header axis from the branch centreline, and round the header from its crest.'
        : 'Station 0 is on the branch in the plane of both axes, on the heel side (the obtuse angle between branch and header), where the branch is longest. ' +
          'Stations run clockwise seen from the free end of the branch. Cut-back ordinates are measured along the branch from the square line through the toe (station 180°, the shortest point, ordinate 0) toward the header. ' +
          'Header hole: along the header axis from where the branch centreline meets the header surface (+ toward the toe), and round the header from its crest.',
    branchCircumferenceMm: Math.PI * input.branchOdMm,
    headerCircumferenceMm: Math.PI * input.headerOdMm,
    maxCutBackMm: maxCut,
    datumFromHeaderAxisMm: wMax,
    holeDiameterMm: 2 * holeR,
    notes,
  });
}

/** Rounds away float dust (−0, 1e−13) that would print as "-0.0". */
function clean(x: number): number {
  const r = Math.round(x * 1e9) / 1e9;
  return r === 0 ? 0 : r;
}
