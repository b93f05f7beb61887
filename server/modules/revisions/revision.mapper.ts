import type { Revision, RevisionSummary } from '../../../shared/schemas/revision.schema';
import type { SpoolRevisionRow } from './spool-revision.entity';

/** A revision row with its author's display name. */
export type RevisionWithAuthor = SpoolRevisionRow & { authorName: string };

/** The list shape of a revision (no design). */
export function toRevisionSummary(row: RevisionWithAuthor): RevisionSummary {
  return {
    id: row.id,
    spoolId: row.spoolId,
    letter: row.letter,
    state: row.state,
    note: row.note,
    author: { id: row.authorId, displayName: row.authorName },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    issuedAt: row.issuedAt ? row.issuedAt.toISOString() : null,
    version: row.version,
  };
}

/** The full shape of a revision, with its design. */
export function toRevisionDto(row: RevisionWithAuthor): Revision {
  return { ...toRevisionSummary(row), design: row.design };
}
