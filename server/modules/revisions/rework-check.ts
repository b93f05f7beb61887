import { componentMarks, markOf } from '../../../shared/engine/component-marks';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { jobSpecOverrides } from '../../../shared/engine/job-spec-overrides';
import { earliestStageUndone, revisionDifferences } from '../../../shared/engine/revision-diff';
import type { JobSpec } from '../../../shared/schemas/job.schema';
import { spoolDesignSchema } from '../../../shared/schemas/spool-design.schema';
import { reworkStatus, type SpoolStatus } from '../../../shared/schemas/spool-status.schema';
import { formatLength, type LengthUnits } from '../../../shared/units/length-format';

/** What issuing a draft over an issued revision asks of the bay. */
export interface ReworkNeed {
  /** Where the spool goes back to. */
  toStatus: SpoolStatus;
  /** Every difference, one line each, in shop marks. */
  changes: string[];
}

const MAX_CHANGE_LINES = 200;

/**
 * Compares the issued design with the draft about to replace it. Null when the spool has not
 * yet reached the stage the changes undo (nothing to rework), or when either design no longer
 * reads (a stored design that predates a schema change: issued as before, with no flag).
 */
export function reworkNeed(
  status: SpoolStatus,
  issuedDesign: unknown,
  draftDesign: unknown,
  job: { spec: JobSpec; units: LengthUnits },
): ReworkNeed | null {
  const before = spoolDesignSchema.safeParse(issuedDesign);
  const after = spoolDesignSchema.safeParse(draftDesign);
  if (!before.success || !after.success) return null;
  const jobSpec = jobSpecOverrides(job.spec);
  const side = (design: typeof before.data) => {
    const result = computeSpool(design, { jobSpec, trusted: true });
    const marks = componentMarks(result);
    return { design, result, markOf: (id: string) => markOf(marks, id) };
  };
  const differences = revisionDifferences(side(before.data), side(after.data), (mm) =>
    formatLength(mm, job.units),
  );
  const toStatus = reworkStatus(status, earliestStageUndone(differences));
  if (!toStatus) return null;
  const lines = differences.map((d) => d.text);
  return {
    toStatus,
    changes:
      lines.length > MAX_CHANGE_LINES
        ? [...lines.slice(0, MAX_CHANGE_LINES - 1), `…and ${lines.length - MAX_CHANGE_LINES + 1} more changes.`]
        : lines,
  };
}
