/**
 * Weights empty and water-filled, and centres of gravity. Pipe from its B36.10M mass per
 * metre; fittings and flanges from their geometric volumes (steel 7850 kg/m³). Estimates:
 * no bolts, gaskets, weld metal or paint.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { nodeRef } from './component-refs';
import type { PipePiece, WeightItem, WeightResult } from './compute-result';
import type { SpoolGraph } from './build-graph';
import {
  bendVolumes,
  capVolumes,
  flangeVolumes,
  frustumVolumes,
  socketArmVolumes,
  tubeVolumes,
} from './fitting-volumes';
import { socketWeldDimensions, type SocketWeldDimensions } from '../standards/socket-weld-fittings';
import { cachedPipeDimensions } from './standards-cache';
import { addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, RunPipe } from './node-analysis';
import { add, addScaled, normalise, scale } from './vec3-math';

/** Density of carbon steel, kg/mm³ (7850 kg/m³). */
export const STEEL_KG_PER_MM3 = 7850e-9;
/** Density of water, kg/mm³ (1000 kg/m³). */
export const WATER_KG_PER_MM3 = 1000e-9;

/** Shown wherever a weight or centre of gravity is. */
export const WEIGHT_CAUTION =
  'Weights and centre of gravity are estimates from nominal dimensions (steel 7850 kg/m³, water 1000 kg/m³), without bolts, gaskets, weld metal or paint. Lifts must be planned by a competent person.';

type Mass = { steel: number; water: number };

/** Mass (kg) and water (kg) of a pipe piece, from its mass per metre and bore. */
export function pieceMass(piece: PipePiece, pipe: RunPipe | null): Mass | null {
  const dims = pipe?.dims ?? (piece.nps ? okOrNull(cachedPipeDimensions(piece.nps, piece.schedule)) : null);
  if (!dims || piece.cutLengthMm === null) return null;
  const L = piece.cutLengthMm;
  return {
    steel: (dims.massKgPerM * L) / 1000,
    water: tubeVolumes(dims.odMm, dims.idMm, L).water * WATER_KG_PER_MM3,
  };
}

function okOrNull<T>(l: { ok: true; value: T } | { ok: false }): T | null {
  return l.ok ? l.value : null;
}

/** Mass and centroid of one component, or null when it cannot be weighed. */
export function componentMass(
  a: NodeAnalysis,
  wp: Vec3,
  pipes: Map<string, RunPipe>,
): { mass: Mass; centroid: Vec3 } | null {
  const end0 = a.ends[0];
  if (!end0) return null;
  const p0 = pipes.get(end0.conn.run.id);
  const dims = p0?.dims;
  const volume = (v: Mass): Mass => ({
    steel: v.steel * STEEL_KG_PER_MM3,
    water: v.water * WATER_KG_PER_MM3,
  });
  const d = a.detail;
  switch (d.type) {
    case 'elbow': {
      if (d.construction === 'mitre' || !dims || d.bendRadiusMm === null) return null;
      const theta = (d.angleDeg * Math.PI) / 180;
      const R = d.bendRadiusMm;
      const bis = normalise(add(end0.conn.outward, a.ends[1]!.conn.outward));
      if (!bis) return null;
      const centre = addScaled(wp, bis, R / Math.cos(theta / 2));
      const centroid = addScaled(centre, bis, -(R * Math.sin(theta / 2)) / (theta / 2));
      return { mass: volume(bendVolumes(dims.odMm, dims.idMm, R, theta)), centroid };
    }
    case 'return': {
      if (!dims || d.bendRadiusMm === null) return null;
      const R = d.bendRadiusMm;
      return {
        mass: volume(bendVolumes(dims.odMm, dims.idMm, R, Math.PI)),
        centroid: addScaled(wp, end0.conn.outward, (-2 * R) / Math.PI),
      };
    }
    case 'tee': {
      const br = a.ends[2];
      const bp = br ? pipes.get(br.conn.run.id)?.dims : null;
      if (!dims || !bp || !br || d.runCentreToEndMm === null || d.branchCentreToEndMm === null) return null;
      const run = tubeVolumes(dims.odMm, dims.idMm, 2 * d.runCentreToEndMm);
      const stub = Math.max(0, d.branchCentreToEndMm - dims.odMm / 2);
      const branch = tubeVolumes(bp.odMm, bp.idMm, stub);
      const mRun = volume(run);
      const mBr = volume(branch);
      const total = mRun.steel + mBr.steel;
      const brCentre = addScaled(wp, br.conn.outward, dims.odMm / 2 + stub / 2);
      const centroid =
        total > 0 ? add(scale(wp, mRun.steel / total), scale(brCentre, mBr.steel / total)) : wp;
      return { mass: { steel: total, water: mRun.water + mBr.water }, centroid };
    }
    case 'reducer': {
      if (!d.largeNps || !d.smallNps || d.lengthMm === null) return null;
      const sched = p0?.schedule ?? 'STD';
      const L = okOrNull(cachedPipeDimensions(d.largeNps, sched));
      const S = okOrNull(cachedPipeDimensions(d.smallNps, sched));
      if (!L || !S) return null;
      return { mass: volume(frustumVolumes(L.odMm, L.idMm, S.odMm, S.idMm, d.lengthMm)), centroid: wp };
    }
    case 'flange': {
      if (
        !dims ||
        d.odMm === null ||
        d.thicknessMm === null ||
        d.hubLengthMm === null ||
        d.boltCount === null ||
        d.boltHoleDiaMm === null
      )
        return null;
      const wn = d.flangeType === 'weld-neck-flange';
      const shape = {
        odMm: d.odMm,
        thicknessMm: d.thicknessMm,
        hubLengthMm: d.hubLengthMm,
        raisedFaceMm: d.raisedFaceMm ?? 0,
        raisedFaceDiaMm: d.raisedFaceDiaMm ?? 0,
        hubDiaAtBaseMm: d.hubDiaAtBaseMm,
        boltCount: d.boltCount,
        boltHoleDiaMm: d.boltHoleDiaMm,
        boreMm: wn ? dims.idMm : dims.odMm,
        weldEndOdMm: wn ? dims.odMm : null,
      };
      const f = volume(flangeVolumes(shape));
      const into = end0.conn.outward;
      let centroid = addScaled(wp, into, (d.hubLengthMm + (d.raisedFaceMm ?? 0)) / 3);
      let steel = f.steel;
      if (d.blind) {
        const b = volume(
          flangeVolumes({
            ...shape,
            hubLengthMm: d.thicknessMm,
            hubDiaAtBaseMm: null,
            boreMm: 0,
            weldEndOdMm: null,
          }),
        );
        const bc = addScaled(wp, into, -d.thicknessMm / 2);
        centroid = add(
          scale(centroid, f.steel / (f.steel + b.steel)),
          scale(bc, b.steel / (f.steel + b.steel)),
        );
        steel += b.steel;
      }
      return { mass: { steel, water: f.water }, centroid };
    }
    case 'cap': {
      if (!dims || d.lengthMm === null || d.socket) return null;
      return {
        mass: volume(capVolumes(dims.odMm, d.lengthMm, dims.wallMm)),
        centroid: addScaled(wp, end0.conn.outward, d.lengthMm / 2),
      };
    }
    case 'socket-fitting': {
      if (!d.fitting || !a.nps) return null;
      const look = socketWeldDimensions(a.nps, d.fitting);
      if (!look.ok) return null;
      const sw = look.value;
      if (d.fitting === 'coupling') {
        // Two sockets back to back with the laying length E between them, centred on the node.
        const arm = volume(socketArm(sw, (sw.lengthMm ?? 0) / 2));
        return { mass: { steel: 2 * arm.steel, water: 2 * arm.water }, centroid: wp };
      }
      // Elbows and tees: one arm per end, from the centre out to the socket face (A + J).
      let steel = 0;
      let water = 0;
      let c = { x: 0, y: 0, z: 0 };
      const arm = volume(socketArm(sw, sw.centreToBottomMm));
      const armLen = sw.centreToBottomMm + sw.socketDepthMm;
      for (const e of a.ends) {
        steel += arm.steel;
        water += arm.water;
        c = add(c, addScaled(wp, e.conn.outward, armLen / 2));
      }
      return { mass: { steel, water }, centroid: scale(c, 1 / a.ends.length) };
    }
    case 'branch': {
      // Half coupling: a socket on the header's outside, its axis along the branch.
      if (a.node.kind !== 'half-coupling' || !d.branchNps || !d.branchAxis || !dims) return null;
      const look = socketWeldDimensions(d.branchNps, 'half-coupling');
      if (!look.ok || look.value.lengthMm === undefined) return null;
      const sw = look.value;
      const L = sw.lengthMm!;
      return {
        mass: volume(socketArm(sw, Math.max(0, L - sw.socketDepthMm))),
        centroid: addScaled(wp, d.branchAxis, dims.odMm / 2 + L / 2),
      };
    }
    default:
      return null;
  }
}

/** One socket-weld arm of `sw`'s size with `beyondMm` of bore past the socket bottom, mm³. */
function socketArm(sw: SocketWeldDimensions, beyondMm: number): Mass {
  return socketArmVolumes(
    sw.socketBoreMm + 2 * sw.socketWallMm,
    sw.socketBoreMm,
    sw.socketDepthMm,
    sw.fittingBoreMm,
    beyondMm,
  );
}

/** Weighs the pieces and components and finds the centres of gravity. */
export function computeWeights(
  graph: SpoolGraph,
  pieces: PipePiece[],
  analyses: Map<string, NodeAnalysis>,
  positions: Map<string, Vec3>,
  pipes: Map<string, RunPipe>,
  issues: IssueSink,
): WeightResult {
  const items: WeightItem[] = [];
  const notIncluded: string[] = [];
  for (const piece of pieces) {
    const m = pieceMass(piece, piece.runIds[0] ? (pipes.get(piece.runIds[0]) ?? null) : null);
    if (!m) {
      notIncluded.push(`pipe ${piece.mark}`);
      continue;
    }
    piece.massKg = round(m.steel, 2);
    const centroid = scale(add(piece.start, piece.end), 0.5);
    items.push({
      kind: 'pipe',
      ref: piece.mark,
      description: `Pipe ${piece.mark} NPS ${piece.nps}`,
      massKg: m.steel,
      waterKg: m.water,
      centroid,
    });
  }
  for (const nodeId of graph.nodeOrder) {
    const a = analyses.get(nodeId);
    const wp = positions.get(nodeId);
    if (!a || !wp) continue;
    const t = a.detail.type;
    if (
      t === 'open-end' ||
      (t === 'branch' && a.node.kind === 'set-on-branch') ||
      (t === 'elbow' && a.detail.type === 'elbow' && a.detail.construction === 'mitre')
    )
      continue;
    const m = componentMass(a, wp, pipes);
    if (!m) {
      notIncluded.push(`${a.description} (${nodeRef(nodeId)})`);
      continue;
    }
    items.push({
      kind: 'component',
      ref: nodeId,
      description: a.description,
      massKg: m.mass.steel,
      waterKg: m.mass.water,
      centroid: m.centroid,
    });
  }
  if (notIncluded.length > 0) {
    addWarning(
      issues,
      'weight-incomplete',
      `Not included in the weight (no dimensions to weigh by): ${notIncluded.join('; ')}`,
    );
  }
  const emptyKg = items.reduce((s, i) => s + i.massKg, 0);
  const waterKg = items.reduce((s, i) => s + i.waterKg, 0);
  const cog = (w: (i: WeightItem) => number) => {
    const total = items.reduce((s, i) => s + w(i), 0);
    if (!(total > 0)) return null;
    let c = { x: 0, y: 0, z: 0 };
    for (const i of items) c = addScaled(c, i.centroid, w(i) / total);
    return c;
  };
  return {
    emptyKg,
    waterKg,
    waterFilledKg: emptyKg + waterKg,
    centreOfGravity: cog((i) => i.massKg),
    centreOfGravityFilled: cog((i) => i.massKg + i.waterKg),
    items,
    notIncluded,
    caution: WEIGHT_CAUTION,
  };
}

function round(x: number, d: number): number {
  const f = 10 ** d;
  return Math.round(x * f) / f;
}
