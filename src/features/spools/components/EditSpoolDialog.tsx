import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { StaleNotice } from '../../../components/ui/StaleNotice';
import { ApiError } from '../../../lib/api-error';
import { spoolKeys } from '../api/spool-keys';
import { useUpdateSpool } from '../api/update-spool';
import { SpoolForm } from './SpoolForm';

/** Rename a spool or correct its line number; a 409 keeps the entries and offers the newer record. */
export function EditSpoolDialog({ spool }: { spool: Spool }) {
  const [open, setOpen] = useState(false);
  const update = useUpdateSpool(spool.id);
  const queryClient = useQueryClient();
  const stale = update.error instanceof ApiError && update.error.isStale;
  const close = () => {
    setOpen(false);
    update.reset();
  };
  const reload = async () => {
    await queryClient.refetchQueries({ queryKey: spoolKeys.detail(spool.id), exact: true });
    update.reset();
  };
  return (
    <>
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Edit mark / line
      </Button>
      <Dialog open={open} onClose={close} title={`Edit spool ${spool.mark}`}>
        <SpoolForm
          initial={{ mark: spool.mark, lineNumber: spool.lineNumber }}
          submitLabel="Save changes"
          busy={update.isPending}
          error={update.error}
          onCancel={close}
          notice={stale ? <StaleNotice what="spool" onReload={reload} /> : null}
          onSubmit={(values, changed) => {
            if (changed.length === 0) return close();
            const patch = Object.fromEntries(changed.map((key) => [key, values[key]]));
            update.mutate({ ...patch, version: spool.version }, { onSuccess: close });
          }}
        />
      </Dialog>
    </>
  );
}
