import { useState } from 'react';
import { Dialog } from '../../../components/ui/Dialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { PanelButton } from './panel-bits';

/**
 * Issues the working draft as the next revision: a note saying what changed, then the
 * revision is immutable. Unsaved edits are saved first; errors in the design are named.
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
  onIssue: (note: string) => void;
  errorCount: number;
  busy: boolean;
  error: unknown;
}) {
  const [note, setNote] = useState('');
  return (
    <Dialog open={open} onClose={onClose} title="Issue this revision">
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          onIssue(note.trim());
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
        <InlineError error={error} />
        <div className="flex justify-end gap-2">
          <PanelButton onClick={onClose}>Cancel</PanelButton>
          <PanelButton tone="primary" type="submit" disabled={busy || note.trim() === ''}>
            {busy ? 'Issuing…' : 'Issue revision'}
          </PanelButton>
        </div>
      </form>
    </Dialog>
  );
}
