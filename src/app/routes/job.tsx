import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorState } from '../../components/ui/ErrorState';
import { PageHeader } from '../../components/ui/PageHeader';
import { LoadingBlock } from '../../components/ui/Spinner';
import { useCurrentUser } from '../../features/auth/hooks/use-current-user';
import { can } from '../../features/auth/permissions';
import { jobQueryOptions, useJob } from '../../features/jobs/api/get-job';
import { ArchiveJobButton } from '../../features/jobs/components/ArchiveJobButton';
import { EditJobDialog } from '../../features/jobs/components/EditJobDialog';
import { JobSpecPanel } from '../../features/jobs/components/JobSpecPanel';
import { JobStatusBadge } from '../../features/jobs/components/JobStatusBadge';
import { SawListActions } from '../../features/sheets/components/SawListActions';
import { JobSpoolsSection } from '../../features/spools/components/JobSpoolsSection';
import { queryClient } from '../../lib/query-client';
import { isMissing } from '../../lib/api-error';
import { NotFoundPage } from './not-found';

/** Starts the job's request with the route's code, without holding the navigation. */
export function loader({ params }: LoaderFunctionArgs) {
  if (params.jobId) void queryClient.prefetchQuery(jobQueryOptions(params.jobId));
  return null;
}

export function Component() {
  const { jobId = '' } = useParams();
  const user = useCurrentUser();
  const job = useJob(jobId);

  if (job.isPending) return <LoadingBlock label="Loading job…" />;
  if (job.isError) {
    if (isMissing(job.error)) return <NotFoundPage what="job" />;
    return <ErrorState error={job.error} onRetry={() => void job.refetch()} />;
  }
  const j = job.data;
  const mayManage = can.manageJobs(user.role);

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <nav aria-label="Breadcrumb" className="flex items-center gap-2">
            <Link to="/" className="hover:underline">
              Jobs
            </Link>
            <span aria-hidden="true">/</span>
            <span className="font-mono">{j.number}</span>
          </nav>
        }
        title={
          <span className="flex flex-wrap items-baseline gap-x-3">
            <span className="font-mono text-2xl text-steel-600 md:text-3xl">{j.number}</span>
            <span>{j.title}</span>
          </span>
        }
        actions={
          mayManage && j.status !== 'archived' ? (
            <>
              <EditJobDialog job={j} />
              <ArchiveJobButton job={j} />
            </>
          ) : null
        }
      >
        <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-steel-600">
          <JobStatusBadge status={j.status} />
          <span>
            Client <strong className="text-ink-800">{j.client}</strong>
          </span>
          {j.site ? (
            <span>
              Site <strong className="text-ink-800">{j.site}</strong>
            </span>
          ) : null}
          <span>
            <span className="font-mono">{j.spoolCount}</span> {j.spoolCount === 1 ? 'spool' : 'spools'}
          </span>
        </div>
      </PageHeader>
      {j.status === 'archived' ? (
        <p role="status" data-testid="job-archived-banner" className="rounded-md border border-steel-300 bg-steel-100 px-3 py-2 text-sm text-ink-800">
          This job is archived: its spools, designs and progress are kept for the record and are read-only.
        </p>
      ) : null}
      <JobSpecPanel job={j} />
      <JobSpoolsSection job={j} mayCreate={can.manageSpools(user.role) && j.status !== 'archived'} />
      <section aria-labelledby="job-paperwork" className="flex flex-col gap-2 rounded-lg border border-steel-200 bg-white p-4">
        <h2 id="job-paperwork" className="text-xl font-semibold text-ink-800">
          Saw list
        </h2>
        <p className="text-sm text-steel-600">Every open spool's cut lengths, nested into stock lengths with the saw kerf.</p>
        <SawListActions jobId={j.id} />
      </section>
    </div>
  );
}
