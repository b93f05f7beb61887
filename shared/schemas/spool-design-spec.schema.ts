import { z } from 'zod';
import { npsSchema } from '../standards/nps';
import { scheduleSchema } from '../standards/pipe-schedules';
import { flangeClassSchema } from './spool-design-primitives.schema';
import { textSchema } from './text.schema';
import { GASKET_TYPES } from '../standards/flange-joint-kits';

/**
 * Spec values a design, a run or a node may set. Every field is optional: what a
 * component leaves out comes from its run, then the design's `spec`, then the job
 * defaults, then Tackline's built-in defaults (see `resolveSpec` in shared/engine).
 * Lengths in mm.
 */
export const specOverridesSchema = z
  .object({
    /** Main line size for runs that state none (the root run's size). */
    nps: npsSchema.optional(),
    /** Pipe material, as the sheet prints it (e.g. `ASTM A106 Gr B`). */
    material: textSchema().trim().min(1).max(80).optional(),
    /** Butt-weld fitting material (e.g. `ASTM A234 WPB`). */
    fittingMaterial: textSchema().trim().min(1).max(80).optional(),
    /** Flange and forged socket-fitting material (e.g. `ASTM A105`). */
    flangeMaterial: textSchema().trim().min(1).max(80).optional(),
    schedule: scheduleSchema.optional(),
    flangeClass: flangeClassSchema.optional(),
    /** Root opening of every open-root butt and branch weld, mm. */
    rootGapMm: z.number().finite().min(0).max(10).optional(),
    /** Saw kerf lost per cut, mm (bill of materials stock lengths). */
    sawKerfMm: z.number().finite().min(0).max(20).optional(),
    /** Shortest pipe piece the shop will fit and weld, mm. */
    minPieceLengthMm: z.number().finite().min(0).max(10_000).optional(),
    /** Expansion gap left at the bottom of every socket before welding, mm. */
    socketGapMm: z.number().finite().min(0).max(5).optional(),
    /** Allowed bolt-hole rotation between flanges, mm at the bolt circle. */
    boltHoleToleranceMm: z.number().finite().min(0).max(20).optional(),
    /**
     * A bend within this of a standard fitting angle (90°, 45°) uses that fitting, pulled
     * at the welds, instead of a cut elbow, degrees.
     */
    fittingAngleToleranceDeg: z.number().finite().min(0).max(5).optional(),
    /** Bends below this angle are better taken up at a straight butt weld, degrees. */
    minBendAngleDeg: z.number().finite().min(0).max(15).optional(),
    /**
     * Fittings whose ends are within this of one root gap apart weld straight together
     * (no pipe piece); covers the fittings' own dimensional tolerance, mm.
     */
    closeCoupleToleranceMm: z.number().finite().min(0).max(10).optional(),
    /** Least clearance between the toes of a branch weld and a nearby girth or branch weld, mm. */
    minWeldToeClearanceMm: z.number().finite().min(0).max(1000).optional(),

    // ── Loose items kitted with every flange face (bill of materials) ──────────────────
    /** Gasket kind: ASME B16.20 spiral-wound (default) or ASME B16.21 flat sheet ring. */
    gasketType: z.enum(GASKET_TYPES).optional(),
    /** Gasket material as ordered; blank = Tackline's default for the kind. */
    gasketMaterial: textSchema().trim().min(1).max(80).optional(),
    /** Stud and nut material (e.g. `ASTM A193 B7 studs, A194 2H nuts`). */
    boltingMaterial: textSchema().trim().min(1).max(80).optional(),
    // ── end of loose-item fields ──────────────────────────────────────────────────────
  })
  .strict();
/** Partial spec values (a design's, a run's or a node's overrides). */
export type SpecOverrides = z.infer<typeof specOverridesSchema>;
