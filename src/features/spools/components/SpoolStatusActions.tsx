import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Role } from '../../../../shared/schemas/role.schema';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { allowedSpoolStatusTargets, spoolStatusSchema, type SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { SelectField } from '../../../components/ui/Field';
import { StaleNotice } from '../../../components/ui/StaleNotice';
import { ApiError } from '../../../lib/api-error';
import { useChangeSpoolStatus } from '../api/change-spool-status';
import { spoolKeys } from '../api/spool-keys';
import { spoolStatusDisplay } from './spool-status-labels';

/**
 * The next shop-floor steps this role may record (fabricator: cut → fitted →
 * welded; inspector: inspected → released). Admins pick any status from a list.
 */
export function SpoolStatusActions({ spool, role }: { spool: Spool; role: Role }) {
  const change = useChangeSpoolStatus(spool.id);
  const queryClient = useQueryClient();
  const targets = allowedSpoolStatusTargets(role, spool.status);
  const [adminTarget, setAdminTarget] = useState<SpoolStatus | ''>('');
  // Non-admins cannot step back, so each move is confirmed once (a gloved misclick is not a record).
  const [confirming, setConfirming] = useState<SpoolStatus | null>(null);
  const stale = change.error instanceof ApiError && change.error.isStale;

  if (targets.length === 0) return null;

  const move = (status: SpoolStatus) =>
    change.mutate({ status, version: spool.version }, { onSettled: () => setConfirming(null) });
  const reload = async () => {
    await queryClient.refetchQueries({ queryKey: spoolKeys.detail(spool.id), exact: true });
    change.reset();
  };

  return (
    <section aria-labelledby="status-actions" className="flex flex-col gap-3 rounded-lg border border-steel-200 bg-white p-4">
      <div>
        <h2 id="status-actions" className="text-xl font-semibold text-ink-800">
          Record progress
        </h2>
        <p className="text-sm text-steel-600">
          Now <strong className="text-ink-800">{spoolStatusDisplay[spool.status].label}</strong>.{' '}
          {role === 'admin' ? 'As admin you may set any status.' : 'Record the next step when it is done.'}
        </p>
      </div>
      {role === 'admin' ? (
        <div className="flex flex-wrap items-end gap-2">
          <div className="min-w-56">
            <SelectField
              label="Set status"
              value={adminTarget}
              onChange={(e) => setAdminTarget(e.target.value as SpoolStatus | '')}
              options={[
                { value: '', label: 'Choose a status…' },
                ...spoolStatusSchema.options
                  .filter((s) => s !== spool.status)
                  .map((s) => ({ value: s, label: spoolStatusDisplay[s].label })),
              ]}
            />
          </div>
          <Button variant="primary" disabled={!adminTarget} busy={change.isPending} onClick={() => adminTarget && move(adminTarget)}>
            Apply
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          {targets.map((t) => (
            <Button key={t} variant="primary" disabled={change.isPending} onClick={() => setConfirming(t)}>
              {spoolStatusDisplay[t].action}
            </Button>
          ))}
        </div>
      )}
      <ConfirmDialog
        open={confirming !== null}
        title={`Record ${spool.mark} as ${confirming ? spoolStatusDisplay[confirming].label : ''}?`}
        confirmLabel={confirming ? spoolStatusDisplay[confirming].action : ''}
        busy={change.isPending}
        onCancel={() => setConfirming(null)}
        onConfirm={() => confirming && move(confirming)}
      >
        This goes on the spool's record with your name and the time. Only an admin can move it back.
      </ConfirmDialog>
      {stale ? <StaleNotice what="spool" onReload={reload} /> : <InlineError error={change.error} />}
    </section>
  );
}
