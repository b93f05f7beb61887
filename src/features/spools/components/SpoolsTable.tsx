import { Link } from 'react-router';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { Table, type Column, type SortOrder } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format-date';
import { SpoolStatusBadge } from './SpoolStatusBadge';

function spoolLink(s: Spool) {
  return (
    <Link to={`/spools/${s.id}`} className="font-mono font-bold text-ink-900 underline-offset-4 hover:underline">
      {s.mark}
    </Link>
  );
}

const columns: Column<Spool>[] = [
  { key: 'mark', header: 'Spool mark', sortable: true, cell: spoolLink },
  { key: 'lineNumber', header: 'Line', sortable: true, cell: (s) => <span className="font-mono">{s.lineNumber}</span> },
  { key: 'status', header: 'Status', sortable: true, cell: (s) => <SpoolStatusBadge status={s.status} />, card: true },
  {
    key: 'revision',
    header: 'Issued rev.',
    cell: (s) =>
      s.currentRevision ? (
        <span className="font-mono font-bold">{s.currentRevision.letter}</span>
      ) : (
        <span className="text-steel-500">not issued</span>
      ),
    card: true,
  },
  {
    key: 'draft',
    header: 'Draft',
    cell: (s) =>
      s.draft ? (
        <span>
          Rev. <span className="font-mono font-bold">{s.draft.letter}</span> in progress
        </span>
      ) : (
        <span className="text-steel-500">—</span>
      ),
    className: 'hidden sm:table-cell',
    card: true,
  },
  { key: 'updatedAt', header: 'Updated', sortable: true, cell: (s) => formatDateTime(s.updatedAt), className: 'hidden md:table-cell' },
];

interface SpoolsTableProps {
  spools: Spool[];
  sort: { field: string; order: SortOrder };
  onSort: (field: string) => void;
  onOpen: (spool: Spool) => void;
  busy?: boolean;
}

/** A job's spools; a row opens the spool. */
export function SpoolsTable({ spools, sort, onSort, onOpen, busy }: SpoolsTableProps) {
  return (
    <Table
      caption="Spools of this job"
      columns={columns}
      rows={spools}
      rowKey={(s) => s.id}
      sort={sort}
      onSort={onSort}
      onRowClick={onOpen}
      busy={busy}
      cardTitle={spoolLink}
    />
  );
}
