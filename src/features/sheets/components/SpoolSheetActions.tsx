import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { spoolSheetUrl } from '../api/sheet-urls';
import { usePaperSize } from '../hooks/use-paper-size';
import { usePdfActions } from '../hooks/use-pdf-actions';
import { PaperSizeSelect } from './PaperSizeSelect';

interface SpoolSheetActionsProps {
  spoolId: string;
  /** A specific revision (e.g. the draft); omitted: the latest issued one, else the draft. */
  revisionId?: string | null;
  /** Button text prefix, e.g. "Draft sheet". */
  label?: string;
  /** Hide the paper picker (when a page shows one already). */
  showPaper?: boolean;
}

/** Open / print buttons for a spool's fabrication sheet, with the paper choice. */
export function SpoolSheetActions({
  spoolId,
  revisionId,
  label = 'Sheet',
  showPaper = true,
}: SpoolSheetActionsProps) {
  const [paper, setPaper] = usePaperSize();
  const { open, print, busy, error } = usePdfActions();
  const url = spoolSheetUrl(spoolId, { paper, revisionId });
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" busy={busy === 'open'} onClick={() => void open(url)}>
          Open {label.toLowerCase()} (PDF)
        </Button>
        <Button variant="primary" busy={busy === 'print'} onClick={() => void print(url)}>
          Print {label.toLowerCase()}
        </Button>
        {showPaper ? <PaperSizeSelect value={paper} onChange={setPaper} /> : null}
      </div>
      <InlineError error={error} />
    </div>
  );
}
