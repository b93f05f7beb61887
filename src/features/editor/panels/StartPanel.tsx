import { useState } from 'react';
import { NPS_VALUES, type Nps } from '../../../../shared/standards/nps';
import { beginLine } from '../model/commands/start-spool';
import type { EditorModel } from '../model/editor-model';
import { END_OPTIONS, endFromChoice, type EndChoice } from './end-options';
import { PanelButton, SmallSelect, npsOptions } from './panel-bits';

/** The first step on an empty draft: the main line size and what sits at the start. */
export function StartPanel({ model, defaultNps }: { model: EditorModel; defaultNps: Nps | null }) {
  const [nps, setNps] = useState<Nps>(defaultNps ?? '6');
  const [end, setEnd] = useState<EndChoice>('weld-neck-flange');
  return (
    <form
      aria-label="Begin the spool"
      className="flex flex-wrap items-end gap-3 rounded-md border border-spark-300 bg-spark-100 p-3"
      onSubmit={(e) => {
        e.preventDefault();
        model.edit((d) => beginLine(d, { nps, end: endFromChoice(end) }));
      }}
    >
      <p className="basis-full text-sm text-ink-800">
        Begin at one end of the spool: choose the main size and what sits at that end, then add runs from it.
      </p>
      <SmallSelect label="Main size" value={nps} onChange={(e) => setNps(e.target.value as Nps)} options={npsOptions(NPS_VALUES)} />
      <SmallSelect label="Start with" value={end} onChange={(e) => setEnd(e.target.value as EndChoice)} options={END_OPTIONS} />
      <PanelButton tone="primary" type="submit">
        Begin
      </PanelButton>
    </form>
  );
}
