import type { Job } from '../../../shared/schemas/job.schema';
import type { JobRow } from './job.entity';

/** The API shape of a job row; `spoolCount` counts its spools that are not archived. */
export function toJobDto(row: JobRow, spoolCount: number): Job {
  return {
    id: row.id,
    number: row.number,
    title: row.title,
    client: row.client,
    site: row.site,
    units: row.units,
    spec: row.spec,
    status: row.status,
    spoolCount,
    archivedAt: row.archivedAt ? row.archivedAt.toISOString() : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    version: row.version,
  };
}
