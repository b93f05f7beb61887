import { useState } from 'react';
import { useNavigate } from 'react-router';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { useArchiveSpool } from '../api/archive-spool';

/** Archive a spool with confirmation, then go back to its job. */
export function ArchiveSpoolButton({ spool }: { spool: Spool }) {
  const [open, setOpen] = useState(false);
  const archive = useArchiveSpool(spool.id);
  const navigate = useNavigate();
  return (
    <>
      <Button variant="ghost" onClick={() => setOpen(true)}>
        Archive
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Archive spool ${spool.mark}?`}>
        <p className="text-sm text-ink-800">
          The spool leaves its job's table. Its revisions and records are kept.
        </p>
        <div className="mt-4">
          <InlineError error={archive.error} />
        </div>
        <div className="mt-4 flex justify-end gap-2">
          <Button variant="ghost" onClick={() => setOpen(false)}>
            Keep it
          </Button>
          <Button
            variant="danger"
            busy={archive.isPending}
            onClick={() => archive.mutate(spool.version, { onSuccess: () => void navigate(`/jobs/${spool.jobId}`) })}
          >
            Archive spool
          </Button>
        </div>
      </Dialog>
    </>
  );
}
