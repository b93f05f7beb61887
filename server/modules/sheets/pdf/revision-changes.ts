import { shopMarks } from './shop-marks';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';

/** What changed between the previous issued revision and the one being printed. */
export interface RevisionChanges {
  /** Letter of the revision compared against. */
  sinceLetter: string;
  /** Letter printed beside changed items (the printed revision's). */
  markLetter: string;
  lines: string[];
  changedPieces: Set<string>;
  changedRuns: Set<string>;
  changedFlanges: Set<string>;
}

const MAX_LINES = 24;
const LENGTH_TOLERANCE_MM = 0.05;
const ANGLE_TOLERANCE_DEG = 0.05;

/**
 * Compares two engine results of the same spool, item by item (pieces by mark, runs by id,
 * flanges by node), so a re-issued sheet says plainly what the bay must do differently.
 */
export function revisionChanges(
  previous: SpoolResult,
  current: SpoolResult,
  units: LengthUnits,
  sinceLetter: string,
  markLetter: string,
): RevisionChanges {
  const L = (mm: number | null) => (mm === null ? 'not computed' : formatLength(mm, units));
  const lines: string[] = [];
  const changedPieces = new Set<string>();
  const changedRuns = new Set<string>();
  const changedFlanges = new Set<string>();

  const before = new Map(previous.pieces.map((p) => [p.mark, p]));
  const after = new Map(current.pieces.map((p) => [p.mark, p]));
  for (const [mark, p] of after) {
    const old = before.get(mark);
    if (!old) {
      lines.push(`${mark} added: NPS ${p.nps} ${p.schedule}, cut ${L(p.cutLengthMm)}.`);
      changedPieces.add(mark);
      continue;
    }
    const what: string[] = [];
    if (differs(old.cutLengthMm, p.cutLengthMm, LENGTH_TOLERANCE_MM))
      what.push(`cut length was ${L(old.cutLengthMm)}, now ${L(p.cutLengthMm)}`);
    if (old.nps !== p.nps || old.schedule !== p.schedule)
      what.push(`size was NPS ${old.nps} ${old.schedule}, now NPS ${p.nps} ${p.schedule}`);
    if (old.material !== p.material) what.push(`material was ${old.material}, now ${p.material}`);
    const endsBefore = `${old.ends[0].label} / ${old.ends[1].label}`;
    const endsAfter = `${p.ends[0].label} / ${p.ends[1].label}`;
    if (endsBefore !== endsAfter) what.push(`ends were ${endsBefore}, now ${endsAfter}`);
    if (what.length > 0) {
      lines.push(`${mark}: ${what.join('; ')}.`);
      changedPieces.add(mark);
    }
  }
  for (const mark of before.keys()) if (!after.has(mark)) lines.push(`${mark} removed.`);

  const runsBefore = new Map(previous.runs.map((r) => [r.runId, r]));
  for (const run of current.runs) {
    const old = runsBefore.get(run.runId);
    if (!old) {
      lines.push(`Run ${run.runId} (${run.from} to ${run.to}) added, ${L(run.workPointDistanceMm)}.`);
      changedRuns.add(run.runId);
      continue;
    }
    const what: string[] = [];
    if (differs(old.workPointDistanceMm, run.workPointDistanceMm, LENGTH_TOLERANCE_MM)) {
      what.push(`was ${L(old.workPointDistanceMm)}, now ${L(run.workPointDistanceMm)}`);
    }
    const turn = Math.abs(
      old.direction.x * run.direction.x +
        old.direction.y * run.direction.y +
        old.direction.z * run.direction.z,
    );
    if (turn < 0.9999) what.push('direction changed');
    if (old.nps !== run.nps) what.push(`size was NPS ${old.nps ?? '?'}, now NPS ${run.nps ?? '?'}`);
    if (what.length > 0) {
      lines.push(`Run ${run.runId} (${run.from} to ${run.to}): ${what.join('; ')}.`);
      changedRuns.add(run.runId);
    }
  }
  const currentRuns = new Set(current.runs.map((r) => r.runId));
  for (const run of previous.runs) if (!currentRuns.has(run.runId)) lines.push(`Run ${run.runId} removed.`);

  const marksNow = shopMarks(current);
  const marksBefore = shopMarks(previous);
  const fm = (id: string) => marksNow.get(id) ?? marksBefore.get(id) ?? '?';
  const flangesBefore = new Map(previous.flanges.map((f) => [f.nodeId, f]));
  for (const f of current.flanges) {
    const old = flangesBefore.get(f.nodeId);
    if (!old) {
      lines.push(`Flange ${fm(f.nodeId)} added.`);
      changedFlanges.add(f.nodeId);
    } else if (
      differs(old.rotationDeg, f.rotationDeg, ANGLE_TOLERANCE_DEG) ||
      old.boltCount !== f.boltCount
    ) {
      lines.push(
        `Flange ${fm(f.nodeId)}: hole 1 was at ${fmtDeg(old.rotationDeg)}, now ${fmtDeg(f.rotationDeg)}${old.boltCount !== f.boltCount ? `; ${f.boltCount} holes, was ${old.boltCount}` : ''}.`,
      );
      changedFlanges.add(f.nodeId);
    }
  }
  if (previous.welds.length !== current.welds.length)
    lines.push(`Welds: ${current.welds.length}, was ${previous.welds.length}.`);
  const we = previous.weights.emptyKg;
  const wn = current.weights.emptyKg;
  if (we > 0 && Math.abs(wn - we) / we > 0.01)
    lines.push(`Empty weight ${wn.toFixed(1)} kg, was ${we.toFixed(1)} kg.`);

  const shown =
    lines.length > MAX_LINES
      ? [...lines.slice(0, MAX_LINES - 1), `…and ${lines.length - MAX_LINES + 1} more changes.`]
      : lines;
  return { sinceLetter, markLetter, lines: shown, changedPieces, changedRuns, changedFlanges };
}

function differs(a: number | null, b: number | null, tolerance: number): boolean {
  if (a === null || b === null) return a !== b;
  return Math.abs(a - b) > tolerance;
}

function fmtDeg(deg: number): string {
  return `${Number(deg.toFixed(1))}°`;
}
