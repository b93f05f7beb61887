import { z } from 'zod';
import { spoolNodeSchema } from './spool-design-node.schema';
import { spoolRunSchema } from './spool-design-run.schema';
import { specOverridesSchema } from './spool-design-spec.schema';
import { MAX_PLANT_COORDINATE_MM, vec3Schema } from './spool-design-primitives.schema';
import { textSchema } from './text.schema';

/** Format name carried by every design document. */
export const SPOOL_DESIGN_FORMAT = 'tackline.spool';
/** Current format version. Bump it (and add a migration) on any breaking change. */
export const SPOOL_DESIGN_VERSION = 1;

/**
 * Most nodes (work points, each with its fitting or end) one spool design may hold. A shop
 * spool rarely has more than a few hundred components (common practice, no source: a spool is
 * sized to ship and to handle in the bay); larger layouts are split into several spools.
 */
export const MAX_DESIGN_NODES = 500;
/** Most runs one design may hold (a tree of {@link MAX_DESIGN_NODES} nodes has one fewer). */
export const MAX_DESIGN_RUNS = MAX_DESIGN_NODES;

function tooLarge(what: string, limit: number) {
  return (issue: { input?: unknown }) =>
    `A spool design holds at most ${limit} ${what}${Array.isArray(issue.input) ? `; this one has ${issue.input.length}` : ''}. Split it into smaller spools.`;
}

/**
 * The spool design object without the cross-field checks, for editors that want to
 * extend or pick from it. Use {@link spoolDesignSchema} to validate.
 */
export const spoolDesignObjectSchema = z
  .object({
    format: z.literal(SPOOL_DESIGN_FORMAT),
    version: z.literal(SPOOL_DESIGN_VERSION),
    /** Spool mark as drawn (e.g. `CW-201-S03`); the server's spool record is authoritative. */
    mark: textSchema().trim().max(60).optional(),
    /** Free text (line number, service). */
    description: textSchema().max(500).optional(),
    /** Design-wide spec values; omitted ones come from the job defaults. */
    spec: specOverridesSchema.optional(),
    /** Plant position of the root node's work point, mm (x east, y north, z up). */
    origin: vec3Schema,
    /** Work points with their components. The root is the node no run points `to`. */
    nodes: z
      .array(spoolNodeSchema)
      .min(1, 'A design needs at least one node')
      .max(MAX_DESIGN_NODES, { error: tooLarge('nodes', MAX_DESIGN_NODES) }),
    /** Straight runs between nodes; together they must form one tree. */
    runs: z.array(spoolRunSchema).max(MAX_DESIGN_RUNS, { error: tooLarge('runs', MAX_DESIGN_RUNS) }),
  })
  .strict();

/**
 * Zod schema of a spool design document (format `tackline.spool`, version 1): a tree of
 * nodes (work points with components) joined by runs (direction + length). Only the
 * root's position, each run's direction and each run's length are stored; every other
 * position is derived by the engine. Shape errors carry paths (`nodes.2.end.type`);
 * duplicate ids are rejected here; tree and geometry problems are engine issues.
 */
export const spoolDesignSchema = spoolDesignObjectSchema.superRefine((design, ctx) => {
  // Every derived position lies within origin ± the sum of the run lengths: bound that sum too.
  const totalRunMm = design.runs.reduce((sum, run) => sum + run.length.mm, 0);
  if (totalRunMm > MAX_PLANT_COORDINATE_MM) {
    ctx.addIssue({
      code: 'custom',
      path: ['runs'],
      message: `The runs add up to ${Math.round(totalRunMm / 1000)} m; a spool's runs stay under 10 km in total`,
    });
  }
  const seen = new Map<string, string>();
  design.nodes.forEach((node, i) => {
    const prior = seen.get(node.id);
    if (prior) {
      ctx.addIssue({
        code: 'custom',
        path: ['nodes', i, 'id'],
        message: `Duplicate id "${node.id}" (already used by ${prior})`,
      });
    } else seen.set(node.id, `nodes.${i}`);
  });
  design.runs.forEach((run, i) => {
    const prior = seen.get(run.id);
    if (prior) {
      ctx.addIssue({
        code: 'custom',
        path: ['runs', i, 'id'],
        message: `Duplicate id "${run.id}" (already used by ${prior})`,
      });
    } else seen.set(run.id, `runs.${i}`);
  });
});
/** A validated spool design. */
export type SpoolDesign = z.infer<typeof spoolDesignSchema>;
