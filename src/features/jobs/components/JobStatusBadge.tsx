import type { JobStatus } from '../../../../shared/schemas/job.schema';
import { StatusBadge, type StatusTone } from '../../../components/ui/StatusBadge';

/** How each job status reads on screen. */
export const jobStatusDisplay: Record<JobStatus, { label: string; tone: StatusTone }> = {
  active: { label: 'Active', tone: 'issued' },
  'on-hold': { label: 'On hold', tone: 'hold' },
  complete: { label: 'Complete', tone: 'done' },
  archived: { label: 'Archived', tone: 'muted' },
};

/** A job's status as a labelled badge. */
export function JobStatusBadge({ status }: { status: JobStatus }) {
  return <StatusBadge tone={jobStatusDisplay[status].tone} label={jobStatusDisplay[status].label} />;
}
