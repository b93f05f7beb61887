/**
 * Works out, from run directions alone, what each connection of a node is: the two legs
 * of a bend, the run and branch of a tee, the header and branch of a branch connection.
 * Angles no component makes, and wrong numbers of runs, are errors here.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef } from './component-refs';
import type { SpoolRun } from '../schemas/spool-design-run.schema';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { SpoolGraph } from './build-graph';
import { addError, type IssueSink } from './issues';
import { angleBetweenDeg, negate, normalise } from './vec3-math';

/** One run meeting a node; `outward` is the unit vector from the node along the run. */
export type Connection = { run: SpoolRun; isParent: boolean; outward: Vec3 };

/** What the connections of a node are, by geometry. */
export type NodeRole =
  | { kind: 'end'; conn: Connection }
  /** Two legs at a bend of `angleDeg` (0 = straight through, 90 = square). */
  | { kind: 'bend'; a: Connection; b: Connection; angleDeg: number }
  /** Two legs on the same side, parallel: a 180° return. `a` is the incoming leg. */
  | { kind: 'return'; a: Connection; b: Connection }
  /** Two collinear legs (reducer, coupling). */
  | { kind: 'inline'; a: Connection; b: Connection }
  /** Two collinear run legs and a branch; `branchAngleDeg` between branch and run axis, in (0, 90]. */
  | { kind: 'tee'; runA: Connection; runB: Connection; branch: Connection; branchAngleDeg: number }
  /** A header passing through, with an optional branch run. */
  | {
      kind: 'header';
      headerA: Connection;
      headerB: Connection;
      branch: Connection | null;
      branchAngleDeg: number | null;
    }
  /** Not usable; the reason is already an issue. */
  | { kind: 'invalid' };

/** Angle tolerances, degrees. */
export type AngleTolerance = { angleDeg: number };

/** The connections of `nodeId`: its parent run first, then its child runs in design order. */
export function connectionsOf(
  graph: SpoolGraph,
  nodeId: string,
  directions: Map<string, Vec3>,
): Connection[] {
  const out: Connection[] = [];
  const p = graph.parentRun.get(nodeId);
  if (p) out.push({ run: p, isParent: true, outward: negate(directions.get(p.id)!) });
  for (const c of graph.childRuns.get(nodeId) ?? []) {
    if (graph.runs.has(c.id)) out.push({ run: c, isParent: false, outward: directions.get(c.id)! });
  }
  return out;
}

/** Unit direction of every run (the schema already refuses zero vectors). */
export function runDirections(graph: SpoolGraph): Map<string, Vec3> {
  const m = new Map<string, Vec3>();
  for (const r of graph.runs.values()) m.set(r.id, normalise(r.direction) ?? { x: 1, y: 0, z: 0 });
  return m;
}

const EXPECTED: Record<SpoolNode['kind'], [number, number]> = {
  end: [1, 1],
  elbow: [2, 2],
  return: [2, 2],
  tee: [3, 3],
  'set-on-branch': [3, 3],
  'half-coupling': [2, 3],
  'branch-outlet': [2, 3],
  reducer: [2, 2],
  'socket-fitting': [2, 3],
};

/** Classifies one node from its connections, reporting geometry errors. */
export function classifyNode(
  node: SpoolNode,
  conns: Connection[],
  tol: AngleTolerance,
  issues: IssueSink,
): NodeRole {
  const [lo, hi] = EXPECTED[node.kind];
  if (conns.length < lo || conns.length > hi) {
    const want = lo === hi ? `${lo}` : `${lo} or ${hi}`;
    addError(
      issues,
      'wrong-connection-count',
      `${nodeRef(node.id)} needs ${want} run(s); it has ${conns.length}`,
      node.id,
    );
    return { kind: 'invalid' };
  }
  if (node.kind === 'end') return { kind: 'end', conn: conns[0]! };

  if (conns.length === 2) {
    const [a, b] = conns as [Connection, Connection];
    const between = angleBetweenDeg(a.outward, b.outward);
    const bend = 180 - between;
    if (node.kind === 'return') {
      if (between > tol.angleDeg) {
        addError(
          issues,
          'angle-not-made',
          `${nodeRef(node.id)}: its legs must be parallel and on the same side (they are ${fmt(between)}° apart)`,
          node.id,
        );
        return { kind: 'invalid' };
      }
      return { kind: 'return', a, b };
    }
    if (node.kind === 'reducer' || node.kind === 'half-coupling' || node.kind === 'branch-outlet') {
      if (bend > tol.angleDeg) {
        addError(
          issues,
          'angle-not-made',
          `${nodeRef(node.id)} must sit on a straight line; its runs turn ${fmt(bend)}°`,
          node.id,
        );
        return { kind: 'invalid' };
      }
      if (node.kind === 'reducer') return { kind: 'inline', a, b };
      return { kind: 'header', headerA: a, headerB: b, branch: null, branchAngleDeg: null };
    }
    if (node.kind === 'socket-fitting' && bend <= tol.angleDeg) return { kind: 'inline', a, b };
    return { kind: 'bend', a, b, angleDeg: bend };
  }

  // Three connections: find the collinear pair.
  const pairs: [number, number, number][] = [
    [0, 1, 2],
    [0, 2, 1],
    [1, 2, 0],
  ];
  for (const [i, j, k] of pairs) {
    const a = conns[i]!;
    const b = conns[j]!;
    if (180 - angleBetweenDeg(a.outward, b.outward) <= tol.angleDeg) {
      const branch = conns[k]!;
      const raw = angleBetweenDeg(branch.outward, a.outward);
      const branchAngleDeg = raw > 90 ? 180 - raw : raw;
      if (node.kind === 'tee' || node.kind === 'socket-fitting') {
        if (Math.abs(branchAngleDeg - 90) > tol.angleDeg) {
          addError(
            issues,
            'angle-not-made',
            `${nodeRef(node.id)}: the branch meets the run at ${fmt(branchAngleDeg)}°; tees are made at 90° only`,
            node.id,
          );
          return { kind: 'invalid' };
        }
        return { kind: 'tee', runA: a, runB: b, branch, branchAngleDeg };
      }
      return { kind: 'header', headerA: a, headerB: b, branch, branchAngleDeg };
    }
  }
  addError(
    issues,
    'angle-not-made',
    `${nodeRef(node.id)}: no two of its runs are in line, so no header or run passes through`,
    node.id,
  );
  return { kind: 'invalid' };
}

function fmt(x: number): string {
  return (Math.round(x * 100) / 100).toString();
}
