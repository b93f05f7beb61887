/**
 * Geometric volumes of fittings and flanges, mm³ (steel and contained water), for weights.
 * Fitting shapes are idealised (torus shell, frustum shell, half ellipsoid); catalogue
 * weights run a few per cent above these.
 */

const QUARTER_PI = Math.PI / 4;

/** Steel and water volume of a straight tube of outside D, bore d, length L (mm), mm³. */
export function tubeVolumes(D: number, d: number, L: number): { steel: number; water: number } {
  return { steel: QUARTER_PI * (D * D - d * d) * L, water: QUARTER_PI * d * d * L };
}

/** Torus shell: bend of radius R (mm) through `angleRad`, outside D, bore d, mm³. */
export function bendVolumes(
  D: number,
  d: number,
  R: number,
  angleRad: number,
): { steel: number; water: number } {
  return tubeVolumes(D, d, R * angleRad);
}

/** Frustum shell of length H from (D1, d1) to (D2, d2), mm³. */
export function frustumVolumes(
  D1: number,
  d1: number,
  D2: number,
  d2: number,
  H: number,
): { steel: number; water: number } {
  const f = (a: number, b: number) => (Math.PI * H * (a * a + a * b + b * b)) / 12;
  return { steel: Math.max(0, f(D1, D2) - f(d1, d2)), water: f(d1, d2) };
}

/** Cap as a half-ellipsoid shell: outside diameter D, depth E, wall t (mm), mm³. */
export function capVolumes(D: number, E: number, t: number): { steel: number; water: number } {
  const a = D / 2;
  const ai = Math.max(0, a - t);
  const ci = Math.max(0, E - t);
  const outer = (2 / 3) * Math.PI * a * a * E;
  const inner = (2 / 3) * Math.PI * ai * ai * ci;
  return { steel: Math.max(0, outer - inner), water: inner };
}

/** Dimensions a flange volume needs, mm. */
export type FlangeShape = {
  odMm: number;
  thicknessMm: number;
  hubLengthMm: number;
  raisedFaceMm: number;
  raisedFaceDiaMm: number;
  hubDiaAtBaseMm: number | null;
  boltCount: number;
  boltHoleDiaMm: number;
  /** Bore: pipe ID for a weld neck, pipe OD for a slip-on, 0 for a blind. */
  boreMm: number;
  /** Weld-end outside diameter (pipe OD) for a weld neck; null otherwise. */
  weldEndOdMm: number | null;
};

/**
 * Flange steel and bore volume: disc (OD × thickness) less bolt holes, plus the hub (a
 * frustum from the hub base X to the weld end for a weld neck, a cylinder of X for a
 * slip-on), plus the raised face, less the bore, mm³.
 */
export function flangeVolumes(f: FlangeShape): { steel: number; water: number } {
  const disc = QUARTER_PI * (f.odMm * f.odMm) * f.thicknessMm;
  const holes = f.boltCount * QUARTER_PI * f.boltHoleDiaMm * f.boltHoleDiaMm * f.thicknessMm;
  const rf = QUARTER_PI * f.raisedFaceDiaMm * f.raisedFaceDiaMm * f.raisedFaceMm;
  const hubLen = Math.max(0, f.hubLengthMm - f.thicknessMm);
  let hub = 0;
  if (f.hubDiaAtBaseMm !== null && hubLen > 0) {
    const X = f.hubDiaAtBaseMm;
    const end = f.weldEndOdMm ?? X;
    hub = (Math.PI * hubLen * (X * X + X * end + end * end)) / 12;
  }
  const length = f.raisedFaceMm + Math.max(f.hubLengthMm, f.thicknessMm);
  const bore = QUARTER_PI * f.boreMm * f.boreMm * length;
  return { steel: Math.max(0, disc - holes + rf + hub - bore), water: f.weldEndOdMm !== null ? bore : 0 };
}

/**
 * One arm of a socket-weld fitting as a plain tube: outside `outsideMm` (socket bore B +
 * 2 × socket wall C), a socket of bore B and depth J, then the fitting bore D for
 * `beyondMm` (towards the fitting centre), mm³. An estimate: forged bodies carry more
 * metal at the corners than tubes do. Water fills only the bore D (the pipe fills the socket).
 */
export function socketArmVolumes(
  outsideMm: number,
  socketBoreMm: number,
  socketDepthMm: number,
  boreMm: number,
  beyondMm: number,
): { steel: number; water: number } {
  const outer = QUARTER_PI * outsideMm * outsideMm * (socketDepthMm + beyondMm);
  const socket = QUARTER_PI * socketBoreMm * socketBoreMm * socketDepthMm;
  const bore = QUARTER_PI * boreMm * boreMm * beyondMm;
  return { steel: Math.max(0, outer - socket - bore), water: bore };
}
