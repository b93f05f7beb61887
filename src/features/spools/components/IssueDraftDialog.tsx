import { useState } from 'react';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { revisionNoteSchema } from '../../../../shared/schemas/revision.schema';
import { Button } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { InlineError } from '../../../components/ui/ErrorState';
import { useIssueDraft } from '../api/issue-draft';

/** Issue the working draft to the bay as a new revision, with a note saying why. */
export function IssueDraftDialog({ spool }: { spool: Spool }) {
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const issue = useIssueDraft(spool.id);
  const parsed = revisionNoteSchema.safeParse(note);
  if (!spool.draft) return null;
  const draft = spool.draft;
  const close = () => {
    setOpen(false);
    issue.reset();
  };
  return (
    <>
      <Button variant="primary" onClick={() => setOpen(true)}>
        Issue revision {draft.letter}
      </Button>
      <Dialog open={open} onClose={close} title={`Issue revision ${draft.letter} of ${spool.mark}`}>
        <form
          noValidate
          className="flex flex-col gap-4"
          onSubmit={(e) => {
            e.preventDefault();
            if (!parsed.success) return;
            issue.mutate({ note: parsed.data, version: draft.version }, { onSuccess: () => { setNote(''); close(); } });
          }}
        >
          <p className="text-sm text-ink-800">
            Issued revisions go to the bay and never change again. {spool.currentRevision ? `Revision ${spool.currentRevision.letter} becomes superseded.` : ''}
          </p>
          <label className="flex flex-col gap-1 text-sm font-semibold text-ink-800">
            What changed (printed on the sheet)
            <textarea
              value={note}
              onChange={(e) => setNote(e.target.value)}
              rows={3}
              maxLength={2000}
              className="rounded-md border border-steel-300 p-3 text-base font-normal focus:border-spark-500 focus:outline-none focus:ring-2 focus:ring-spark-300"
            />
          </label>
          {!parsed.success ? <p className="text-sm text-danger-700">{parsed.error.issues[0]?.message}</p> : null}
          <InlineError error={issue.error} />
          <div className="flex justify-end gap-2">
            <Button variant="ghost" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" variant="primary" busy={issue.isPending} disabled={!parsed.success}>
              Issue revision {draft.letter}
            </Button>
          </div>
        </form>
      </Dialog>
    </>
  );
}
