import type { Role } from '../../../../shared/schemas/role.schema';
import { REWORK_DONE_ROLES, type Spool } from '../../../../shared/schemas/spool.schema';
import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { formatDateTime } from '../../../lib/format-date';
import { useMarkReworkDone } from '../api/mark-rework-done';
import { spoolStatusDisplay } from './spool-status-labels';

/**
 * The rework flag on the spool page: a revision was issued over work the bay had done. Says
 * where the spool stood, where it went back to and what changed; the bay clears it when done.
 */
export function SpoolReworkNotice({ spool, role, readOnly }: { spool: Spool; role: Role; readOnly: boolean }) {
  const done = useMarkReworkDone(spool.id);
  const rework = spool.rework;
  if (!rework) return null;
  const mayClear = (REWORK_DONE_ROLES as readonly Role[]).includes(role) && !readOnly;
  const moved = rework.fromStatus !== rework.toStatus;
  return (
    <section
      aria-labelledby="rework-title"
      data-testid="rework-notice"
      className="flex flex-col gap-2 rounded-lg border-2 border-spark-500 bg-spark-100 p-4"
    >
      <h2 id="rework-title" className="text-xl font-semibold text-ink-800">
        Rework to revision {rework.letter}
      </h2>
      <p className="text-sm text-ink-800">
        Revision {rework.letter} was issued on {formatDateTime(rework.flaggedAt)} while the spool was{' '}
        <strong>{spoolStatusDisplay[rework.fromStatus].label.toLowerCase()}</strong>
        {moved ? (
          <>
            : it went back to <strong>{spoolStatusDisplay[rework.toStatus].label.toLowerCase()}</strong>.
          </>
        ) : (
          '.'
        )}{' '}
        Work from the revision {rework.letter} sheet; what changed since revision {rework.sinceLetter}:
      </p>
      <ul className="ml-5 list-disc text-sm text-ink-800">
        {rework.changes.map((line, i) => (
          <li key={i}>{line}</li>
        ))}
      </ul>
      {mayClear ? (
        <div className="flex flex-col gap-2">
          <div>
            <Button onClick={() => done.mutate({ version: spool.version })} disabled={done.isPending}>
              {done.isPending ? 'Saving…' : 'Rework done'}
            </Button>
          </div>
          <InlineError error={done.error} />
        </div>
      ) : null}
    </section>
  );
}
