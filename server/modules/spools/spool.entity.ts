import { EntitySchema } from 'typeorm';
import type { SpoolStatus } from '../../../shared/schemas/spool-status.schema';
import type { SpoolRework } from '../../../shared/schemas/spool.schema';

/** One shop spool of a job; its designs live in spool revisions. */
export interface SpoolRow {
  id: string;
  organisationId: string;
  jobId: string;
  mark: string;
  lineNumber: string;
  status: SpoolStatus;
  /** The latest issued revision, the one the bay builds from. */
  currentRevisionId: string | null;
  /** Set while the bay must rework the spool to a newer revision. */
  rework: SpoolRework | null;
  archivedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export const SpoolEntity = new EntitySchema<SpoolRow>({
  name: 'Spool',
  tableName: 'spool',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    organisationId: { name: 'organisation_id', type: 'uuid' },
    jobId: { name: 'job_id', type: 'uuid' },
    mark: { type: 'text' },
    lineNumber: { name: 'line_number', type: 'text' },
    status: { type: 'text', default: 'drafting' },
    currentRevisionId: { name: 'current_revision_id', type: 'uuid', nullable: true },
    rework: { type: 'jsonb', nullable: true },
    archivedAt: { name: 'archived_at', type: 'timestamptz', nullable: true },
    createdAt: { name: 'created_at', type: 'timestamptz', default: () => 'now()' },
    updatedAt: { name: 'updated_at', type: 'timestamptz', default: () => 'now()' },
    version: { type: 'integer', default: 1 },
  },
});
