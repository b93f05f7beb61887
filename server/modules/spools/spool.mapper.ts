import type { Spool } from '../../../shared/schemas/spool.schema';
import type { SpoolRevisionRow } from '../revisions/spool-revision.entity';
import type { SpoolRow } from './spool.entity';

/** The API shape of a spool row with its current issued revision and working draft. */
export function toSpoolDto(
  row: SpoolRow,
  current: Pick<SpoolRevisionRow, 'id' | 'letter' | 'issuedAt'> | null,
  draft: Pick<SpoolRevisionRow, 'id' | 'letter' | 'version' | 'updatedAt'> | null,
): Spool {
  return {
    id: row.id,
    jobId: row.jobId,
    mark: row.mark,
    lineNumber: row.lineNumber,
    status: row.status,
    currentRevision:
      current && current.issuedAt
        ? { id: current.id, letter: current.letter, issuedAt: current.issuedAt.toISOString() }
        : null,
    draft: draft
      ? {
          id: draft.id,
          letter: draft.letter,
          version: draft.version,
          updatedAt: draft.updatedAt.toISOString(),
        }
      : null,
    rework: row.rework ?? null,
    archivedAt: row.archivedAt ? row.archivedAt.toISOString() : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    version: row.version,
  };
}
