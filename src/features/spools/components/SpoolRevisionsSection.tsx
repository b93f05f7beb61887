import type { Spool } from '../../../../shared/schemas/spool.schema';
import { Button } from '../../../components/ui/Button';
import { EmptyState } from '../../../components/ui/EmptyState';
import { ErrorState, InlineError } from '../../../components/ui/ErrorState';
import { LoadingBlock } from '../../../components/ui/Spinner';
import { Table } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format-date';
import { useCreateDraft } from '../api/create-draft';
import { useSpoolRevisions } from '../api/get-spool-revisions';
import { IssueDraftDialog } from './IssueDraftDialog';
import { RevisionStateBadge } from './RevisionStateBadge';

/** The spool's revisions, newest first, with draft and issue actions for those who may detail. */
export function SpoolRevisionsSection({ spool, mayEdit }: { spool: Spool; mayEdit: boolean }) {
  const revisions = useSpoolRevisions(spool.id);
  const startDraft = useCreateDraft(spool.id);
  const archived = Boolean(spool.archivedAt);

  const actions = mayEdit && !archived ? (
    spool.draft ? (
      <IssueDraftDialog spool={spool} />
    ) : (
      <Button variant="secondary" busy={startDraft.isPending} onClick={() => startDraft.mutate()}>
        {spool.currentRevision ? 'Start a new revision' : 'Start the first draft'}
      </Button>
    )
  ) : null;

  return (
    <section aria-labelledby="revisions" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="revisions" className="text-2xl font-semibold text-ink-800">
          Revisions
        </h2>
        <div className="flex gap-2">{actions}</div>
      </div>
      <InlineError error={startDraft.error} />
      {revisions.isPending ? (
        <LoadingBlock label="Loading revisions…" />
      ) : revisions.isError ? (
        <ErrorState error={revisions.error} onRetry={() => void revisions.refetch()} />
      ) : revisions.data.length === 0 ? (
        <EmptyState title="No revisions yet">
          {mayEdit ? 'Start the first draft to lay this spool out.' : 'The detailer has not started this spool yet.'}
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
