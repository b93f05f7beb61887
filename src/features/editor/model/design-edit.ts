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
 * The length kind a run's two ends call for: both ends open (flange face, pipe end,
 * cap tip) → face-to-face; one → centre-to-face; none → centre-to-centre. A run stated
 * as a cut length keeps `cut`: that is a choice, not a consequence of the ends.
 */
export function inferredLengthKind(design: SpoolDesign, run: SpoolRun): RunLengthKind {
  if (run.length.kind === 'cut') return 'cut';
  const openEnds = [run.from, run.to].filter((id) => nodeById(design, id)?.kind === 'end').length;
  return openEnds === 2 ? 'face-to-face' : openEnds === 1 ? 'centre-to-face' : 'centre-to-centre';
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
