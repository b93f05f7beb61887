import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { Role } from '../../../../shared/schemas/role.schema';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { allowedSpoolStatusTargets, spoolStatusSchema, type SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import { Button } from '../../../components/ui/Button';
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
  const stale = change.error instanceof ApiError && change.error.isStale;

  if (targets.length === 0) return null;

  const move = (status: SpoolStatus) => change.mutate({ status, version: spool.version });
  const reload = async () => {
    await queryClient.refetchQueries({ queryKey: spoolKeys.detail(spool.id), exact: true });
    change.reset();
  };

  return (
    <section aria-labelledby="status-actions" className="flex flex-col gap-3 rounded-lg border border-steel-200 bg-white p-4">
      <h2 id="status-actions" className="text-xl font-semibold text-ink-800">
        Record progress
      </h2>
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
            <Button key={t} variant="primary" busy={change.isPending && change.variables?.status === t} disabled={change.isPending} onClick={() => move(t)}>
              {spoolStatusDisplay[t].action}
            </Button>
          ))}
        </div>
      )}
      {stale ? <StaleNotice what="spool" onReload={reload} /> : <InlineError error={change.error} />}
    </section>
  );
}
