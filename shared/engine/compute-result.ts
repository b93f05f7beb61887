/**
 * Result types of `computeSpool` (shared/engine/compute-spool.ts).
 *
 * Conventions for every field below:
 * - lengths and coordinates in millimetres, masses in kg, angles in degrees;
 * - points and directions in plant coordinates: x = east, y = north, z = up;
 * - directions are unit vectors;
 * - a length that cannot be computed (bad geometry, missing table data) is `null`,
 *   never negative, never NaN; the reason is in `issues`.
 */
import type { FlangeClass } from '../standards/flanges';
import type { GasketType } from '../standards/flange-joint-kits';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { SpoolNodeKind } from '../schemas/spool-design-node.schema';
import type { RunLengthKind } from '../schemas/spool-design-run.schema';
import type { Nps } from '../standards/nps';
import type { Schedule } from '../standards/pipe-schedules';
import type { IssueCode } from './issue-codes';

export type { Vec3 };

/** Spec values after defaults and overrides are applied (all present). Lengths in mm. */
export type ResolvedSpec = {
  nps: Nps | null;
  material: string;
  fittingMaterial: string;
  flangeMaterial: string;
  schedule: Schedule;
  flangeClass: FlangeClass;
  rootGapMm: number;
  sawKerfMm: number;
  minPieceLengthMm: number;
  socketGapMm: number;
  boltHoleToleranceMm: number;
  /** A bend this close to 90° or 45° uses that fitting, pulled at the welds, degrees. */
  fittingAngleToleranceDeg: number;
  /** Bends below this angle get a warning suggesting a straight joint, degrees. */
  minBendAngleDeg: number;
  /** Fitting ends this close to one root gap apart weld together with no pipe, mm. */
  closeCoupleToleranceMm: number;
  /** Least clearance between a branch weld's toe and the next girth or branch weld's toe, mm. */
  minWeldToeClearanceMm: number;
  // Loose items kitted with every flange face (bill of materials).
  gasketType: GasketType;
  /** Gasket material as ordered; null = the default for the kind. */
  gasketMaterial: string | null;
  boltingMaterial: string;
};

/** One problem found in the design. `componentId` is a node id or a run id. */
export type Issue = {
  severity: 'error' | 'warning';
  code: IssueCode;
  message: string;
  componentId?: string;
};

/** An axis-aligned box in plant coordinates, mm. */
export type Box = { min: Vec3; max: Vec3; sizeMm: Vec3 };

/** How one end of a component (or the pipe) is joined. */
export type JointKind = 'butt' | 'socket' | 'slip-on' | 'set-on' | 'flange-face' | 'open';

/** One connection end of a component: where the pipe (or the next fitting) meets it. */
export type ComponentEnd = {
  /** The run that leaves or enters here; null for an open end (flange face, open socket). */
  runId: string | null;
  /** Centre of the end: weld end for butt welds, where the pipe end sits for sockets and slip-ons, the face for flange faces; mm plant. */
  point: Vec3;
  /** Unit vector pointing out of the component through this end. */
  outward: Vec3;
  nps: Nps;
  odMm: number | null;
  joint: JointKind;
  /**
   * Distance from the component's port (its work point, or for returns and eccentric
   * reducers the offset point where the run's centreline meets it) to where the pipe end sits, along the run
   * (centre-to-end for butt welds, to the pipe end for sockets and slip-ons), mm.
   * null when the standards table has no data.
   */
  takeOffMm: number | null;
};

/** Shape data for drawing a component in 3D or on an isometric. */
export type ComponentShape =
  | {
      type: 'elbow';
      /** Centre of curvature, mm plant. */
      arcCentre: Vec3;
      bendRadiusMm: number;
      angleDeg: number;
      /** 'fitting' or 'mitre' (mitre: `mitreWelds` welds, each deflecting angleDeg / mitreWelds). */
      construction: 'fitting' | 'mitre';
      mitreWelds: number | null;
      /** Unit normal of the bend plane (incoming × outgoing). */
      planeNormal: Vec3;
    }
  | { type: 'return'; arcCentre: Vec3; bendRadiusMm: number; centreToCentreMm: number; planeNormal: Vec3 }
  | { type: 'tee'; runAxis: Vec3; branchAxis: Vec3; branchNps: Nps }
  | {
      type: 'set-on-branch';
      headerAxis: Vec3;
      branchAxis: Vec3;
      branchNps: Nps;
      angleDeg: number;
      orientationDeg: number | null;
    }
  | {
      type: 'branch-connection';
      headerAxis: Vec3;
      branchAxis: Vec3;
      branchNps: Nps;
      orientationDeg: number | null;
      heightMm: number | null;
    }
  | {
      type: 'reducer';
      largeEnd: Vec3;
      smallEnd: Vec3;
      largeOdMm: number | null;
      smallOdMm: number | null;
      eccentric: boolean;
      lengthMm: number | null;
    }
  | {
      type: 'flange';
      /** Centre of the raised face, mm plant. */
      faceCentre: Vec3;
      /** Unit normal out of the face, away from the pipe. */
      outward: Vec3;
      odMm: number | null;
      thicknessMm: number | null;
      hubLengthMm: number | null;
      boltCircleMm: number | null;
      boltCount: number | null;
      blind: boolean;
      /** Raised-face height included in the flange's take-off (B16.5 metric tables: 2 mm), mm. */
      raisedFaceMm: number | null;
    }
  | { type: 'cap'; axis: Vec3; lengthMm: number | null }
  | { type: 'open-end'; axis: Vec3 }
  | { type: 'socket-fitting'; fitting: 'elbow90' | 'elbow45' | 'tee' | 'coupling' | 'cap' | null };

/** A component at a node, placed in 3D. */
export type ComponentResult = {
  nodeId: string;
  kind: SpoolNodeKind;
  /** Sheet description, e.g. `Elbow 90° LR NPS 14 STD, ASME B16.9`. */
  description: string;
  nps: Nps | null;
  /** The node's work point, mm plant. */
  position: Vec3;
  ends: ComponentEnd[];
  shape: ComponentShape;
  /** The standards table (and row) the dimensions came from; null if none. */
  source: string | null;
  massKg: number | null;
};

/** A run, placed and resolved. */
export type RunResult = {
  runId: string;
  from: string;
  to: string;
  nps: Nps | null;
  schedule: Schedule;
  /** Unit direction from `from` to `to`. */
  direction: Vec3;
  /** Where the run leaves `from` (its work point, or a return/eccentric port), mm plant. */
  start: Vec3;
  /** Where the run reaches `to`, mm plant. */
  end: Vec3;
  lengthKind: RunLengthKind;
  /** Stated length, mm. */
  statedMm: number;
  /** Start-to-end distance along the run, mm (derived when the length is a cut length). */
  workPointDistanceMm: number;
  takeOffFromMm: number | null;
  takeOffToMm: number | null;
  /** Root gaps (and socket gaps are inside the take-offs) counted on this run, mm. */
  gapsMm: number;
  /** Pipe length that lies in this run, mm; 0 for close-coupled fittings, null when impossible. */
  pipeLengthMm: number | null;
  /** Fittings welded straight together (no pipe). */
  closeCoupled: boolean;
  pieceMark: string | null;
};

/** End preparation of a pipe-piece end (ASME B16.25 for bevels). */
export type EndPrep = {
  /** 'bevel' 37.5°, 'compound-bevel' (wall over 22 mm), 'square', 'saddle' (set-on branch), 'mitre'. */
  type: 'bevel' | 'compound-bevel' | 'square' | 'saddle' | 'mitre';
  /** As printed: `bevel 37.5°`, `square`, `saddle (set-on NPS 14)`, `mitre 22.5°`. */
  label: string;
  /** The node this end meets. */
  nodeId: string;
  /** Mitre ends: the cut angle from square, degrees (for the mitre template). */
  mitreCutDeg?: number;
};

/** One pipe piece of the cut list. */
export type PipePiece = {
  /** P1, P2, … in tree order. */
  mark: string;
  /** Runs this piece lies in (several when a header passes a branch connection; none for a mitre segment). */
  runIds: string[];
  /** The mitred bend a segment belongs to; null for run pieces. */
  nodeId: string | null;
  nps: Nps;
  schedule: Schedule;
  material: string;
  heat: string | null;
  odMm: number | null;
  wallMm: number | null;
  /** Saw length, mm (field-fit allowance included); null when the geometry is impossible. */
  cutLengthMm: number | null;
  /** For a saddle-cut end: the cut length to the long point; this is the shortest generator, mm. */
  shortPointLengthMm: number | null;
  fieldFitAllowanceMm: number;
  /** Cut + one saw kerf, mm: what the piece takes from stock. */
  stockLengthMm: number | null;
  /** Centre of the pipe's own start and end faces, mm plant. */
  start: Vec3;
  end: Vec3;
  ends: [EndPrep, EndPrep];
  massKg: number | null;
};

/** Weld type for the weld map. */
export type WeldType = 'butt' | 'socket' | 'branch' | 'flange' | 'slip-on-fillet';

/** One numbered joint. */
export type WeldResult = {
  /** W1, W2, … in tree order. */
  mark: string;
  type: WeldType;
  nps: Nps;
  /** Nominal size in inches, counted in diameter-inches. */
  diameterInches: number;
  location: 'shop' | 'field';
  /** Weld centre, mm plant. */
  position: Vec3;
  nodeId: string;
  runId: string | null;
  /** What the weld joins, e.g. `P3 to elbow n2`. */
  joins: string;
};

/** Bolt-hole orientation of one flange. */
export type FlangeOrientation = {
  nodeId: string;
  type: 'weld-neck-flange' | 'slip-on-flange';
  nps: Nps;
  flangeClass: FlangeClass;
  boltCount: number | null;
  boltCircleMm: number | null;
  faceCentre: Vec3;
  /** Unit normal out of the face. */
  outward: Vec3;
  /** What angles are measured from: the plant vertical, or plant north for a face looking up or down. */
  reference: 'plant-vertical' | 'plant-north';
  /** First hole, degrees clockwise seen facing the flange, from the reference, in [0, 360). */
  rotationDeg: number;
  /** Unit vector from the flange centre to the first hole. */
  firstHoleDirection: Vec3;
  /** Holes straddle the principal centrelines (first hole 180/n° off). */
  straddles: boolean;
  mustTwoHole: boolean;
  /** First hole measured the same way from the plane of the nearest bend (bench reference); null if none. */
  bendPlaneRotationDeg: number | null;
  bendPlaneNodeId: string | null;
  /** Rotation that makes the holes straddle, when they must and do not. */
  correction: RotationCorrection | null;
  /**
   * Raised-face height the take-off includes, mm: 2 mm from the ASME B16.5 metric tables,
   * where many inch-made flanges have 1/16 in (1.6 mm); shown beside the take-off so a
   * fitter measuring a real flange can tell.
   */
  raisedFaceMm: number | null;
};

/**
 * A turn to give flange `flangeId`, from its position as designed (its `rotationDeg`), that
 * removes the problem. One convention everywhere (the flange's own two-hole check and the
 * flange-pair check): signed degrees, clockwise looking at the flange face, so the
 * corrected design is `boltRotationDeg = rotationDeg + rotateClockwiseLookingAtFaceDeg`.
 */
export type RotationCorrection = {
  flangeId: string;
  /** Signed turn, degrees: positive clockwise, negative counter-clockwise, looking at the face. */
  rotateClockwiseLookingAtFaceDeg: number;
  /** The size of the same turn as arc length at the bolt circle (unsigned), mm. */
  atBoltCircleMm: number | null;
};

/**
 * Two flanges compared: flange `a`'s first hole carried through the spool's bends to `b`
 * (what a fitter gets by matching `b` to `a` along the spool) against `b`'s holes as designed.
 */
export type FlangePairCheck = {
  a: string;
  b: string;
  /** Faces parallel (same or opposite direction). */
  parallelFaces: boolean;
  /**
   * Signed rotation error, degrees, within ± half a hole pitch of `b`: how far `b` as
   * designed sits from the matched position, clockwise looking at `b`'s face. The
   * correction turns `b` by minus this.
   */
  errorDeg: number | null;
  /** |error| as arc length at `b`'s bolt circle, mm. */
  errorMm: number | null;
  toleranceMm: number;
  withinTolerance: boolean | null;
  correction: RotationCorrection | null;
};

/** An open end of the spool and its centre-to-face dimension. */
export type OpenEnd = {
  nodeId: string;
  endType: 'weld-neck-flange' | 'slip-on-flange' | 'bevel' | 'plain' | 'cap' | 'socket-cap';
  /** Face (flange), pipe end (bevel/plain) or tip (cap), mm plant. */
  facePoint: Vec3;
  outward: Vec3;
  /** Work point of the nearest fitting back along the run, and the distance to it, mm. */
  fromNodeId: string | null;
  centreToFaceMm: number | null;
};

/** Overall dimensions. */
export type OverallDimensions = {
  /** Box of all work points, faces and ends, mm plant. */
  workPointBox: Box;
  /** Box including the pipe and fitting outside radii: the shipping envelope, mm plant. */
  envelopeBox: Box;
};

/** A bill-of-materials line. */
export type BomItem = {
  category: 'pipe' | 'fitting' | 'flange' | 'socket-fitting' | 'branch-outlet' | 'bolting' | 'gasket';
  /** The whole line as one sentence, size first (`NPS 10 Elbow 90° LR STD, ASTM A234 WPB, ASME B16.9`). */
  description: string;
  /** The item's own size: the large end of a reducer, the run of a tee, an outlet's own size. */
  nps: Nps;
  /**
   * The second size: a reducer's small end, a reducing tee's outlet, or the header an outlet
   * or half coupling sits on; null for single-size items.
   */
  nps2: Nps | null;
  /** Size as printed: `NPS 10`, `NPS 10 × 6`, `NPS 2 on NPS 10`. */
  sizeLabel: string;
  /** Wall schedule or pressure class as printed: `STD`, `Class 150, STD bore`, `Class 3000`. */
  rating: string | null;
  /** End preparation: `BW` (bevel, ASME B16.25), `SW`, `RF × BW`, `RF`, or the pipe ends cut. */
  endPrep: string | null;
  material: string;
  /** The standard the item is ordered to (`ASME B16.9`, `ASME B16.20`). */
  standard: string;
  /** Shipped loose with the spool, not welded to it (bolts, gaskets, blinds). */
  loose: boolean;
  /** Pieces (pipe), items, or studs (bolting). */
  count: number;
  /** Pipe lines: total cut length and stock length (cut + kerf per cut), mm. */
  totalCutMm: number | null;
  totalStockMm: number | null;
  /** Bolting lines: studs per joint, stud length without points (mm), nuts in all. */
  bolting?: { perJoint: number; joints: number; diameterIn: string; lengthMm: number; nutCount: number };
  /** A value on this line is not confirmed against the standard: the plain warning. */
  note: string | null;
};

/** Bill of materials. */
export type BillOfMaterials = { items: BomItem[] };

/** A weighed item. */
export type WeightItem = {
  /** What `ref` names: a pipe piece mark or a node id (a node may be called "P3" too). */
  kind: 'pipe' | 'component';
  ref: string;
  description: string;
  massKg: number;
  waterKg: number;
  centroid: Vec3;
};

/** Weights and centres of gravity (estimates; see `caution`). */
export type WeightResult = {
  emptyKg: number;
  waterKg: number;
  waterFilledKg: number;
  /** Centre of gravity empty, mm plant; null for a weightless design. */
  centreOfGravity: Vec3 | null;
  centreOfGravityFilled: Vec3 | null;
  items: WeightItem[];
  /** Components left out of the weight (no dimensions to weigh them by). */
  notIncluded: string[];
  caution: string;
};

/** Everything `computeSpool` returns. */
export type SpoolResult = {
  format: 'tackline.spool-result';
  version: 1;
  /** True when there is no error-severity issue: the numbers may be sawn by. */
  ok: boolean;
  spec: ResolvedSpec;
  /** Work point of every node, mm plant. */
  workPoints: { nodeId: string; position: Vec3 }[];
  components: ComponentResult[];
  runs: RunResult[];
  pieces: PipePiece[];
  welds: WeldResult[];
  /** Sum of nominal sizes of all welds, inches. */
  diameterInches: number;
  flanges: FlangeOrientation[];
  flangePairs: FlangePairCheck[];
  openEnds: OpenEnd[];
  overall: OverallDimensions | null;
  bom: BillOfMaterials;
  weights: WeightResult;
  issues: Issue[];
};
