/**
 * Relative bolt-hole rotation of every pair of flanges with the same bolt count: flange
 * a's first hole is carried along the spool to flange b (rotated through each bend by the
 * bend itself, as a fitter transfers a hole line along the pipe; through a tee or branch
 * connection by the turn from its run into its branch), then compared with b's holes as
 * designed. The error is given in degrees and in mm at b's bolt circle, with the
 * correction to apply to b.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { nodeRef } from './component-refs';
import type { FlangeOrientation, FlangePairCheck } from './compute-result';
import type { SpoolGraph } from './build-graph';
import { clockwiseAngleDeg } from './clock-angles';
import { correctionFor, correctionTurnWords, wrapToHalfPitch } from './flange-orientation';
import { apply, applyTransposed, IDENTITY, multiply, rotationBetween, type Mat3 } from './rotation-matrix';
import { addWarning, type IssueSink } from './issues';
import type { NodeAnalysis } from './node-analysis';
import { angleBetweenDeg, anyPerpendicular, cross, dot, negate, normalise } from './vec3-math';

/**
 * Transport frame of every run: the rotation carrying a direction from the first root run
 * to that run through the bends between (each node turns it by the smallest rotation from
 * the run feeding it to the run leaving it; a 180° return about its bend-plane normal).
 * Carrying from run a to run b is then frame(b) · frame(a)ᵀ.
 */
export function runFrames(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  directions: Map<string, Vec3>,
): Map<string, Mat3> {
  const frames = new Map<string, Mat3>();
  for (const run of graph.runOrder) {
    const t = directions.get(run.id)!;
    const parent = graph.parentRun.get(run.from);
    let inDir: Vec3;
    let base: Mat3;
    if (parent) {
      inDir = directions.get(parent.id)!;
      base = frames.get(parent.id) ?? IDENTITY;
    } else {
      const first = graph.childRuns.get(run.from)?.[0];
      if (!first || first.id === run.id) {
        frames.set(run.id, IDENTITY);
        continue;
      }
      inDir = negate(directions.get(first.id)!);
      base = frames.get(first.id) ?? IDENTITY;
    }
    const detail = analyses.get(run.from)?.detail;
    const fallback =
      detail?.type === 'return'
        ? (normalise(cross(inDir, detail.offset)) ?? anyPerpendicular(inDir))
        : anyPerpendicular(inDir);
    frames.set(run.id, multiply(rotationBetween(inDir, t, fallback), base));
  }
  return frames;
}

/** Checks every pair of flanges with equal bolt counts. */
export function flangePairChecks(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  directions: Map<string, Vec3>,
  flanges: FlangeOrientation[],
  toleranceMm: number,
  issues: IssueSink,
): FlangePairCheck[] {
  const out: FlangePairCheck[] = [];
  if (flanges.length < 2) return out;
  const frames = runFrames(graph, analyses, directions);
  const runOfFlange = new Map<string, string>();
  for (const f of flanges) {
    const a = analyses.get(f.nodeId);
    if (a?.role.kind === 'end') runOfFlange.set(f.nodeId, a.role.conn.run.id);
  }
  // Per flange, once: its run's frame, and its first hole carried back to the root frame.
  const frameOf: (Mat3 | undefined)[] = [];
  const holeAtRoot: (Vec3 | null)[] = [];
  for (const f of flanges) {
    const fr = frames.get(runOfFlange.get(f.nodeId) ?? '');
    frameOf.push(fr);
    holeAtRoot.push(fr ? applyTransposed(fr, f.firstHoleDirection) : null);
  }
  for (let i = 0; i < flanges.length; i++) {
    for (let j = i + 1; j < flanges.length; j++) {
      const A = flanges[i]!;
      const B = flanges[j]!;
      if (!A.boltCount || A.boltCount !== B.boltCount) continue;
      const parallelFaces = Math.abs(dot(A.outward, B.outward)) > PARALLEL_COS;
      const fb = frameOf[j];
      const local = holeAtRoot[i];
      const carried = local && fb ? apply(fb, local) : null;
      if (!carried) {
        out.push(uncheckedPair(A.nodeId, B.nodeId, parallelFaces, toleranceMm));
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
        out.push(uncheckedPair(A.nodeId, B.nodeId, parallelFaces, toleranceMm));
        continue;
      }
      const pitch = 360 / B.boltCount!;
      const err = wrapToHalfPitch(clockwiseAngleDeg(B.firstHoleDirection, view, carriedInPlane), pitch);
      const errorDeg = Math.abs(err) < 1e-9 ? 0 : err;
      const errorMm =
        B.boltCircleMm === null ? null : ((B.boltCircleMm / 2) * Math.abs(errorDeg) * Math.PI) / 180;
      const within = errorMm === null ? null : errorMm <= toleranceMm;
      // errorDeg runs from the matched position to b as designed; the correction turns b
      // from its design back onto the matched position (the same sense as a flange's own
      // two-hole correction: applied to b's design, it leaves no error).
      const correction = errorDeg === 0 ? null : correctionFor(B.nodeId, -errorDeg, B.boltCircleMm);
      if (within === false) {
        addWarning(
          issues,
          'flange-rotation-mismatch',
          `${nodeRef(A.nodeId)} and ${nodeRef(B.nodeId)}: matching ${nodeRef(B.nodeId)} to ${nodeRef(A.nodeId)} along the spool leaves its holes ${r(Math.abs(errorDeg))}° (${r(errorMm!)} mm at the bolt circle) off the design; to line them up, turn ${nodeRef(B.nodeId)} ${correctionTurnWords(correction!)} looking at its face from its designed position`,
          B.nodeId,
        );
      }
      out.push({
        a: A.nodeId,
        b: B.nodeId,
        parallelFaces,
        errorDeg,
        errorMm,
        toleranceMm,
        withinTolerance: within,
        correction,
      });
    }
  }
  return out;
}

/** Faces within 0.1° of parallel (cosine). */
const PARALLEL_COS = Math.cos((0.1 * Math.PI) / 180);

function r(x: number): number {
  return Math.round(x * 100) / 100;
}

/** A pair whose holes cannot be compared (no frame to carry a hole across, or faces not square to it). */
function uncheckedPair(a: string, b: string, parallelFaces: boolean, toleranceMm: number): FlangePairCheck {
  return {
    a,
    b,
    parallelFaces,
    errorDeg: null,
    errorMm: null,
    toleranceMm,
    withinTolerance: null,
    correction: null,
  };
}
