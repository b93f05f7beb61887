/**
 * Types shared by the take-off steps: what the engine knows about each node once its
 * standards dimensions are looked up, before anything is placed in space.
 */
import type { FlangeClass } from '../standards/flanges';
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { Nps } from '../standards/nps';
import type { PipeDimensions, Schedule } from '../standards/pipe-schedules';
import type { BomItem, JointKind, ResolvedSpec, WeldType } from './compute-result';
import type { Connection, NodeRole } from './classify-nodes';
import type { IssueSink } from './issues';
import type { UnconfirmedSink } from './unconfirmed-data';

/** The pipe of one run: size, schedule, material and B36.10M dimensions (null if unknown). */
export type RunPipe = {
  nps: Nps | null;
  schedule: Schedule;
  material: string;
  heat: string | null;
  dims: PipeDimensions | null;
  spec: ResolvedSpec;
};

/** How a pipe end is prepared where it meets a component. */
export type PrepKind = 'weld-bevel' | 'square' | 'saddle' | 'mitre';

/** One connection of a node with its take-off. */
export type NodeEnd = {
  conn: Connection;
  nps: Nps | null;
  /**
   * From the port (see `portOffset`) to where the pipe end sits, along the run, mm;
   * socket gaps and slip-on setbacks included, butt-weld root gaps not. null: no data.
   */
  takeOffMm: number | null;
  /** Root gap of the butt or branch weld at this end, mm (0 for sockets, slip-ons, open ends). */
  gapMm: number;
  joint: JointKind;
  /** Where the run's centreline meets the node, relative to the work point, mm plant. */
  portOffset: Vec3;
  /** The pipe runs on through the node (header of a branch connection): no weld, same piece. */
  pipeContinues: boolean;
  prep: PrepKind;
  /** Mitre cut angle from square, degrees (prep 'mitre'). */
  mitreCutDeg: number | null;
  /** Weld joining pipe and component here, or null. */
  weldType: WeldType | null;
  /** Number of such welds (slip-on flanges have two fillets). */
  weldCount: number;
  /** Saddle-cut branch: take-off to the crotch (shortest generator), mm. */
  shortPointTakeOffMm: number | null;
  /**
   * Least pipe this end needs beyond the pipe end for its welds to be made (slip-on: the
   * pipe inside the hub plus the hub fillet), mm; `insideMm` of it lies inside the
   * component; `why` in shop words. null: no need.
   */
  pipeNeeded: { mm: number; insideMm: number; why: string } | null;
};

/** Kind-specific facts for drawing and weighing. */
export type NodeDetail =
  | {
      type: 'elbow';
      angleDeg: number;
      bendRadiusMm: number | null;
      construction: 'fitting' | 'mitre';
      mitreWelds: number | null;
      mitreSegmentMm: number | null;
    }
  | { type: 'return'; bendRadiusMm: number | null; centreToCentreMm: number | null; offset: Vec3 }
  | {
      type: 'tee';
      branchNps: Nps | null;
      runCentreToEndMm: number | null;
      branchCentreToEndMm: number | null;
    }
  | {
      type: 'branch';
      branchNps: Nps | null;
      angleDeg: number | null;
      orientationDeg: number | null;
      branchAxis: Vec3 | null;
      headerAxis: Vec3;
      heightMm: number | null;
    }
  | {
      type: 'reducer';
      largeNps: Nps | null;
      smallNps: Nps | null;
      lengthMm: number | null;
      eccentric: boolean;
      largeEnd: Vec3 | null;
      smallEnd: Vec3 | null;
    }
  | {
      type: 'flange';
      flangeType: 'weld-neck-flange' | 'slip-on-flange';
      flangeClass: FlangeClass;
      blind: boolean;
      odMm: number | null;
      thicknessMm: number | null;
      hubLengthMm: number | null;
      raisedFaceMm: number | null;
      raisedFaceDiaMm: number | null;
      hubDiaAtBaseMm: number | null;
      boltCircleMm: number | null;
      boltCount: number | null;
      boltHoleDiaMm: number | null;
    }
  | { type: 'cap'; lengthMm: number | null; socket: boolean }
  | { type: 'open-end'; endType: 'bevel' | 'plain'; fieldWeld: boolean; fieldFitAllowanceMm: number }
  | { type: 'socket-fitting'; fitting: 'elbow90' | 'elbow45' | 'tee' | 'coupling' | null }
  | { type: 'none' };

/** A weld that belongs to the node itself (mitre joints, a branch connection's attachment weld). */
export type InternalWeld = { type: WeldType; nps: Nps; count: number; joins: string };

/** A node with its ends looked up. */
export type NodeAnalysis = {
  node: SpoolNode;
  role: NodeRole;
  ends: NodeEnd[];
  nps: Nps | null;
  description: string;
  /** What the take-off knows of the BOM line; the bill of materials adds size, rating, ends and the rest. */
  bom: Pick<BomItem, 'category' | 'description' | 'nps'> | null;
  source: string | null;
  detail: NodeDetail;
  internalWelds: InternalWeld[];
};

/** What a take-off step receives for one node. */
export type NodeContext = {
  node: SpoolNode;
  role: NodeRole;
  issues: IssueSink;
  /** Standards values from memory that this node's take-offs used. */
  unconfirmed: UnconfirmedSink;
  angleToleranceDeg: number;
  /** Pipe of a run (by id). */
  pipe(runId: string): RunPipe;
  /** Spec at this node for the joint with a run: design ← run ← node overrides. */
  specAt(runId: string | null): ResolvedSpec;
};
