import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';

/**
 * Read-only questions about the design tree (nodes joined by runs, `from` towards the
 * root). Every function is O(nodes + runs) at worst; designs stay in the thousands.
 */

/** The node with this id, or undefined. */
export function nodeById(design: SpoolDesign, id: string): SpoolNode | undefined {
  return design.nodes.find((n) => n.id === id);
}

/** The run with this id, or undefined. */
export function runById(design: SpoolDesign, id: string): SpoolRun | undefined {
  return design.runs.find((r) => r.id === id);
}

/** The run that points `to` this node (none for the root). */
export function incomingRun(design: SpoolDesign, nodeId: string): SpoolRun | undefined {
  return design.runs.find((r) => r.to === nodeId);
}

/** Runs leaving this node, away from the root. */
export function outgoingRuns(design: SpoolDesign, nodeId: string): SpoolRun[] {
  return design.runs.filter((r) => r.from === nodeId);
}

/** Every run touching the node. */
export function runsAt(design: SpoolDesign, nodeId: string): SpoolRun[] {
  return design.runs.filter((r) => r.from === nodeId || r.to === nodeId);
}

/** The root: the node no run points to (the first one if the tree is broken). */
export function rootNode(design: SpoolDesign): SpoolNode | undefined {
  const targets = new Set(design.runs.map((r) => r.to));
  return design.nodes.find((n) => !targets.has(n.id));
}

/** Ids of the node and of every node and run downstream of it (the node itself included). */
export function subtreeIds(design: SpoolDesign, nodeId: string): { nodeIds: Set<string>; runIds: Set<string> } {
  const nodeIds = new Set<string>();
  const runIds = new Set<string>();
  const stack = [nodeId];
  while (stack.length > 0) {
    const id = stack.pop()!;
    if (nodeIds.has(id)) continue; // a broken (cyclic) design must not loop forever
    nodeIds.add(id);
    for (const r of design.runs) {
      if (r.from === id) {
        runIds.add(r.id);
        stack.push(r.to);
      }
    }
  }
  return { nodeIds, runIds };
}

/** Whether `id` names a node or a run of the design (or nothing). */
export function elementKind(design: SpoolDesign, id: string): 'node' | 'run' | null {
  if (nodeById(design, id)) return 'node';
  if (runById(design, id)) return 'run';
  return null;
}

/** Open ends (end nodes), root first. */
export function endNodes(design: SpoolDesign): SpoolNode[] {
  const root = rootNode(design);
  const ends = design.nodes.filter((n) => n.kind === 'end');
  return root ? [...ends.filter((n) => n.id === root.id), ...ends.filter((n) => n.id !== root.id)] : ends;
}
