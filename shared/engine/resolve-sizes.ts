/**
 * Gives every run its pipe size: stated on the run, or inherited through the tree (a
 * reducer's `toNps`, a tee's or branch connection's branch size, else the feeding run's
 * size, else the design's main size). Stated sizes that do not fit the component at a
 * joint are errors.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef, runRef } from './component-refs';
import { compareNps, type Nps } from '../standards/nps';
import type { SpoolGraph } from './build-graph';
import type { Connection, NodeRole } from './classify-nodes';
import { addError, type IssueSink } from './issues';

/** Resolved size of each run (null when it cannot be known). */
export type RunSizes = Map<string, Nps | null>;

/** Walks the tree from the root and resolves each run's NPS. */
export function resolveSizes(
  graph: SpoolGraph,
  roles: Map<string, NodeRole>,
  mainNps: Nps | null,
  issues: IssueSink,
): RunSizes {
  const sizes: RunSizes = new Map();
  for (const nodeId of graph.nodeOrder) {
    const node = graph.nodes.get(nodeId)!;
    const role = roles.get(nodeId) ?? { kind: 'invalid' };
    const parent = graph.parentRun.get(nodeId);
    const parentNps = parent ? (sizes.get(parent.id) ?? null) : null;
    const kids = graph.childRuns.get(nodeId) ?? [];
    const kidsMain = kids.find((k) => k.nps)?.nps ?? mainNps;
    const expect = expectedSizes(node, role, parentNps, kidsMain, mainNps, issues);
    for (const kid of kids) {
      const expected = expect(kid.id);
      const stated = kid.nps ?? null;
      if (stated && expected && stated !== expected) {
        const branchOfSetOn =
          node.kind === 'set-on-branch' && role.kind === 'header' && role.branch?.run.id === kid.id;
        if (!(branchOfSetOn && compareNps(stated, expected) < 0)) {
          addError(
            issues,
            'size-mismatch',
            `${runRef(kid.id)} is NPS ${stated} but ${nodeRef(node.id)} gives it NPS ${expected}`,
            kid.id,
          );
        }
      }
      const nps = stated ?? expected;
      if (!nps)
        addError(
          issues,
          'size-unknown',
          `${runRef(kid.id)} has no size: state its NPS (or the design's main size)`,
          kid.id,
        );
      sizes.set(kid.id, nps);
    }
  }
  return sizes;
}

/**
 * Returns, for a child run of `node`, the size the component hands it. `parentNps` is the
 * size of the run feeding the node (null at the root); `kidsMain` the first size stated on
 * a child run, else the design's main size.
 */
function expectedSizes(
  node: SpoolNode,
  role: NodeRole,
  parentNps: Nps | null,
  kidsMain: Nps | null,
  mainNps: Nps | null,
  issues: IssueSink,
): (runId: string) => Nps | null {
  const base = parentNps ?? kidsMain;
  const isBranch = (c: Connection | null | undefined, id: string) => c?.run.id === id;
  switch (node.kind) {
    case 'reducer': {
      if (role.kind !== 'inline') return () => base;
      // Root reducer: the first leg carries the main size, the other the reduced size.
      if (!parentNps) return (id) => (id === role.a.run.id ? (role.a.run.nps ?? mainNps) : node.toNps);
      return () => node.toNps;
    }
    case 'tee': {
      if (role.kind !== 'tee') return () => base;
      const branchNps = node.branchNps ?? null;
      if (role.branch.isParent) {
        // Entered from the branch: the run size is only known for an equal tee.
        if (branchNps && parentNps && branchNps !== parentNps) {
          addError(
            issues,
            'size-mismatch',
            `${nodeRef(node.id)}: the run feeding its branch is NPS ${parentNps}, the tee's branch is NPS ${branchNps}`,
            node.id,
          );
        }
        // Equal tee: the run is the branch's size; reducing: a stated run size, else the main size.
        return () => (branchNps ? kidsMain : parentNps);
      }
      return (id) => (isBranch(role.branch, id) ? (branchNps ?? base) : base);
    }
    case 'half-coupling':
    case 'branch-outlet': {
      if (role.kind !== 'header') return () => base;
      if (role.branch?.isParent) {
        if (parentNps && parentNps !== node.branchNps) {
          addError(
            issues,
            'size-mismatch',
            `${nodeRef(node.id)}: the branch run is NPS ${parentNps}, the connection is NPS ${node.branchNps}`,
            node.id,
          );
        }
        return () => kidsMain;
      }
      return (id) => (isBranch(role.branch, id) ? node.branchNps : base);
    }
    case 'set-on-branch': {
      if (role.kind !== 'header') return () => base;
      if (role.branch?.isParent) return () => kidsMain;
      return () => base;
    }
    default:
      return () => base;
  }
}
