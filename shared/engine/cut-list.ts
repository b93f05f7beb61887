/**
 * The cut list: pipe pieces P1, P2… in tree order. A header running through branch
 * connections is one piece across several runs. Mitred bends add their middle segments.
 * Each piece end gets its preparation (ASME B16.25: bevel 37.5° above 3 mm wall, square
 * at or below; compound bevel above 22 mm).
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { nodeRef, runRef } from './component-refs';
import { cachedPipeOdMm } from './standards-cache';
import type { PipePiece } from './compute-result';
import { endPrepFor } from './end-prep';
import type { SpoolGraph } from './build-graph';
import { addError, addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, NodeEnd, RunPipe } from './node-analysis';
import type { PlacedRun } from './place-runs';
import { addScaled } from './vec3-math';
import { mitreSegmentPieces } from './mitre-segments';
import { pieceMark } from './mark-text';

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
    const mark = pieceMark(pieces.length + 1);
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
  for (const seg of mitreSegmentPieces(graph, analyses, pipes, positions, pieces.length)) pieces.push(seg);
  return { pieces, marks };
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
        `${nodeRef(through)} sits ${round(p.pipeLengthMm)} mm from the end of the header pipe on ${runRef(id)}; it needs at least ${round(branchOd / 2)} mm (the branch's outside radius)`,
        through,
      );
    }
  }
}

function pipeOdOf(nps: NonNullable<RunPipe['nps']>): number | null {
  return nps ? cachedPipeOdMm(nps) : null;
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
      `Piece ${piece.mark} would be ${round(cut)} mm, shorter than the ${min} mm minimum`,
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
