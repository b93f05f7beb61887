import { useNavigate } from 'react-router';
import { EmptyState } from '../../components/ui/EmptyState';
import { ErrorState } from '../../components/ui/ErrorState';
import { PageHeader } from '../../components/ui/PageHeader';
import { Pagination } from '../../components/ui/Pagination';
import { SearchBox } from '../../components/ui/SearchBox';
import { LoadingBlock } from '../../components/ui/Spinner';
import { useCurrentUser } from '../../features/auth/hooks/use-current-user';
import { can } from '../../features/auth/permissions';
import { useJobs } from '../../features/jobs/api/get-jobs';
import { CreateJobDialog } from '../../features/jobs/components/CreateJobDialog';
import { JobsTable } from '../../features/jobs/components/JobsTable';
import { JOB_SORT_FIELDS, jobStatusSchema } from '../../../shared/schemas/job.schema';
import { FilterSelect } from '../../components/ui/FilterSelect';
import { useSearchParam } from '../../lib/use-search-param';
import { jobStatusDisplay } from '../../features/jobs/components/JobStatusBadge';
import { useListSearchParams } from '../../lib/use-list-search-params';

const PAGE_SIZE = 25;
const STATUS_FILTERS = [
  { value: '', label: 'All but archived' },
  ...jobStatusSchema.options.map((s) => ({ value: s, label: jobStatusDisplay[s].label })),
];
const DEFAULT_SORT = { sort: 'number', order: 'asc' } as const;

/** Home: the shop's jobs. */
export function Component() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const { state, update, toggleSort } = useListSearchParams(JOB_SORT_FIELDS, DEFAULT_SORT);
  const [status, setStatus] = useSearchParam('status', jobStatusSchema.options);
  const jobs = useJobs({
    page: state.page,
    pageSize: PAGE_SIZE,
    sort: state.sort,
    order: state.order,
    q: state.q || undefined,
    status,
  });
  const mayCreate = can.manageJobs(user.role);

  return (
    <div className="flex flex-col gap-5">
      <PageHeader eyebrow={user.organisation.name} title="Jobs" actions={mayCreate ? <CreateJobDialog /> : null} />
      <div className="flex flex-wrap items-center gap-3">
        <SearchBox label="Search jobs" placeholder="Search number, title, client" value={state.q} onChange={(q) => update({ q, page: 1 })} />
        <FilterSelect label="Show" value={status ?? ''} onChange={setStatus} options={STATUS_FILTERS} />
      </div>
      {jobs.isPending ? (
        <LoadingBlock label="Loading jobs…" />
      ) : jobs.isError ? (
        <ErrorState error={jobs.error} onRetry={() => void jobs.refetch()} />
      ) : jobs.data.items.length === 0 ? (
        state.q || status ? (
          <EmptyState title="No job matches">
            {state.q ? `Nothing matches “${state.q}”. Try a job number or client name.` : 'No job has this status.'}
          </EmptyState>
        ) : (
          <EmptyState title="No jobs yet" action={mayCreate ? <CreateJobDialog /> : null}>
            {mayCreate
              ? 'Start with the client’s contract: its number, units and default spec.'
              : 'Jobs appear here once a detailer or admin creates them.'}
          </EmptyState>
        )
      ) : (
        <>
          <JobsTable
            jobs={jobs.data.items}
            sort={{ field: state.sort, order: state.order }}
            onSort={toggleSort}
            onOpen={(job) => void navigate(`/jobs/${job.id}`)}
            busy={jobs.isFetching && jobs.isPlaceholderData}
          />
          <Pagination page={state.page} pageSize={PAGE_SIZE} total={jobs.data.total} onPage={(page) => update({ page })} noun="jobs" />
        </>
      )}
    </div>
  );
}
