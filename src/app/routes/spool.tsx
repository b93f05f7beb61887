import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorState } from '../../components/ui/ErrorState';
import { PageHeader } from '../../components/ui/PageHeader';
import { SafetyNote } from '../../components/ui/SafetyNote';
import { LoadingBlock } from '../../components/ui/Spinner';
import { useCurrentUser } from '../../features/auth/hooks/use-current-user';
import { can } from '../../features/auth/permissions';
import { useJob } from '../../features/jobs/api/get-job';
import { spoolQueryOptions, useSpool } from '../../features/spools/api/get-spool';
import { ArchiveSpoolButton } from '../../features/spools/components/ArchiveSpoolButton';
import { EditSpoolDialog } from '../../features/spools/components/EditSpoolDialog';
import { SpoolSheetActions } from '../../features/sheets/components/SpoolSheetActions';
import { SpoolEditorSlot } from '../../features/spools/components/SpoolEditorSlot';
import { SpoolRevisionsSection } from '../../features/spools/components/SpoolRevisionsSection';
import { SpoolReworkNotice } from '../../features/spools/components/SpoolReworkNotice';
import { SpoolStatusActions } from '../../features/spools/components/SpoolStatusActions';
import { SpoolStatusBadge } from '../../features/spools/components/SpoolStatusBadge';
import { allowedSpoolStatusTargets } from '../../../shared/schemas/spool-status.schema';
import { isMissing } from '../../lib/api-error';
import { formatDateTime } from '../../lib/format-date';
import { unitsLabel } from '../../lib/units-label';
import { queryClient } from '../../lib/query-client';
import { NotFoundPage } from './not-found';

export function loader({ params }: LoaderFunctionArgs) {
  if (params.spoolId) void queryClient.prefetchQuery(spoolQueryOptions(params.spoolId));
  return null;
}

export function Component() {
  const { spoolId = '' } = useParams();
  const user = useCurrentUser();
  const spool = useSpool(spoolId);
  const job = useJob(spool.data?.jobId ?? '');

  if (spool.isPending) return <LoadingBlock label="Loading spool…" />;
  if (spool.isError) {
    if (isMissing(spool.error)) return <NotFoundPage what="spool" />;
    return <ErrorState error={spool.error} onRetry={() => void spool.refetch()} />;
  }
  const s = spool.data;
  // An archived job, like an archived spool, is read-only throughout (the server answers 409).
  const jobArchived = job.data?.status === 'archived';
  const readOnly = Boolean(s.archivedAt) || jobArchived;
  const mayManage = can.manageSpools(user.role) && !readOnly;
  const mayEditDesign = can.editDesigns(user.role) && !readOnly;
  const mayRecord = !readOnly && allowedSpoolStatusTargets(user.role, s.status).length > 0;

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <nav aria-label="Breadcrumb" className="flex flex-wrap items-center gap-2">
            <Link to="/" className="hover:underline">
              Jobs
            </Link>
            <span aria-hidden="true">/</span>
            <Link to={`/jobs/${s.jobId}`} className="font-mono hover:underline">
              {job.data ? job.data.number : 'Job'}
            </Link>
            <span aria-hidden="true">/</span>
            <span className="font-mono">{s.mark}</span>
          </nav>
        }
        title={<span className="font-mono tracking-tight">{s.mark}</span>}
        actions={
          mayManage ? (
            <>
              <EditSpoolDialog spool={s} />
              <ArchiveSpoolButton spool={s} />
            </>
          ) : null
        }
      >
        <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-steel-600">
          <SpoolStatusBadge status={s.status} />
          <span>
            Line <strong className="font-mono text-ink-800">{s.lineNumber}</strong>
          </span>
          {s.currentRevision ? (
            <span>
              Issued revision <strong className="font-mono text-ink-800">{s.currentRevision.letter}</strong> ·{' '}
              {formatDateTime(s.currentRevision.issuedAt)}
            </span>
          ) : (
            <span>Not issued yet</span>
          )}
          {job.data ? (
            <span>
              Dimensions in <strong className="text-ink-800">{unitsLabel(job.data.units)}</strong>
            </span>
          ) : null}
          {s.archivedAt ? <span className="font-semibold text-danger-700">Archived {formatDateTime(s.archivedAt)}</span> : null}
        </div>
      </PageHeader>

      {jobArchived ? (
        <p role="status" data-testid="job-archived-banner" className="rounded-md border border-steel-300 bg-steel-100 px-3 py-2 text-sm text-ink-800">
          Job {job.data?.number} is archived: this spool, its designs and its progress are read-only.
        </p>
      ) : null}

      <SpoolReworkNotice spool={s} role={user.role} readOnly={readOnly} />

      <div className={mayRecord ? 'grid gap-4 lg:grid-cols-2' : 'grid gap-4'}>
        <section aria-labelledby="spool-sheet" className="flex flex-col gap-2 rounded-lg border border-steel-200 bg-white p-4">
          <h2 id="spool-sheet" className="text-xl font-semibold text-ink-800">
            Fabrication sheet
          </h2>
          <p className="text-sm text-steel-600">
            {s.currentRevision
              ? `Revision ${s.currentRevision.letter}, as issued to the bay.`
              : 'Not issued yet: the sheet shows the working draft, marked as such.'}
          </p>
          <SpoolSheetActions spoolId={s.id} />
        </section>
        {mayRecord ? <SpoolStatusActions spool={s} role={user.role} /> : null}
      </div>

      <SpoolEditorSlot spoolId={s.id} readOnly={!mayEditDesign} />

      <SafetyNote title="Before lifting, welding or testing">
        <p>
          Weights and centres of gravity shown for a spool are estimates: every lift is planned by a competent person with
          the shop's rigging.
        </p>
        <p>Hot work needs the shop's permits, PPE and fume control. Pressure tests store energy: keep the exclusion zone and follow the test procedure.</p>
      </SafetyNote>

      <SpoolRevisionsSection spool={s} mayEdit={mayEditDesign} />
    </div>
  );
}
