/**
 * Mitred bends: the middle segments between mitre welds, as cut-list pieces, and the joint
 * positions of a mitred bend (the polygon circumscribing the bend arc).
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { PipePiece } from './compute-result';
import type { SpoolGraph } from './build-graph';
import { endPrepFor } from './end-prep';
import type { NodeAnalysis, RunPipe } from './node-analysis';
import { add, addScaled, cross, dot, normalise, rotateAbout, scale, sub } from './vec3-math';
import { pieceMark } from './mark-text';

/** Pieces for the middle segments of every mitred bend, marked after `firstMark` pieces. */
export function mitreSegmentPieces(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  pipes: Map<string, RunPipe>,
  positions: Map<string, Vec3>,
  firstMark: number,
): PipePiece[] {
  const out: PipePiece[] = [];
  for (const nodeId of graph.nodeOrder) {
    const a = analyses.get(nodeId);
    if (!a || a.detail.type !== 'elbow' || a.detail.construction !== 'mitre' || !a.nps) continue;
    const welds = a.detail.mitreWelds ?? 0;
    const seg = a.detail.mitreSegmentMm;
    const R = a.detail.bendRadiusMm;
    const [ea, eb] = a.ends;
    const wp = positions.get(nodeId);
    if (welds < 2 || !ea || !eb || !wp || R === null) continue;
    const pipe = pipes.get(ea.conn.run.id)!;
    const verts = mitreVertices(wp, ea.conn.outward, eb.conn.outward, R, a.detail.angleDeg, welds);
    const cutDeg = a.detail.angleDeg / welds / 2;
    const prep = endPrepFor({ ...ea, prep: 'mitre', mitreCutDeg: cutDeg }, nodeId, pipe.dims?.wallMm ?? null);
    const g = pipe.spec.rootGapMm;
    for (let i = 0; i + 1 < verts.length; i++) {
      const v0 = verts[i]!;
      const v1 = verts[i + 1]!;
      const dir = normalise(sub(v1, v0)) ?? ea.conn.outward;
      const cut = seg;
      out.push({
        mark: pieceMark(firstMark + out.length + 1),
        runIds: [],
        nodeId,
        nps: a.nps,
        schedule: pipe.schedule,
        material: pipe.material,
        heat: pipe.heat,
        odMm: pipe.dims?.odMm ?? null,
        wallMm: pipe.dims?.wallMm ?? null,
        cutLengthMm: cut,
        shortPointLengthMm:
          cut !== null && pipe.dims
            ? Math.max(0, cut - pipe.dims.odMm * Math.tan((cutDeg * Math.PI) / 180))
            : null,
        fieldFitAllowanceMm: 0,
        stockLengthMm: cut === null ? null : cut + pipe.spec.sawKerfMm,
        start: addScaled(v0, dir, g / 2),
        end: addScaled(v1, dir, -g / 2),
        ends: [prep, prep],
        massKg: null,
      });
    }
  }
  return out;
}

/**
 * Joint positions of a mitred bend at work point `wp` with legs along unit `oa`, `ob`
 * (outward), radius R (mm), total deflection `angleDeg` and `welds` joints: the vertices of
 * the polygon circumscribing the bend arc, from leg `a` to leg `b`.
 */
export function mitreVertices(
  wp: Vec3,
  oa: Vec3,
  ob: Vec3,
  R: number,
  angleDeg: number,
  welds: number,
): Vec3[] {
  const theta = (angleDeg * Math.PI) / 180;
  const alpha = theta / welds;
  const bis = normalise(add(oa, ob));
  const n = normalise(cross(oa, ob));
  if (!bis || !n) return [];
  const centre = addScaled(wp, bis, R / Math.cos(theta / 2));
  const startTangent = addScaled(wp, oa, R * Math.tan(theta / 2));
  const radial = sub(startTangent, centre);
  const endTangent = addScaled(wp, ob, R * Math.tan(theta / 2));
  // Sweep sense: the rotation about ±n that carries the start radius to the end radius.
  const trial = rotateAbout(radial, n, theta);
  const sense =
    dot(sub(add(centre, trial), endTangent), sub(add(centre, trial), endTangent)) < 1e-6 * R * R ? 1 : -1;
  const out: Vec3[] = [];
  const reach = R / Math.cos(alpha / 2);
  for (let i = 0; i < welds; i++) {
    const phi = (i + 0.5) * alpha;
    const dir = normalise(rotateAbout(radial, scale(n, sense), phi))!;
    out.push(addScaled(centre, dir, reach));
  }
  return out;
}
