import { useState } from 'react';
import type { Job } from '../../../../shared/schemas/job.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { useArchiveJob } from '../api/archive-job';

/** Archive with a confirmation; archived jobs keep every spool and revision. */
export function ArchiveJobButton({ job }: { job: Job }) {
  const [open, setOpen] = useState(false);
  const archive = useArchiveJob(job.id);
  return (
    <>
      <Button variant="ghost" onClick={() => setOpen(true)}>
        Archive
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Archive job ${job.number}?`}>
        <p className="text-sm text-ink-800">
          The job leaves the job list. Its spools, revisions and records are kept and can still be opened by link.
        </p>
        <div className="mt-4">
          <InlineError error={archive.error} />
        </div>
        <div className="mt-4 flex justify-end gap-2">
          <Button variant="ghost" onClick={() => setOpen(false)}>
            Keep it
          </Button>
          <Button variant="danger" busy={archive.isPending} onClick={() => archive.mutate(job.version, { onSuccess: () => setOpen(false) })}>
            Archive job
          </Button>
        </div>
      </Dialog>
    </>
  );
}
