import { z } from 'zod';
import { npsSchema } from '../standards/nps';
import { specOverridesSchema } from './spool-design-spec.schema';
import {
  directionSchema,
  elbowRadiusSchema,
  elementIdSchema,
  flangeClassSchema,
} from './spool-design-primitives.schema';
import { textSchema } from './text.schema';

const angleDegSchema = z.number().finite().min(-720).max(720);

/** Fields every node carries. */
const nodeBase = {
  id: elementIdSchema,
  /** Free text shown on the sheet beside the component (tag, note). */
  label: textSchema().max(120).optional(),
  /** Spec overrides for this component only (schedule, root gap, class...). */
  spec: specOverridesSchema.optional(),
};

/** A flanged open end. The node's work point is the flange face (raised face included). */
export const flangeEndSchema = z
  .object({
    type: z.enum(['weld-neck-flange', 'slip-on-flange']),
    flangeClass: flangeClassSchema.optional(),
    /**
     * First bolt hole, degrees clockwise seen facing the flange face, from the plant
     * vertical (plant north for a flange facing up or down). Omitted: the holes
     * straddle the centrelines (first hole at 180/n°).
     */
    boltRotationDeg: angleDegSchema.optional(),
    /** The holes must straddle the principal centrelines ("two-holed"). Default true. */
    mustTwoHole: z.boolean().optional(),
    /** A blind flange is bolted to this flange for shipping or service. */
    blind: z.boolean().optional(),
  })
  .strict();

/** An open pipe end bevelled for a weld (usually a field weld). Work point = pipe end. */
export const bevelEndSchema = z
  .object({
    type: z.literal('bevel'),
    /** The end is welded in the field (listed as a field weld). Default true. */
    fieldWeld: z.boolean().optional(),
    /** Extra length left on the pipe for field fitting, mm; added to the cut length. */
    fieldFitAllowanceMm: z.number().finite().min(0).max(2000).optional(),
  })
  .strict();

/** An open square-cut pipe end (e.g. for a field socket or a mechanical joint). */
export const plainEndSchema = z.object({ type: z.literal('plain') }).strict();

/** A butt-weld cap (ASME B16.9). Work point = the cap's outer end (its tip). */
export const capEndSchema = z.object({ type: z.literal('cap') }).strict();

/** A socket-weld cap (ASME B16.11). Work point = the cap's outer end. */
export const socketCapEndSchema = z.object({ type: z.literal('socket-cap') }).strict();

/** What sits at an open end of the spool. */
export const endSpecSchema = z.discriminatedUnion('type', [
  flangeEndSchema,
  bevelEndSchema,
  plainEndSchema,
  capEndSchema,
  socketCapEndSchema,
]);
/** An end's component. */
export type EndSpec = z.infer<typeof endSpecSchema>;

/** An open end of the spool: exactly one run meets it. */
export const endNodeSchema = z.object({ ...nodeBase, kind: z.literal('end'), end: endSpecSchema }).strict();

/**
 * A bend between two runs. The angle is derived from the two run directions: 90° and
 * 45° use the ASME B16.9 tables, any other angle up to 90° is cut from a 90° elbow
 * (take-off R·tan(θ/2)). `construction: 'mitre'` builds it from pipe with `mitreWelds` welds.
 */
export const elbowNodeSchema = z
  .object({
    ...nodeBase,
    kind: z.literal('elbow'),
    radius: elbowRadiusSchema.optional(),
    construction: z.enum(['fitting', 'mitre']).optional(),
    /** Number of mitre welds in a mitred bend (2 → a three-piece mitre). Default 2. */
    mitreWelds: z.number().int().min(1).max(8).optional(),
  })
  .strict();

/**
 * A 180° return (ASME B16.9). The incoming and outgoing runs are antiparallel. The work
 * point is the centre of the bend; `offsetDirection` points from the incoming leg's
 * centreline to the outgoing leg's (perpendicular to the legs; normalised).
 */
export const returnNodeSchema = z
  .object({
    ...nodeBase,
    kind: z.literal('return'),
    radius: elbowRadiusSchema.optional(),
    offsetDirection: directionSchema,
  })
  .strict();

/**
 * A butt-weld tee (ASME B16.9). Two of its three runs are collinear (the run), the third
 * perpendicular (the branch). `branchNps` omitted: an equal tee.
 */
export const teeNodeSchema = z
  .object({ ...nodeBase, kind: z.literal('tee'), branchNps: npsSchema.optional() })
  .strict();

/**
 * A set-on branch: the branch pipe is saddle-cut and welded onto the header pipe, which
 * runs through unbroken. Branch size = the branch run's size (equal or smaller). The
 * branch axis may meet the header at 90° or at an angle (not below 30°).
 */
export const setOnBranchNodeSchema = z.object({ ...nodeBase, kind: z.literal('set-on-branch') }).strict();

/**
 * Orientation of a small-bore connection around its header, degrees clockwise looking
 * along the header run (from its `from` node towards its `to` node), 0 = top (plant
 * vertical; plant north if the header is vertical).
 */
const orientationDegSchema = angleDegSchema;

/**
 * A Class 3000 socket-weld half coupling (ASME B16.11) welded onto the header. With a
 * branch run the branch direction gives its orientation; with none it is an open socket
 * and `orientationDeg` places it.
 */
export const halfCouplingNodeSchema = z
  .object({
    ...nodeBase,
    kind: z.literal('half-coupling'),
    branchNps: npsSchema,
    orientationDeg: orientationDegSchema.optional(),
  })
  .strict();

/**
 * A weld-on branch outlet (butt-weld or socket-weld outlet end). No published standard
 * gives its height, so the maker's catalogue height is stated: `heightMm` from the
 * header's outside surface to the outlet end (butt) or outlet face (socket).
 */
export const branchOutletNodeSchema = z
  .object({
    ...nodeBase,
    kind: z.literal('branch-outlet'),
    branchNps: npsSchema,
    outletEnd: z.enum(['butt', 'socket']),
    heightMm: z.number().finite().positive().max(1000),
    orientationDeg: orientationDegSchema.optional(),
  })
  .strict();

/**
 * A reducer (ASME B16.9) between the incoming run and the outgoing run of size `toNps`.
 * Its work point is the middle of its length on the large end's axis. Eccentric: the
 * `flatSide` stays flush ('top', 'bottom', or a plant direction).
 */
export const reducerNodeSchema = z
  .object({
    ...nodeBase,
    kind: z.literal('reducer'),
    toNps: npsSchema,
    type: z.enum(['concentric', 'eccentric']).optional(),
    flatSide: z.union([z.enum(['top', 'bottom']), directionSchema]).optional(),
  })
  .strict();

/**
 * A Class 3000 socket-weld fitting (ASME B16.11) joining small-bore runs: two runs at 90°
 * or 45° (elbow), two collinear runs (coupling), three runs (tee). Work point = fitting centre.
 */
export const socketFittingNodeSchema = z.object({ ...nodeBase, kind: z.literal('socket-fitting') }).strict();

/** A work point with the one component that sits there. */
export const spoolNodeSchema = z.discriminatedUnion('kind', [
  endNodeSchema,
  elbowNodeSchema,
  returnNodeSchema,
  teeNodeSchema,
  setOnBranchNodeSchema,
  halfCouplingNodeSchema,
  branchOutletNodeSchema,
  reducerNodeSchema,
  socketFittingNodeSchema,
]);
/** A node of the spool tree. */
export type SpoolNode = z.infer<typeof spoolNodeSchema>;
/** The node kinds. */
export type SpoolNodeKind = SpoolNode['kind'];
