import { useMemo } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { Dialog } from '../../../components/ui/Dialog';
import { formatDateTime } from '../../../lib/format-date';
import type { DraftConflict } from '../hooks/use-draft-autosave';
import { designToJson, downloadBlob, fileNameFor } from '../io/design-file';
import { PanelButton } from './panel-bits';

function Summary({
  title,
  design,
  result,
  other,
  units,
  note,
}: {
  title: string;
  design: SpoolDesign | null;
  result: SpoolResult | null;
  other: SpoolResult | null;
  units: LengthUnits;
  note: string;
}) {
  return (
    <section className="flex flex-col gap-1 rounded-md border border-steel-200 p-3">
      <h3 className="text-lg font-semibold">{title}</h3>
      <p className="text-xs text-steel-600">{note}</p>
      {design && result ? (
        <>
          <p className="text-sm">
            {design.nodes.length} components, {design.runs.length} runs, {result.pieces.length} pieces, {result.welds.length} welds
          </p>
          <ul className="font-mono text-xs">
            {result.pieces.map((p) => {
              // Pieces whose cut differs between the versions stand out.
              const twin = other?.pieces.find((o) => o.mark === p.mark);
              const differs = !twin || twin.cutLengthMm !== p.cutLengthMm || twin.nps !== p.nps || twin.heat !== p.heat;
              return (
                <li key={p.mark} className={differs ? 'font-bold text-spark-700' : ''}>
                  {p.mark} NPS {p.nps}: {p.cutLengthMm === null ? 'impossible' : formatLength(p.cutLengthMm, units)}
                  {p.heat ? ` · heat ${p.heat}` : ''}
                  {differs ? ' (differs)' : ''}
                </li>
              );
            })}
          </ul>
        </>
      ) : (
        <p className="text-sm text-danger-700">The stored design could not be read.</p>
      )}
    </section>
  );
}

/**
 * Someone saved this draft while you were editing. Both versions side by side; you keep
 * yours (saved on top), or take theirs (yours stays one undo away), or download yours.
 */
export function ConflictDialog({
  conflict,
  compute,
  units,
  onKeepMine,
  onTakeTheirs,
  onLater,
}: {
  conflict: DraftConflict;
  compute: (d: SpoolDesign) => SpoolResult;
  units: LengthUnits;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  /** Closes the dialog without choosing; the editor keeps both and autosave waits. */
  onLater: () => void;
}) {
  const mine = useMemo(() => compute(conflict.mine), [compute, conflict.mine]);
  const theirs = useMemo(() => (conflict.theirsDesign ? compute(conflict.theirsDesign) : null), [compute, conflict.theirsDesign]);
  return (
    <Dialog open onClose={onLater} title="Someone else saved this draft" size="lg">
      <div className="flex flex-col gap-3">
        <p className="text-sm text-ink-800">
          {conflict.theirs.author.displayName} saved the draft at {formatDateTime(conflict.theirs.updatedAt)} while you were editing. Nothing of yours has been
          lost: choose which version carries on.
        </p>
        <div className="grid gap-3 sm:grid-cols-2">
          <Summary title="Yours (this browser)" design={conflict.mine} result={mine} other={theirs} units={units} note="Not saved yet; kept in this browser." />
          <Summary title="Stored" design={conflict.theirsDesign} result={theirs} other={mine} units={units} note={`Version ${conflict.theirs.version}, saved by ${conflict.theirs.author.displayName}`} />
        </div>
        <div className="flex flex-wrap justify-end gap-2">
          <PanelButton onClick={() => downloadBlob(designToJson(conflict.mine), 'application/json', fileNameFor(conflict.mine.mark, 'mine.json'))}>Download mine</PanelButton>
          <PanelButton onClick={onTakeTheirs} disabled={!conflict.theirsDesign}>
            Take the stored version
          </PanelButton>
          <PanelButton tone="primary" onClick={onKeepMine}>
            Keep mine (save over it)
          </PanelButton>
        </div>
      </div>
    </Dialog>
  );
}
