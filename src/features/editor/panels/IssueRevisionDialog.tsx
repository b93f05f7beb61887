import { useState } from 'react';
import { reworkConfirmationSchema, type ReworkConfirmation } from '../../../../shared/schemas/revision.schema';
import type { SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import { Dialog } from '../../../components/ui/Dialog';
import { ApiError } from '../../../lib/api-error';
import { InlineError } from '../../../components/ui/ErrorState';
import { PanelButton } from './panel-bits';

/** The server's 409 asking to confirm a rework, parsed; null for any other error. */
export function reworkConfirmationOf(error: unknown): ReworkConfirmation | null {
  if (!(error instanceof ApiError) || error.code !== 'rework_confirmation_required') return null;
  const parsed = reworkConfirmationSchema.safeParse(error.details);
  return parsed.success ? parsed.data : null;
}

/**
 * Issues the working draft as the next revision: a note saying what changed, then the
 * revision is immutable. Unsaved edits are saved first; errors in the design are named.
 * Over work the bay has done, the server asks first: the dialog then names the stage the
 * spool goes back to and lists the changes, and issuing again confirms it.
 */
export function IssueRevisionDialog({
  open,
  onClose,
  onIssue,
  errorCount,
  busy,
  error,
}: {
  open: boolean;
  onClose: () => void;
  onIssue: (note: string, confirmReworkTo?: SpoolStatus) => void;
  errorCount: number;
  busy: boolean;
  error: unknown;
}) {
  const [note, setNote] = useState('');
  const rework = reworkConfirmationOf(error);
  return (
    <Dialog open={open} onClose={onClose} title="Issue this revision">
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          onIssue(note.trim(), rework?.to);
        }}
      >
        <p className="text-sm">Once issued the revision never changes; the next change starts a new draft.</p>
        {errorCount > 0 ? (
          <p className="rounded-md bg-danger-50 p-2 text-sm text-danger-700">
            The design has {errorCount} error{errorCount === 1 ? '' : 's'} (see Checks). Issue only if the sheet should go out as it is.
          </p>
        ) : null}
        <label className="flex flex-col gap-1 text-sm font-semibold">
          What changed (revision note)
          <textarea value={note} onChange={(e) => setNote(e.target.value)} rows={3} maxLength={2000} className="rounded-md border border-steel-300 p-2 font-normal" />
        </label>
        {rework ? (
          <div role="alert" data-testid="rework-confirmation" className="flex flex-col gap-1 rounded-md border-2 border-spark-500 bg-spark-100 p-2 text-sm">
            <p className="font-semibold">
              The bay has already worked on this spool ({stageLabel(rework.from)}).{' '}
              {rework.from === rework.to
                ? `Issuing revision ${rework.letter} keeps it ${stageLabel(rework.to)} and flags it for rework.`
                : `Issuing revision ${rework.letter} sends it back to ${stageLabel(rework.to)} and flags it for rework.`}
            </p>
            <p>Changes since revision {rework.sinceLetter}:</p>
            <ul className="ml-5 max-h-40 list-disc overflow-y-auto">
              {rework.changes.map((line, i) => (
                <li key={i}>{line}</li>
              ))}
            </ul>
          </div>
        ) : (
          <InlineError error={error} />
        )}
        <div className="flex justify-end gap-2">
          <PanelButton onClick={onClose}>Cancel</PanelButton>
          <PanelButton tone="primary" type="submit" disabled={busy || note.trim() === ''}>
            {busy ? 'Issuing…' : rework ? `Send back to ${stageLabel(rework.to)} and issue` : 'Issue revision'}
          </PanelButton>
        </div>
      </form>
    </Dialog>
  );
}

const STAGE_WORDS: Record<SpoolStatus, string> = {
  drafting: 'drafting',
  issued: 'issued (not cut)',
  cut: 'cut (not fitted)',
  fitted: 'fitted up',
  welded: 'welded',
  inspected: 'inspected',
  released: 'released',
  shipped: 'shipped',
  'on-hold': 'on hold',
};

function stageLabel(status: SpoolStatus): string {
  return STAGE_WORDS[status];
}
