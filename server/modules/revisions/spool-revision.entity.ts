import { EntitySchema } from 'typeorm';
import type { RevisionState } from '../../../shared/schemas/revision.schema';

/**
 * One lettered revision of a spool's design. A database trigger refuses any change
 * to an issued revision other than marking it superseded.
 */
export interface SpoolRevisionRow {
  id: string;
  organisationId: string;
  spoolId: string;
  letter: string;
  state: RevisionState;
  design: Record<string, unknown>;
  note: string;
  authorId: string;
  createdAt: Date;
  updatedAt: Date;
  issuedAt: Date | null;
  version: number;
}

export const SpoolRevisionEntity = new EntitySchema<SpoolRevisionRow>({
  name: 'SpoolRevision',
  tableName: 'spool_revision',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    organisationId: { name: 'organisation_id', type: 'uuid' },
    spoolId: { name: 'spool_id', type: 'uuid' },
    letter: { type: 'text' },
    state: { type: 'text' },
    design: { type: 'jsonb' },
    note: { type: 'text', default: '' },
    authorId: { name: 'author_id', type: 'uuid' },
    createdAt: { name: 'created_at', type: 'timestamptz', default: () => 'now()' },
    updatedAt: { name: 'updated_at', type: 'timestamptz', default: () => 'now()' },
    issuedAt: { name: 'issued_at', type: 'timestamptz', nullable: true },
    version: { type: 'integer', default: 1 },
  },
});
