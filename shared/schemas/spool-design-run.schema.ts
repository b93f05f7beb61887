import { z } from 'zod';
import { npsSchema } from '../standards/nps';
import { specOverridesSchema } from './spool-design-spec.schema';
import { directionSchema, elementIdSchema } from './spool-design-primitives.schema';
import { textSchema } from './text.schema';

/**
 * How a run's length was dimensioned:
 * - `centre-to-centre`, `centre-to-face`, `face-to-face`: work point to work point. A
 *   flange end's work point is its face, so these three measure the same thing; the kind
 *   records how the isometric stated it and is checked against the end components.
 * - `cut`: the pipe's own cut length; the engine derives the work-point distance.
 *   `cut` 0 welds the two fittings straight together (close-coupled, one weld).
 */
export const runLengthKindSchema = z.enum(['centre-to-centre', 'centre-to-face', 'face-to-face', 'cut']);
/** A run length kind. */
export type RunLengthKind = z.infer<typeof runLengthKindSchema>;

/** A stated run length, mm. */
export const runLengthSchema = z
  .object({
    mm: z.number().finite().min(0, 'Length must not be negative').max(1_000_000),
    kind: runLengthKindSchema,
  })
  .strict();

/**
 * A straight run of pipe from node `from` (towards the tree's root) to node `to`.
 * `direction` points from `from` to `to` in plant axes (x east, y north, z up); any
 * length, normalised by the engine.
 */
export const spoolRunSchema = z
  .object({
    id: elementIdSchema,
    from: elementIdSchema,
    to: elementIdSchema,
    direction: directionSchema,
    length: runLengthSchema,
    /** Pipe size; omitted: inherited from the run feeding `from` (a reducer's `toNps`, a branch's size). */
    nps: npsSchema.optional(),
    /** Heat number of the pipe the piece is cut from (traceability). */
    heat: textSchema().trim().min(1).max(40).optional(),
    label: textSchema().max(120).optional(),
    spec: specOverridesSchema.optional(),
  })
  .strict();
/** A run of the spool tree. */
export type SpoolRun = z.infer<typeof spoolRunSchema>;
