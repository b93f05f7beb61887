/**
 * Relative bolt-hole rotation of every pair of flanges with the same bolt count: flange
 * a's first hole is carried along the spool to flange b (rotated through each bend by the
 * bend itself, as a fitter transfers a hole line along the pipe), then compared with b's
 * holes as designed. The error is given in degrees and in mm at b's bolt circle, with the
 * correction to apply to b.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { FlangeOrientation, FlangePairCheck } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeRole } from './classify-nodes';
import { clockwiseAngleDeg } from './clock-angles';
import { connsOf, correctionFor, wrapToHalfPitch } from './flange-orientation';
import { addWarning, type IssueSink } from './issues';
import type { NodeAnalysis } from './node-analysis';
import { angleBetweenDeg, anyPerpendicular, cross, dot, negate, normalise, transportAcross } from './vec3-math';

/** Nodes from `a` to `b` along the tree (both included), or null if not connected. */
export function treePath(graph: SpoolGraph, a: string, b: string): string[] | null {
  const up = (id: string) => {
    const chain = [id];
    let cur = id;
    for (let guard = 0; guard < graph.nodes.size + 1; guard++) {
      const r = graph.parentRun.get(cur);
      if (!r) break;
      cur = r.from;
      chain.push(cur);
    }
    return chain;
  };
  const ca = up(a);
  const cb = up(b);
  const inB = new Map(cb.map((id, i) => [id, i]));
  const i = ca.findIndex((id) => inB.has(id));
  if (i < 0) return null;
  const j = inB.get(ca[i]!)!;
  return [...ca.slice(0, i + 1), ...cb.slice(0, j).reverse()];
}

/** Carries unit vector `h` (perpendicular to the path) from the first node of `path` to the last. */
function transportAlong(
  graph: SpoolGraph,
  roles: Map<string, NodeRole>,
  analyses: Map<string, NodeAnalysis>,
  path: string[],
  h: Vec3,
): Vec3 | null {
  const runBetween = (x: string, y: string) => {
    const r = graph.parentRun.get(y);
    if (r && r.from === x) return r;
    const s = graph.parentRun.get(x);
    return s && s.from === y ? s : null;
  };
  let v = h;
  for (let k = 1; k + 1 < path.length; k++) {
    const at = path[k]!;
    const rin = runBetween(path[k - 1]!, at);
    const rout = runBetween(at, path[k + 1]!);
    const role = roles.get(at);
    if (!rin || !rout || !role) return null;
    const conns = connsOf(role);
    const cin = conns.find((c) => c.run.id === rin.id);
    const cout = conns.find((c) => c.run.id === rout.id);
    if (!cin || !cout) return null;
    const tIn = negate(cin.outward);
    const tOut = cout.outward;
    const detail = analyses.get(at)?.detail;
    const fallback = detail?.type === 'return' ? (normalise(cross(tIn, detail.offset)) ?? anyPerpendicular(tIn)) : anyPerpendicular(tIn);
    v = transportAcross(v, tIn, tOut, fallback);
  }
  return v;
}

/** Checks every pair of flanges with equal bolt counts. */
export function flangePairChecks(
  graph: SpoolGraph,
  roles: Map<string, NodeRole>,
  analyses: Map<string, NodeAnalysis>,
  flanges: FlangeOrientation[],
  toleranceMm: number,
  issues: IssueSink,
): FlangePairCheck[] {
  const out: FlangePairCheck[] = [];
  for (let i = 0; i < flanges.length; i++) {
    for (let j = i + 1; j < flanges.length; j++) {
      const A = flanges[i]!;
      const B = flanges[j]!;
      if (!A.boltCount || A.boltCount !== B.boltCount) continue;
      const parallelFaces = Math.abs(dot(A.outward, B.outward)) > Math.cos((0.1 * Math.PI) / 180);
      const path = treePath(graph, A.nodeId, B.nodeId);
      const carried = path ? transportAlong(graph, roles, analyses, path, A.firstHoleDirection) : null;
      if (!carried) {
        out.push({ a: A.nodeId, b: B.nodeId, parallelFaces, errorDeg: null, errorMm: null, toleranceMm, withinTolerance: null, correction: null });
        continue;
      }
      const view = negate(B.outward);
      // Angle from the carried hole to b's designed first hole, clockwise facing b.
      const carriedInPlane = normalise({
        x: carried.x - B.outward.x * dot(carried, B.outward),
        y: carried.y - B.outward.y * dot(carried, B.outward),
        z: carried.z - B.outward.z * dot(carried, B.outward),
      });
      if (!carriedInPlane || angleBetweenDeg(carried, carriedInPlane) > 1) {
        out.push({ a: A.nodeId, b: B.nodeId, parallelFaces, errorDeg: null, errorMm: null, toleranceMm, withinTolerance: null, correction: null });
        continue;
      }
      const pitch = 360 / B.boltCount!;
      const err = wrapToHalfPitch(clockwiseAngleDeg(B.firstHoleDirection, view, carriedInPlane), pitch);
      const errorDeg = Math.abs(err) < 1e-9 ? 0 : err;
      const errorMm = B.boltCircleMm === null ? null : ((B.boltCircleMm / 2) * Math.abs(errorDeg) * Math.PI) / 180;
      const within = errorMm === null ? null : errorMm <= toleranceMm;
      const correction = errorDeg === 0 ? null : correctionFor(B.nodeId, errorDeg, B.boltCircleMm);
      if (within === false) {
        addWarning(
          issues,
          'flange-rotation-mismatch',
          `Flanges ${A.nodeId} and ${B.nodeId}: matching ${B.nodeId} to ${A.nodeId} along the spool leaves its holes ${r(Math.abs(errorDeg))}° (${r(errorMm!)} mm at the bolt circle) off the design; rotate ${B.nodeId} ${r(Math.abs(errorDeg))}° ${correction!.sense} from the matched position`,
          B.nodeId,
        );
      }
      out.push({ a: A.nodeId, b: B.nodeId, parallelFaces, errorDeg, errorMm, toleranceMm, withinTolerance: within, correction });
    }
  }
  return out;
}

function r(x: number): number {
  return Math.round(x * 100) / 100;
}
