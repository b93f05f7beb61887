import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { useCreateSpool } from '../api/create-spool';
import { SpoolForm } from './SpoolForm';

/** "New spool" button and its dialog; the new spool shows up in the job's table. */
export function CreateSpoolDialog({ jobId, jobNumber }: { jobId: string; jobNumber: string }) {
  const [open, setOpen] = useState(false);
  const createSpool = useCreateSpool(jobId);
  const close = () => {
    setOpen(false);
    createSpool.reset();
  };
  return (
    <>
      <Button variant="primary" onClick={() => setOpen(true)}>
        New spool
      </Button>
      <Dialog open={open} onClose={close} title={`New spool in ${jobNumber}`}>
        <SpoolForm
          submitLabel="Add spool"
          busy={createSpool.isPending}
          error={createSpool.error}
          onCancel={close}
          onSubmit={(values) => createSpool.mutate(values, { onSuccess: close })}
        />
      </Dialog>
    </>
  );
}
