/**
 * The cut list: pipe pieces P1, P2… in tree order. A header running through branch
 * connections is one piece across several runs. Mitred bends add their middle segments.
 * Each piece end gets its preparation (ASME B16.25: bevel 37.5° above 3 mm wall, square
 * at or below; compound bevel above 22 mm).
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { pipeOdMm } from '../standards/pipe-schedules';
import type { EndPrep, PipePiece } from './compute-result';
import type { SpoolGraph } from './build-graph';
import { addError, addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, NodeEnd, RunPipe } from './node-analysis';
import type { PlacedRun } from './place-runs';
import { addScaled, cross, dot, normalise, rotateAbout, scale, sub, add } from './vec3-math';

/** Wall at or below which butt-weld ends are cut square, mm (ASME B16.25). */
export const SQUARE_END_MAX_WALL_MM = 3;
/** Wall above which the bevel is compound (37.5° then 10°), mm (ASME B16.25). */
export const COMPOUND_BEVEL_MIN_WALL_MM = 22;

/** Preparation of a pipe end meeting `end` at node `nodeId`, for a pipe of wall `wallMm`. */
export function endPrepFor(
  end: NodeEnd | null,
  nodeId: string,
  wallMm: number | null,
  branchOf?: string,
): EndPrep {
  const bevel = (): EndPrep => {
    if (wallMm !== null && wallMm <= SQUARE_END_MAX_WALL_MM)
      return { type: 'square', label: 'square (wall ≤ 3 mm)', nodeId };
    if (wallMm !== null && wallMm > COMPOUND_BEVEL_MIN_WALL_MM)
      return { type: 'compound-bevel', label: 'compound bevel 37.5°/10°', nodeId };
    return { type: 'bevel', label: 'bevel 37.5°', nodeId };
  };
  if (!end) return bevel();
  switch (end.prep) {
    case 'weld-bevel':
      return bevel();
    case 'square':
      return { type: 'square', label: 'square', nodeId };
    case 'saddle':
      return { type: 'saddle', label: `saddle${branchOf ? ` (set-on ${branchOf})` : ''}`, nodeId };
    case 'mitre': {
      const b = bevel();
      const cut = Math.round((end.mitreCutDeg ?? 0) * 100) / 100;
      return { type: 'mitre', label: `mitre ${cut}°${b.type === 'square' ? '' : ` + ${b.label}`}`, nodeId };
    }
  }
}

/** Where the pipe itself ends at a run end, mm plant (port + take-off + gap along the run). */
function pipeEndPoint(placed: PlacedRun, atFrom: boolean): Vec3 {
  if (atFrom)
    return addScaled(placed.start, placed.direction, (placed.takeOffFromMm ?? 0) + placed.gapFromMm);
  return addScaled(placed.end, placed.direction, -((placed.takeOffToMm ?? 0) + placed.gapToMm));
}

/** Builds the cut list and checks minimum lengths. Sets `pieceMark` per run in `marks`. */
export function buildCutList(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  placed: Map<string, PlacedRun>,
  pipes: Map<string, RunPipe>,
  positions: Map<string, Vec3>,
  issues: IssueSink,
): { pieces: PipePiece[]; marks: Map<string, string> } {
  const pieces: PipePiece[] = [];
  const marks = new Map<string, string>();
  const pieceOfRun = new Map<string, number>();
  const groups: string[][] = [];

  // Group runs joined through branch connections (pipe continues).
  for (const run of graph.runOrder) {
    const p = placed.get(run.id);
    if (!p || p.closeCoupled) continue;
    let joined: number | undefined;
    if (p.fromEnd?.pipeContinues) {
      const a = analyses.get(run.from);
      const other = a?.ends.find((e) => e.pipeContinues && e.conn.run.id !== run.id);
      if (other) joined = pieceOfRun.get(other.conn.run.id);
    }
    if (joined === undefined) {
      joined = groups.length;
      groups.push([]);
    }
    groups[joined]!.push(run.id);
    pieceOfRun.set(run.id, joined);
  }

  for (const runIds of groups) {
    const first = pipes.get(runIds[0]!)!;
    // Terminal ends: run ends that are not pass-through.
    const terminals: {
      point: Vec3;
      end: NodeEnd | null;
      nodeId: string;
      allowance: number;
      placed: PlacedRun;
      atFrom: boolean;
    }[] = [];
    let total: number | null = 0;
    let shortDelta: number | null = null;
    for (const id of runIds) {
      const p = placed.get(id)!;
      total = total === null || p.pipeLengthMm === null ? null : total + p.pipeLengthMm;
      for (const atFrom of [true, false]) {
        const end = atFrom ? p.fromEnd : p.toEnd;
        if (end?.pipeContinues) continue;
        const nodeId = atFrom ? p.run.from : p.run.to;
        const an = analyses.get(nodeId);
        const allowance = an?.detail.type === 'open-end' ? an.detail.fieldFitAllowanceMm : 0;
        if (end?.shortPointTakeOffMm != null && end.takeOffMm !== null)
          shortDelta = end.shortPointTakeOffMm - end.takeOffMm;
        terminals.push({ point: pipeEndPoint(p, atFrom), end, nodeId, allowance, placed: p, atFrom });
      }
    }
    const [t0, t1] = [terminals[0], terminals[terminals.length - 1]];
    if (!t0 || !t1) continue;
    const allowance = terminals.reduce((s, t) => s + t.allowance, 0);
    const mark = `P${pieces.length + 1}`;
    const wall = first.dims?.wallMm ?? null;
    const branchHeader = (t: typeof t0) => {
      const a = analyses.get(t.nodeId);
      return a?.detail.type === 'branch' && a.nps ? `on NPS ${a.nps}` : undefined;
    };
    const cut = total === null ? null : total + allowance;
    const piece: PipePiece = {
      mark,
      runIds,
      nodeId: null,
      nps: first.nps!,
      schedule: first.schedule,
      material: first.material,
      heat: first.heat,
      odMm: first.dims?.odMm ?? null,
      wallMm: wall,
      cutLengthMm: cut,
      shortPointLengthMm: cut !== null && shortDelta !== null ? Math.max(0, cut - shortDelta) : null,
      fieldFitAllowanceMm: allowance,
      stockLengthMm: cut === null ? null : cut + first.spec.sawKerfMm,
      start: t0.point,
      end: t1.point,
      ends: [
        endPrepFor(t0.end, t0.nodeId, wall, branchHeader(t0)),
        endPrepFor(t1.end, t1.nodeId, wall, branchHeader(t1)),
      ],
      massKg: null,
    };
    if (!first.nps) continue;
    checkLength(piece, first, issues);
    checkBranchClearance(runIds, placed, analyses, pipes, issues);
    pieces.push(piece);
    for (const id of runIds) marks.set(id, mark);
  }

  // Mitred bends: their middle segments are pipe pieces too.
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
      pieces.push({
        mark: `P${pieces.length + 1}`,
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
  return { pieces, marks };
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

/**
 * A branch connection needs pipe on both sides of it: at least the branch's outside radius
 * between its centre and the header pipe's end, or the branch would hang off the pipe end
 * or run into the next weld.
 */
function checkBranchClearance(
  runIds: string[],
  placed: Map<string, PlacedRun>,
  analyses: Map<string, NodeAnalysis>,
  pipes: Map<string, RunPipe>,
  issues: IssueSink,
): void {
  for (const id of runIds) {
    const p = placed.get(id)!;
    if (p.pipeLengthMm === null) continue;
    const through = p.fromEnd?.pipeContinues ? p.run.from : p.toEnd?.pipeContinues ? p.run.to : null;
    const otherContinues = p.fromEnd?.pipeContinues && p.toEnd?.pipeContinues;
    if (!through || otherContinues) continue;
    const a = analyses.get(through);
    const branchEnd = a?.ends.find((e) => !e.pipeContinues);
    const branchNps = a?.detail.type === 'branch' ? a.detail.branchNps : null;
    const branchOd = branchEnd
      ? pipes.get(branchEnd.conn.run.id)?.dims?.odMm
      : branchNps
        ? pipeOdOf(branchNps)
        : null;
    if (!branchOd) continue;
    if (p.pipeLengthMm < branchOd / 2) {
      addError(
        issues,
        'overlapping-fittings',
        `Branch ${through} sits ${round(p.pipeLengthMm)} mm from the end of the header pipe on run ${id}; it needs at least ${round(branchOd / 2)} mm (the branch's outside radius)`,
        through,
      );
    }
  }
}

function pipeOdOf(nps: NonNullable<RunPipe['nps']>): number | null {
  const l = pipeOdMm(nps);
  return l.ok ? l.value.odMm : null;
}

function checkLength(piece: PipePiece, pipe: RunPipe, issues: IssueSink): void {
  const cut = piece.cutLengthMm;
  const runId = piece.runIds[0];
  if (cut === null) return;
  const min = pipe.spec.minPieceLengthMm;
  if (cut < min) {
    addError(
      issues,
      'piece-too-short',
      `Piece ${piece.mark} (run ${piece.runIds.join(', ')}) would be ${round(cut)} mm, shorter than the ${min} mm minimum`,
      runId,
    );
  } else if (piece.odMm !== null && cut < piece.odMm) {
    addWarning(
      issues,
      'piece-shorter-than-diameter',
      `Piece ${piece.mark} is ${round(cut)} mm, shorter than its outside diameter (${piece.odMm} mm): hard to fit and weld`,
      runId,
    );
  }
}

function round(x: number): number {
  return Math.round(x * 10) / 10;
}
