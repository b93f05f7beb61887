import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { Nps } from '../../../../shared/standards/nps';
import { incomingRun, nodeById, runById } from './design-graph';

/**
 * The size a run carries, following the document's rule: its own `nps`; else a reducer's
 * `toNps` at its `from`; else a tee's `branchNps` when the run is the tee's branch; else
 * the size of the run feeding its `from`; for the root's runs, the design's `spec.nps`.
 * Null when nothing states a size.
 */
export function effectiveNps(design: SpoolDesign, runId: string, depth = 0): Nps | null {
  const run = runById(design, runId);
  if (!run || depth > design.runs.length) return null;
  if (run.nps) return run.nps;
  const from = nodeById(design, run.from);
  if (from?.kind === 'reducer') return from.toNps;
  const feeding = incomingRun(design, run.from);
  if (from?.kind === 'tee' && from.branchNps && feeding && !sameAxis(feeding.direction, run.direction)) {
    return from.branchNps;
  }
  if (!feeding) return design.spec?.nps ?? null;
  return effectiveNps(design, feeding.id, depth + 1);
}

function sameAxis(a: { x: number; y: number; z: number }, b: { x: number; y: number; z: number }): boolean {
  const la = Math.hypot(a.x, a.y, a.z);
  const lb = Math.hypot(b.x, b.y, b.z);
  return Math.abs((a.x * b.x + a.y * b.y + a.z * b.z) / (la * lb)) > 1 - 1e-6;
}

/** True when the run continues straight through its `from` node (not a branch leaving it). */
export function isThroughRun(design: SpoolDesign, runId: string): boolean {
  const run = runById(design, runId);
  if (!run) return false;
  const feeding = incomingRun(design, run.from);
  return !feeding || sameAxis(feeding.direction, run.direction);
}

/**
 * True when `runId` carries on the same line as the run feeding its `from` node: through
 * an elbow or return, or straight through a tee, set-on branch, socket or outlet. A
 * reducer starts a new size; a branch starts a new line.
 */
export function continuesLine(design: SpoolDesign, runId: string): boolean {
  const run = runById(design, runId);
  if (!run) return false;
  const from = nodeById(design, run.from);
  if (!from || !incomingRun(design, run.from)) return false;
  if (from.kind === 'elbow' || from.kind === 'return') return true;
  if (from.kind === 'reducer' || from.kind === 'end') return false;
  return isThroughRun(design, runId);
}
