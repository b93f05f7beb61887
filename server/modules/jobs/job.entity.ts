import { EntitySchema } from 'typeorm';
import type { JobSpec, JobStatus, JobUnits } from '../../../shared/schemas/job.schema';

/** A shop's contract for a client: the spools it builds share its default spec. */
export interface JobRow {
  id: string;
  organisationId: string;
  number: string;
  title: string;
  client: string;
  site: string;
  units: JobUnits;
  /** Validated with jobSpecSchema before every write. */
  spec: JobSpec;
  status: JobStatus;
  archivedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

export const JobEntity = new EntitySchema<JobRow>({
  name: 'Job',
  tableName: 'job',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    organisationId: { name: 'organisation_id', type: 'uuid' },
    number: { type: 'text' },
    title: { type: 'text' },
    client: { type: 'text' },
    site: { type: 'text', default: '' },
    units: { type: 'text' },
    spec: { type: 'jsonb' },
    status: { type: 'text', default: 'active' },
    archivedAt: { name: 'archived_at', type: 'timestamptz', nullable: true },
    createdAt: { name: 'created_at', type: 'timestamptz', default: () => 'now()' },
    updatedAt: { name: 'updated_at', type: 'timestamptz', default: () => 'now()' },
    version: { type: 'integer', default: 1 },
  },
});
