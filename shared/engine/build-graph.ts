/**
 * Builds the spool tree from a validated design: which run feeds each node, which runs
 * leave it, the root, and a depth-first order. Reports tree problems as issues.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef, runRef } from './component-refs';
import type { SpoolRun } from '../schemas/spool-design-run.schema';
import type { SpoolDesign } from '../schemas/spool-design.schema';
import { addError, type IssueSink } from './issues';

/** The spool as a rooted tree. Runs point from parent (`from`) to child (`to`). */
export type SpoolGraph = {
  nodes: Map<string, SpoolNode>;
  runs: Map<string, SpoolRun>;
  rootId: string | null;
  /** The run whose `to` is the node (absent for the root). */
  parentRun: Map<string, SpoolRun>;
  /** Runs leaving each node, in design order. */
  childRuns: Map<string, SpoolRun[]>;
  /** Nodes reachable from the root, depth first (parents before children). */
  nodeOrder: string[];
  /** Runs reachable from the root, depth first. */
  runOrder: SpoolRun[];
};

/**
 * Indexes the design and walks it from the root. Unknown node references, runs to
 * themselves, two runs into one node, no or several roots, cycles and parts not reached
 * from the root are errors; unreachable parts are left out of the walk.
 */
export function buildGraph(design: SpoolDesign, issues: IssueSink): SpoolGraph {
  const nodes = new Map<string, SpoolNode>();
  for (const n of design.nodes) if (!nodes.has(n.id)) nodes.set(n.id, n);
  const runs = new Map<string, SpoolRun>();
  const parentRun = new Map<string, SpoolRun>();
  const childRuns = new Map<string, SpoolRun[]>();
  for (const id of nodes.keys()) childRuns.set(id, []);

  for (const run of design.runs) {
    if (runs.has(run.id) || nodes.has(run.id)) {
      addError(issues, 'duplicate-id', `Run id "${run.id}" is used twice`, run.id);
      continue;
    }
    if (!nodes.has(run.from) || !nodes.has(run.to)) {
      const bad = !nodes.has(run.from) ? run.from : run.to;
      addError(
        issues,
        'unknown-node',
        `${runRef(run.id)} refers to node "${bad}", which is not in the design`,
        run.id,
      );
      continue;
    }
    if (run.from === run.to) {
      addError(issues, 'run-to-self', `${runRef(run.id)} starts and ends at ${nodeRef(run.from)}`, run.id);
      continue;
    }
    const prior = parentRun.get(run.to);
    if (prior) {
      addError(
        issues,
        'cycle',
        `${nodeRef(run.to)} is fed by two runs (${runRef(prior.id)} and ${runRef(run.id)}); runs must point away from the root, and a spool cannot close a loop`,
        run.id,
      );
      continue;
    }
    runs.set(run.id, run);
    parentRun.set(run.to, run);
    childRuns.get(run.from)!.push(run);
  }

  const roots = [...nodes.keys()].filter((id) => !parentRun.has(id));
  let rootId: string | null = null;
  if (roots.length === 0) {
    addError(issues, 'no-root', 'Every node is fed by a run, so there is no root: the runs form a loop');
  } else {
    // With several roots, keep the first (the design's first node, usually) and report the rest.
    rootId = roots[0]!;
    if (roots.length > 1) {
      addError(
        issues,
        'several-roots',
        `The design has ${roots.length} separate parts (roots ${roots.join(', ')}); a spool must be one connected tree`,
        roots[1],
      );
    }
  }

  const nodeOrder: string[] = [];
  const runOrder: SpoolRun[] = [];
  if (rootId !== null) {
    const seen = new Set<string>();
    const stack: string[] = [rootId];
    while (stack.length > 0) {
      const id = stack.pop()!;
      if (seen.has(id)) continue;
      seen.add(id);
      nodeOrder.push(id);
      const kids = childRuns.get(id)!;
      // Push in reverse so the first child run is walked first.
      for (let i = kids.length - 1; i >= 0; i--) stack.push(kids[i]!.to);
    }
    // Run order: each run when its `to` node is reached.
    for (const id of nodeOrder) {
      const r = parentRun.get(id);
      if (r) runOrder.push(r);
    }
    const unreached = [...nodes.keys()].filter((id) => !seen.has(id));
    if (unreached.length > 0 && roots.length <= 1) {
      addError(
        issues,
        'cycle',
        `Nodes ${unreached.join(', ')} form a loop not connected to the root`,
        unreached[0],
      );
    }
    if (unreached.length > 0) {
      addError(
        issues,
        'disconnected',
        `Components not reached from the root ${nodeRef(rootId)}: ${unreached.map(nodeRef).join(', ')} (left out of the results)`,
        unreached[0],
      );
    }
  }

  return { nodes, runs, rootId, parentRun, childRuns, nodeOrder, runOrder };
}
