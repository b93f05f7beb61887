import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Job, JobCreate } from '../../../../shared/schemas/job.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { StaleNotice } from '../../../components/ui/StaleNotice';
import { ApiError } from '../../../lib/api-error';
import { jobKeys } from '../api/job-keys';
import { useUpdateJob } from '../api/update-job';
import { JobForm } from './JobForm';

/**
 * Edit a job's details and spec. The version sent is the latest one read; on a
 * 409 the form keeps the user's entries and offers to load the newer record.
 */
export function EditJobDialog({ job }: { job: Job }) {
  const [open, setOpen] = useState(false);
  const updateJob = useUpdateJob(job.id);
  const queryClient = useQueryClient();
  const [reloading, setReloading] = useState(false);
  const stale = updateJob.error instanceof ApiError && updateJob.error.isStale;

  const close = () => {
    setOpen(false);
    updateJob.reset();
  };
  const reload = async () => {
    setReloading(true);
    try {
      await queryClient.refetchQueries({ queryKey: jobKeys.detail(job.id), exact: true });
      updateJob.reset();
    } finally {
      setReloading(false);
    }
  };

  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Edit job
      </Button>
      <Dialog open={open} onClose={close} title={`Edit job ${job.number}`} size="lg">
        <JobForm
          job={job}
          submitLabel="Save changes"
          busy={updateJob.isPending}
          error={updateJob.error}
          onCancel={close}
          notice={stale ? <StaleNotice what="job" onReload={reload} reloading={reloading} /> : null}
          onSubmit={(values, changed) => {
            if (changed.length === 0) return close();
            // Only what this user changed, so a save never undoes someone else's edit of another field.
            const patch = Object.fromEntries(changed.map((key) => [key, values[key]])) as Partial<JobCreate>;
            updateJob.mutate({ ...patch, version: job.version }, { onSuccess: close });
          }}
        />
      </Dialog>
    </>
  );
}
