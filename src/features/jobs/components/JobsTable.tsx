import { Link } from 'react-router';
import type { Job } from '../../../../shared/schemas/job.schema';
import { Table, type Column, type SortOrder } from '../../../components/ui/Table';
import { formatDate } from '../../../lib/format-date';
import { JobStatusBadge } from './JobStatusBadge';

function jobLink(j: Job) {
  return (
    <Link to={`/jobs/${j.id}`} className="font-mono font-bold text-ink-900 underline-offset-4 hover:underline">
      {j.number}
    </Link>
  );
}

const columns: Column<Job>[] = [
  { key: 'number', header: 'Job no.', sortable: true, cell: jobLink },
  { key: 'title', header: 'Title', sortable: true, cell: (j) => <span className="font-medium">{j.title}</span>, card: true },
  { key: 'client', header: 'Client', sortable: true, cell: (j) => j.client },
  { key: 'site', header: 'Site', cell: (j) => j.site || '—', className: 'hidden lg:table-cell' },
  { key: 'units', header: 'Units', cell: (j) => <span className="font-mono">{j.units}</span> },
  { key: 'spoolCount', header: 'Spools', align: 'right', cell: (j) => <span className="font-mono">{j.spoolCount}</span>, card: true },
  { key: 'status', header: 'Status', sortable: true, cell: (j) => <JobStatusBadge status={j.status} />, card: true },
  { key: 'updatedAt', header: 'Updated', sortable: true, cell: (j) => formatDate(j.updatedAt), className: 'hidden md:table-cell' },
];

interface JobsTableProps {
  jobs: Job[];
  sort: { field: string; order: SortOrder };
  onSort: (field: string) => void;
  onOpen: (job: Job) => void;
  busy?: boolean;
}

/** The shop's jobs, one row each; a row opens the job. */
export function JobsTable({ jobs, sort, onSort, onOpen, busy }: JobsTableProps) {
  return (
    <Table caption="Jobs" columns={columns} rows={jobs} rowKey={(j) => j.id} sort={sort} onSort={onSort} onRowClick={onOpen} busy={busy} cardTitle={jobLink} />
  );
}
