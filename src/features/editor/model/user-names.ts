import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { componentMarks } from '../../../../shared/engine/component-marks';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';

/**
 * The names users see for components and runs: shop marks (F1, E2, T1, OE1…) from
 * `shared/engine/component-marks.ts`, and for a run its two ends ("F1–E1"). Node and run
 * ids are the document's internal keys and never reach the screen.
 */
export type UserNames = {
  /** A component's mark, or "component" when the engine could not place it. */
  node(id: string): string;
  /** A run by its two ends' marks: "F1–E1". */
  run(id: string): string;
  /** A node's mark, or for a run id "run F1–E1". */
  element(id: string): string;
  /** Any text (an engine message, a command label) with every node or run id replaced by its name. */
  text(message: string): string;
};

const TOKEN = /[A-Za-z0-9_.:-]+/g;

/** Names for the ids of `design` as computed in `result` (either may be missing). */
export function userNames(result: SpoolResult | null, design: SpoolDesign | null): UserNames {
  const marks = result ? componentMarks(result) : new Map<string, string>();
  const runEnds = new Map<string, { from: string; to: string }>();
  for (const r of design?.runs ?? []) runEnds.set(r.id, { from: r.from, to: r.to });
  for (const r of result?.runs ?? []) if (!runEnds.has(r.runId)) runEnds.set(r.runId, { from: r.from, to: r.to });
  const nodeIds = new Set<string>([...marks.keys(), ...(design?.nodes.map((n) => n.id) ?? [])]);
  // Piece and weld marks keep their meaning even where a document id happens to spell one.
  const ownMarks = new Set<string>([
    ...(result?.pieces.map((p) => p.mark) ?? []),
    ...(result?.welds.map((w) => w.mark) ?? []),
  ]);
  // A spool of one node (just begun) has no placed component yet: it is the start.
  const lone = design && design.runs.length === 0 && design.nodes.length === 1 ? design.nodes[0]!.id : null;
  const node = (id: string) => marks.get(id) ?? (id === lone ? 'the start' : 'component');
  const run = (id: string) => {
    const ends = runEnds.get(id);
    return ends ? `${node(ends.from)}–${node(ends.to)}` : 'run';
  };
  const text = (message: string) =>
    message.replace(TOKEN, (token) => {
      if (ownMarks.has(token)) return token;
      // Ids end a sentence ("…at n4.") or carry a colon ("Run r2:"): name the id, keep the mark.
      const bare = token.replace(/[.:]+$/, '');
      const tail = token.slice(bare.length);
      if (nodeIds.has(bare)) return node(bare) + tail;
      if (runEnds.has(bare)) return run(bare) + tail;
      return token;
    });
  const element = (id: string) => (runEnds.has(id) && !nodeIds.has(id) ? `run ${run(id)}` : node(id));
  return { node, run, element, text };
}
