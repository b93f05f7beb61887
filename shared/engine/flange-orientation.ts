/**
 * Bolt-hole orientation of each flange: first hole in degrees clockwise, seen facing the
 * flange, from the plant vertical (plant north for a face looking up or down); whether the
 * holes straddle the principal centrelines (first hole 180/n° off, "two-holed"); and the
 * same angle from the plane of the nearest bend, which is what a fitter sets on the bench.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { nodeRef } from './component-refs';
import type { FlangeOrientation, RotationCorrection } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { Connection, NodeRole } from './classify-nodes';
import { clockReference, clockwiseAngleDeg, directionAtClockwiseDeg } from './clock-angles';
import { addError, addWarning, type IssueSink } from './issues';
import type { NodeAnalysis } from './node-analysis';
import { angleBetweenDeg, negate, normalise, rejectFrom } from './vec3-math';

/** Angle within which holes count as straddling, degrees (float noise only). */
export const STRADDLE_TOLERANCE_DEG = 0.01;

/** Wraps `deg` into (−p/2, p/2] for pitch `p` degrees. */
export function wrapToHalfPitch(deg: number, pitchDeg: number): number {
  let d = ((deg % pitchDeg) + pitchDeg) % pitchDeg;
  if (d > pitchDeg / 2) d -= pitchDeg;
  return d;
}

/**
 * A turn of `deltaDeg` from the flange's designed position (positive = clockwise looking at
 * the face) as a correction; see {@link RotationCorrection} for the one convention.
 */
export function correctionFor(
  flangeId: string,
  deltaDeg: number,
  boltCircleMm: number | null,
): RotationCorrection {
  return {
    flangeId,
    rotateClockwiseLookingAtFaceDeg: deltaDeg,
    atBoltCircleMm: boltCircleMm === null ? null : ((boltCircleMm / 2) * Math.abs(deltaDeg) * Math.PI) / 180,
  };
}

/** "12.5° clockwise" / "3° counter-clockwise": a correction's turn in words (looking at the face). */
export function correctionTurnWords(c: RotationCorrection): string {
  const d = c.rotateClockwiseLookingAtFaceDeg;
  return `${r(Math.abs(d))}° ${d >= 0 ? 'clockwise' : 'counter-clockwise'}`;
}

/** Orientation of every flange end, with two-hole checks. */
export function flangeOrientations(
  graph: SpoolGraph,
  roles: Map<string, NodeRole>,
  analyses: Map<string, NodeAnalysis>,
  positions: Map<string, Vec3>,
  toleranceMm: number,
  angleTolDeg: number,
  issues: IssueSink,
): FlangeOrientation[] {
  const out: FlangeOrientation[] = [];
  for (const nodeId of graph.nodeOrder) {
    const a = analyses.get(nodeId);
    const node = graph.nodes.get(nodeId);
    if (!a || a.detail.type !== 'flange' || node?.kind !== 'end' || a.role.kind !== 'end' || !a.nps) continue;
    if (node.end.type !== 'weld-neck-flange' && node.end.type !== 'slip-on-flange') continue;
    const conn = a.role.conn;
    const view = conn.outward; // facing the flange = looking along -(face normal)
    const outward = negate(view);
    const { up, reference } = clockReference(view);
    const n = a.detail.boltCount;
    const pitch = n ? 360 / n : null;
    const requested = node.end.boltRotationDeg;
    const rotationDeg = norm360(requested ?? (pitch ? pitch / 2 : 0));
    const firstHole = directionAtClockwiseDeg(view, up, rotationDeg);
    const offset = pitch ? wrapToHalfPitch(rotationDeg - pitch / 2, pitch) : 0;
    const straddles = pitch !== null && Math.abs(offset) <= STRADDLE_TOLERANCE_DEG;
    const mustTwoHole = node.end.mustTwoHole ?? true;
    let correction: RotationCorrection | null = null;
    if (mustTwoHole && pitch !== null && !straddles) {
      correction = correctionFor(nodeId, -offset, a.detail.boltCircleMm);
      const mm = correction.atBoltCircleMm ?? 0;
      const msg = `${nodeRef(nodeId)} must be two-holed but its first hole is at ${r(rotationDeg)}° from the ${reference === 'plant-vertical' ? 'vertical' : 'north'}: turn it ${correctionTurnWords(correction)} looking at its face (${r(mm)} mm at the bolt circle)`;
      if (mm > toleranceMm) addError(issues, 'flange-not-two-holed', msg, nodeId);
      else addWarning(issues, 'flange-not-two-holed', msg, nodeId);
    }
    const bend = bendReference(roles, analyses, nodeId, conn, angleTolDeg);
    const bendPlaneRotationDeg = bend ? clockwiseAngleDeg(firstHole, view, bend.q) : null;
    out.push({
      nodeId,
      type: node.end.type,
      nps: a.nps,
      flangeClass: a.detail.flangeClass,
      boltCount: n,
      boltCircleMm: a.detail.boltCircleMm,
      faceCentre: positions.get(nodeId)!,
      outward,
      reference,
      rotationDeg,
      firstHoleDirection: firstHole,
      straddles,
      mustTwoHole,
      bendPlaneRotationDeg,
      bendPlaneNodeId: bend?.nodeId ?? null,
      correction,
      raisedFaceMm: a.detail.raisedFaceMm,
    });
  }
  return out;
}

/**
 * Walks from a flange into the spool to the first node that turns, and returns the unit
 * direction (perpendicular to the flange axis) in which the spool turns there.
 */
function bendReference(
  roles: Map<string, NodeRole>,
  analyses: Map<string, NodeAnalysis>,
  flangeId: string,
  start: Connection,
  tolDeg: number,
): { q: Vec3; nodeId: string } | null {
  const axis = start.outward;
  let run = start.run;
  let at = run.from === flangeId ? run.to : run.from;
  for (let step = 0; step < 64; step++) {
    const role = roles.get(at);
    if (!role || role.kind === 'invalid' || role.kind === 'end') return null;
    const conns = connsOf(role);
    const inConn = conns.find((c) => c.run.id === run.id);
    if (!inConn) return null;
    const others = conns.filter((c) => c !== inConn);
    const turning = others.find((c) => angleBetweenDeg(c.outward, inConn.outward) < 180 - tolDeg);
    if (role.kind === 'return') {
      const detail = analyses.get(at)?.detail;
      if (detail?.type !== 'return') return null;
      // The spool turns towards the offset when entering by leg a, away from it by leg b.
      const u = inConn === role.a ? detail.offset : negate(detail.offset);
      const q = normalise(rejectFrom(u, axis));
      return q ? { q, nodeId: at } : null;
    }
    if (turning) {
      const q = normalise(rejectFrom(turning.outward, axis));
      return q ? { q, nodeId: at } : null;
    }
    const straight = others[0];
    if (!straight) return null;
    run = straight.run;
    at = run.from === at ? run.to : run.from;
  }
  return null;
}

/** The connections of a role in a fixed order. */
export function connsOf(role: NodeRole): Connection[] {
  switch (role.kind) {
    case 'end':
      return [role.conn];
    case 'bend':
    case 'return':
    case 'inline':
      return [role.a, role.b];
    case 'tee':
      return [role.runA, role.runB, role.branch];
    case 'header':
      return role.branch ? [role.headerA, role.headerB, role.branch] : [role.headerA, role.headerB];
    case 'invalid':
      return [];
  }
}

function norm360(d: number): number {
  const w = ((d % 360) + 360) % 360;
  return w >= 360 - 1e-9 ? 0 : w;
}

function r(x: number): number {
  return Math.round(x * 100) / 100;
}
