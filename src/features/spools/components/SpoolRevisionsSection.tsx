import type { Spool } from '../../../../shared/schemas/spool.schema';
import { EmptyState } from '../../../components/ui/EmptyState';
import { ErrorState } from '../../../components/ui/ErrorState';
import { LoadingBlock } from '../../../components/ui/Spinner';
import { Table } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format-date';
import { useSpoolRevisions } from '../api/get-spool-revisions';
import { RevisionStateBadge } from './RevisionStateBadge';

/**
 * The spool's revision history, newest first. Drafting and issuing happen in the
 * editor above, next to the design and its checks.
 */
export function SpoolRevisionsSection({ spool, mayEdit }: { spool: Spool; mayEdit: boolean }) {
  const revisions = useSpoolRevisions(spool.id);

  return (
    <section aria-labelledby="revisions" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="revisions" className="text-2xl font-semibold text-ink-800">
          Revisions
        </h2>
      </div>
      {revisions.isPending ? (
        <LoadingBlock label="Loading revisions…" />
      ) : revisions.isError ? (
        <ErrorState error={revisions.error} onRetry={() => void revisions.refetch()} />
      ) : revisions.data.length === 0 ? (
        <EmptyState title="No revisions yet">
          {mayEdit ? 'Start laying the spool out in the editor above.' : 'The detailer has not started this spool yet.'}
        </EmptyState>
      ) : (
        <Table
          caption="Revisions of this spool"
          rows={revisions.data}
          rowKey={(r) => r.id}
          columns={[
            { key: 'letter', header: 'Rev.', cell: (r) => <span className="font-mono text-base font-bold">{r.letter}</span> },
            { key: 'state', header: 'State', cell: (r) => <RevisionStateBadge state={r.state} /> },
            { key: 'note', header: 'Note', cell: (r) => r.note || <span className="text-steel-500">—</span> },
            { key: 'author', header: 'By', cell: (r) => r.author.displayName },
            {
              key: 'when',
              header: 'Issued / saved',
              cell: (r) => (r.issuedAt ? formatDateTime(r.issuedAt) : `saved ${formatDateTime(r.updatedAt)}`),
            },
          ]}
        />
      )}
    </section>
  );
}
