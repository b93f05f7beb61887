import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { nodeById, runsAt } from './design-graph';
import type { Selection } from './editor-selection';

/**
 * The open end a new run grows from: the selected open end (or open socket); with a
 * run selected, the open end it leads to; otherwise the newest open end of the design.
 * Null when there is none.
 */
export function extendTarget(design: SpoolDesign | null, selection: Selection): string | null {
  if (!design) return null;
  if (selection?.type === 'node') {
    const node = nodeById(design, selection.id);
    if (node?.kind === 'end') return node.id;
    if ((node?.kind === 'half-coupling' || node?.kind === 'branch-outlet') && runsAt(design, node.id).length === 2) return node.id;
  }
  if (selection?.type === 'run') {
    const run = design.runs.find((r) => r.id === selection.id);
    const to = run ? nodeById(design, run.to) : undefined;
    if (to?.kind === 'end') return to.id;
  }
  const ends = design.nodes.filter((n) => n.kind === 'end');
  return ends.at(-1)?.id ?? null;
}
