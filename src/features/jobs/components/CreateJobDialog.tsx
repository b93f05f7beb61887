import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { useCreateJob } from '../api/create-job';
import { JobForm } from './JobForm';

/** "New job" button and its dialog; opens the new job when saved. */
export function CreateJobDialog() {
  const [open, setOpen] = useState(false);
  const createJob = useCreateJob();
  const navigate = useNavigate();
  const close = () => {
    setOpen(false);
    createJob.reset();
  };
  return (
    <>
      <Button variant="primary" onClick={() => setOpen(true)}>
        New job
      </Button>
      <Dialog open={open} onClose={close} title="New job" size="lg">
        <JobForm
          submitLabel="Create job"
          busy={createJob.isPending}
          error={createJob.error}
          onCancel={close}
          onSubmit={(values) =>
            createJob.mutate(values, {
              onSuccess: (job) => {
                close();
                void navigate(`/jobs/${job.id}`);
              },
            })
          }
        />
      </Dialog>
    </>
  );
}
