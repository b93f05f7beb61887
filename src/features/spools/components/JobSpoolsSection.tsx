import { useNavigate } from 'react-router';
import type { Job } from '../../../../shared/schemas/job.schema';
import { SPOOL_SORT_FIELDS } from '../../../../shared/schemas/spool.schema';
import { spoolStatusSchema } from '../../../../shared/schemas/spool-status.schema';
import { FilterSelect } from '../../../components/ui/FilterSelect';
import { useSearchParam } from '../../../lib/use-search-param';
import { spoolStatusDisplay } from './spool-status-labels';
import { EmptyState } from '../../../components/ui/EmptyState';
import { ErrorState } from '../../../components/ui/ErrorState';
import { Pagination } from '../../../components/ui/Pagination';
import { SearchBox } from '../../../components/ui/SearchBox';
import { LoadingBlock } from '../../../components/ui/Spinner';
import { useListSearchParams } from '../../../lib/use-list-search-params';
import { useJobSpools } from '../api/get-job-spools';
import { CreateSpoolDialog } from './CreateSpoolDialog';
import { SpoolsTable } from './SpoolsTable';

const PAGE_SIZE = 20;
const DEFAULT_SORT = { sort: 'mark', order: 'asc' } as const;
const STATUS_FILTERS = [
  { value: '', label: 'Every status' },
  ...spoolStatusSchema.options.map((s) => ({ value: s, label: spoolStatusDisplay[s].label })),
];

/** A job's spools: search, sortable table, pages, and "new spool" for those allowed. */
export function JobSpoolsSection({ job, mayCreate }: { job: Job; mayCreate: boolean }) {
  const navigate = useNavigate();
  const { state, update, toggleSort } = useListSearchParams(SPOOL_SORT_FIELDS, DEFAULT_SORT);
  const [status, setStatus] = useSearchParam('status', spoolStatusSchema.options);
  const spools = useJobSpools(job.id, {
    status,
    page: state.page,
    pageSize: PAGE_SIZE,
    sort: state.sort,
    order: state.order,
    q: state.q || undefined,
  });
  const createButton = mayCreate && job.status !== 'archived' ? <CreateSpoolDialog jobId={job.id} jobNumber={job.number} /> : null;

  return (
    <section aria-labelledby="job-spools" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="job-spools" className="text-2xl font-semibold text-ink-800">
          Spools
        </h2>
        {createButton}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <SearchBox label="Search spools" placeholder="Search mark or line" value={state.q} onChange={(q) => update({ q, page: 1 })} />
        <FilterSelect label="Status" value={status ?? ''} onChange={setStatus} options={STATUS_FILTERS} />
      </div>
      {spools.isPending ? (
        <LoadingBlock label="Loading spools…" />
      ) : spools.isError ? (
        <ErrorState error={spools.error} onRetry={() => void spools.refetch()} />
      ) : spools.data.items.length === 0 ? (
        state.q || status ? (
          <EmptyState title="No spool matches">
            {state.q ? `Nothing matches “${state.q}”.` : `No spool is ${spoolStatusDisplay[status!].label.toLowerCase()}.`}
          </EmptyState>
        ) : (
          <EmptyState title="No spools in this job yet" action={createButton}>
            {mayCreate
              ? 'Break the isometric into spools: give each a mark and its line number, then lay it out.'
              : 'Spools appear here once the detailer adds them.'}
          </EmptyState>
        )
      ) : (
        <>
          <SpoolsTable
            spools={spools.data.items}
            sort={{ field: state.sort, order: state.order }}
            onSort={toggleSort}
            onOpen={(s) => void navigate(`/spools/${s.id}`)}
            busy={spools.isFetching && spools.isPlaceholderData}
          />
          <Pagination page={state.page} pageSize={PAGE_SIZE} total={spools.data.total} onPage={(page) => update({ page })} noun="spools" />
        </>
      )}
    </section>
  );
}
