import { Button } from '../../../components/ui/Button';
import { InlineError } from '../../../components/ui/ErrorState';
import { sawListUrl } from '../api/sheet-urls';
import { usePaperSize } from '../hooks/use-paper-size';
import { usePdfActions } from '../hooks/use-pdf-actions';
import { PaperSizeSelect } from './PaperSizeSelect';

interface SawListActionsProps {
  jobId: string;
  /** The spools to cut (e.g. a table's selection); empty or omitted: every open spool of the job. */
  spoolIds?: string[];
}

/** Open / print buttons for a job's saw list, with the paper choice. */
export function SawListActions({ jobId, spoolIds }: SawListActionsProps) {
  const [paper, setPaper] = usePaperSize();
  const { open, print, busy, error } = usePdfActions();
  const url = sawListUrl(jobId, { paper, spoolIds });
  const scope =
    spoolIds && spoolIds.length > 0
      ? `${spoolIds.length} spool${spoolIds.length === 1 ? '' : 's'}`
      : 'all spools';
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" busy={busy === 'open'} onClick={() => void open(url)}>
          Open saw list ({scope})
        </Button>
        <Button variant="primary" busy={busy === 'print'} onClick={() => void print(url)}>
          Print saw list
        </Button>
        <PaperSizeSelect value={paper} onChange={setPaper} />
      </div>
      <InlineError error={error} />
    </div>
  );
}
