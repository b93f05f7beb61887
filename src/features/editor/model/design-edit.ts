import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { RunLengthKind, SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { nodeById } from './design-graph';

/** Immutable edits of a design: each returns a new design and leaves the input alone. */

/** The design with one node replaced (matched by `id`). */
export function withNode(design: SpoolDesign, node: SpoolNode): SpoolDesign {
  return { ...design, nodes: design.nodes.map((n) => (n.id === node.id ? node : n)) };
}

/** The design with one run replaced (matched by `id`). */
export function withRun(design: SpoolDesign, run: SpoolRun): SpoolDesign {
  return { ...design, runs: design.runs.map((r) => (r.id === run.id ? run : r)) };
}

/** The design without the given node and run ids. */
export function without(design: SpoolDesign, ids: Set<string>): SpoolDesign {
  return {
    ...design,
    nodes: design.nodes.filter((n) => !ids.has(n.id)),
    runs: design.runs.filter((r) => !ids.has(r.id)),
  };
}

/**
 * The length kind a run's two ends call for, counting flange faces (the engine's rule:
 * a flange end's work point is its face): two → face-to-face; one → centre-to-face;
 * none → centre-to-centre (a bevel end or cap counts as a centre, its end point). A run
 * stated as a cut length keeps `cut`: that is a choice, not a consequence of the ends.
 */
export function inferredLengthKind(design: SpoolDesign, run: SpoolRun): RunLengthKind {
  if (run.length.kind === 'cut') return 'cut';
  const faces = [run.from, run.to].filter((id) => isFlangeFace(nodeById(design, id))).length;
  return faces === 2 ? 'face-to-face' : faces === 1 ? 'centre-to-face' : 'centre-to-centre';
}

/** True for an open end carrying a flange (its work point is the flange face). */
export function isFlangeFace(node: SpoolNode | undefined): boolean {
  return node?.kind === 'end' && (node.end.type === 'weld-neck-flange' || node.end.type === 'slip-on-flange');
}

/** Re-derives the length kind of every run touching `nodeIds` (after a node changed kind). */
export function refreshLengthKinds(design: SpoolDesign, nodeIds: string[]): SpoolDesign {
  const touched = new Set(nodeIds);
  return {
    ...design,
    runs: design.runs.map((r) => {
      if (!touched.has(r.from) && !touched.has(r.to)) return r;
      const kind = inferredLengthKind(design, r);
      return kind === r.length.kind ? r : { ...r, length: { ...r.length, kind } };
    }),
  };
}

/**
 * Work-point-to-work-point distance of a run, mm: the stated length, or for a run stated
 * as a cut length the engine's derived distance (null when the engine could not place it).
 */
export function workPointDistance(run: SpoolRun, result: SpoolResult | null): number | null {
  if (run.length.kind !== 'cut') return run.length.mm;
  const placed = result?.runs.find((r) => r.runId === run.id);
  return placed && Number.isFinite(placed.workPointDistanceMm) ? placed.workPointDistanceMm : null;
}

/** Rounds a length to 0.001 mm so typed and derived values do not carry float noise. */
export function tidyMm(mm: number): number {
  return Math.round(mm * 1000) / 1000;
}
