import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { componentMarks, markOf } from '../../../../shared/engine/component-marks';
import {
  earliestStageUndone,
  revisionDifferences,
  type ShopStageUndone,
} from '../../../../shared/engine/revision-diff';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';

/** What changed between the previous issued revision and the one being printed. */
export interface RevisionChanges {
  /** Letter of the revision compared against. */
  sinceLetter: string;
  /** Letter printed beside changed items (the printed revision's). */
  markLetter: string;
  lines: string[];
  /** The earliest shop stage the changes undo. */
  undoes: ShopStageUndone;
  changedPieces: Set<string>;
  changedRuns: Set<string>;
  changedFlanges: Set<string>;
  /** Set when this revision sent the spool back for rework: where it stood, where it went. */
  rework?: { fromStatus: string; toStatus: string };
}

/** One revision as the sheet compares it. */
export interface PrintedRevision {
  design: SpoolDesign;
  result: SpoolResult;
}

const MAX_LINES = 24;

/**
 * The sheet's "changed since" list: every difference between the two revisions (see
 * `revisionDifferences`), in the job's units, with the pieces, runs and flanges to flag.
 */
export function revisionChanges(
  previous: PrintedRevision,
  current: PrintedRevision,
  units: LengthUnits,
  sinceLetter: string,
  markLetter: string,
): RevisionChanges {
  const side = (r: PrintedRevision) => {
    const marks = componentMarks(r.result);
    return { ...r, markOf: (id: string) => markOf(marks, id) };
  };
  const differences = revisionDifferences(side(previous), side(current), (mm) => formatLength(mm, units));
  const changedPieces = new Set<string>();
  const changedRuns = new Set<string>();
  const changedFlanges = new Set<string>();
  const flangeNodes = new Set(current.result.flanges.map((f) => f.nodeId));
  for (const d of differences) {
    if (d.subject === 'piece' && d.change !== 'removed') changedPieces.add(d.item);
    if (d.ref?.runId && d.change !== 'removed') changedRuns.add(d.ref.runId);
    if (d.ref?.nodeId && flangeNodes.has(d.ref.nodeId) && d.change !== 'removed') changedFlanges.add(d.ref.nodeId);
  }
  const lines = differences.map((d) => d.text);
  const shown =
    lines.length > MAX_LINES
      ? [...lines.slice(0, MAX_LINES - 1), `…and ${lines.length - MAX_LINES + 1} more changes.`]
      : lines;
  return {
    sinceLetter,
    markLetter,
    lines: shown,
    undoes: earliestStageUndone(differences),
    changedPieces,
    changedRuns,
    changedFlanges,
  };
}
