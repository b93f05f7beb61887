import { useState } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { RunLengthKind, SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';
import { NPS_VALUES, type Nps } from '../../../../shared/standards/nps';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { setLineSize, setRunDirection, setRunLength, setRunProperties } from '../model/commands/edit-run';
import type { EditorModel } from '../model/editor-model';
import { effectiveNps } from '../model/line-size';
import { useUserNames } from '../hooks/use-user-names';
import { PLANT_AXES, axisOf, describeDirection } from '../model/plant-directions';
import { AxisPicker } from './AxisPicker';
import { InsertOnRunForm, type InsertType } from './InsertOnRunForm';
import { LengthInput } from './LengthInput';
import { Fact, PanelButton, PanelSection, SmallSelect, npsOptions } from './panel-bits';
import { EditorIcon } from './editor-icons';

const KIND_OPTIONS: { value: RunLengthKind; label: string }[] = [
  { value: 'centre-to-centre', label: 'Centre-to-centre' },
  { value: 'centre-to-face', label: 'Centre-to-face' },
  { value: 'face-to-face', label: 'Face-to-face' },
  { value: 'cut', label: 'Cut length' },
];

/** Properties of a selected run: its length (typed), direction, size, heat; what the engine made of it. */
export function RunProperties({
  model,
  design,
  result,
  run,
  units,
  readOnly,
  insertRequest,
  onDelete,
}: {
  model: EditorModel;
  design: SpoolDesign;
  result: SpoolResult | null;
  run: SpoolRun;
  units: LengthUnits;
  readOnly: boolean;
  insertRequest: { type: InsertType; nonce: number } | null;
  onDelete: (id: string) => void;
}) {
  const placed = result?.runs.find((r) => r.runId === run.id) ?? null;
  const piece = result?.pieces.find((p) => p.runIds.includes(run.id)) ?? null;
  const nps = effectiveNps(design, run.id);
  const names = useUserNames(result, design);
  const [lengthMm, setLengthMm] = useState<number | null>(run.length.mm);
  const [kind, setKind] = useState<RunLengthKind>(run.length.kind);
  const [heat, setHeat] = useState(run.heat ?? '');
  const [shownFor, setShownFor] = useState(run);
  if (shownFor !== run) {
    // Another run (or an undo): show its values, not the last one's.
    setShownFor(run);
    setLengthMm(run.length.mm);
    setKind(run.length.kind);
    setHeat(run.heat ?? '');
  }
  // Every keystroke that reads as a length is applied at once (one undo step per run),
  // so the cut list and the model follow the typing.
  const apply = (mm: number | null = lengthMm, k: RunLengthKind = kind) => {
    if (mm === null) return;
    if (mm === run.length.mm && k === run.length.kind) return;
    model.edit((d) => setRunLength(d, { runId: run.id, lengthMm: mm, lengthKind: k }), { coalesce: `length:${run.id}` });
  };
  const fmt = (mm: number | null | undefined) => (mm === null || mm === undefined ? '—' : formatLength(mm, units));

  return (
    <div className="flex flex-col gap-3" data-testid="run-properties">
      <PanelSection
        title={`Run ${names.run(run.id)}${piece ? ` (${piece.mark})` : ''}`}
        actions={
          !readOnly ? (
            <PanelButton tone="danger" onClick={() => onDelete(run.id)} title="Takes everything downstream with it (key Del)" aria-keyshortcuts="Delete">
              <EditorIcon name="trash" className="h-4 w-4" /> Delete
            </PanelButton>
          ) : null
        }
      >
        <p className="text-sm text-steel-600">
          NPS {nps ?? '?'} · {placed?.schedule ?? ''} · {describeDirection(run.direction)}
        </p>
        <div className="grid grid-cols-[1fr_auto] items-start gap-2">
          <LengthInput
            label="Length"
            units={units}
            valueMm={lengthMm}
            onChange={(mm) => {
              setLengthMm(mm);
              apply(mm);
            }}
            disabled={readOnly}
            name="selected-run-length"
          />
          <SmallSelect
            label="Measured"
            value={kind}
            disabled={readOnly}
            onChange={(e) => {
              const k = e.target.value as RunLengthKind;
              setKind(k);
              apply(lengthMm, k);
            }}
            options={KIND_OPTIONS}
          />
        </div>
        {!readOnly ? <p className="text-xs text-steel-600">Lengths apply as you type; one undo step puts the run back.</p> : null}
        <AxisPicker
          label="Direction"
          value={axisOf(run.direction)}
          disabled={readOnly}
          onPick={(a) => model.edit((d) => setRunDirection(d, { runId: run.id, direction: PLANT_AXES[a].vector }))}
        />
        <SmallSelect
          label="Line size (to the next reducer or branch)"
          value={nps ?? ''}
          disabled={readOnly}
          onChange={(e) => model.edit((d) => setLineSize(d, { runId: run.id, nps: e.target.value as Nps }))}
          options={[...(nps ? [] : [{ value: '', label: 'not stated' }]), ...npsOptions(NPS_VALUES)]}
        />
        <label className="flex flex-col gap-0.5 text-xs font-semibold text-ink-700">
          Heat number
          <input
            value={heat}
            disabled={readOnly}
            onChange={(e) => setHeat(e.target.value)}
            onBlur={() => {
              if ((run.heat ?? '') !== heat.trim()) model.edit((d) => setRunProperties(d, { runId: run.id, heat }));
            }}
            className="min-h-10 rounded-md border border-steel-300 bg-white px-2 font-mono text-sm font-normal disabled:bg-steel-100"
          />
        </label>
      </PanelSection>
      <PanelSection title="Computed">
        <dl className="flex flex-col gap-1">
          <Fact label="Work point to work point" value={fmt(placed?.workPointDistanceMm)} />
          <Fact label="Take-off at start" value={fmt(placed?.takeOffFromMm)} />
          <Fact label="Take-off at end" value={fmt(placed?.takeOffToMm)} />
          <Fact label="Root gaps" value={fmt(placed?.gapsMm)} />
          <Fact label="Pipe in this run" value={placed?.closeCoupled ? 'none (welded together)' : fmt(placed?.pipeLengthMm)} tone={placed && placed.pipeLengthMm === null ? 'bad' : undefined} />
          {piece ? <Fact label={`Piece ${piece.mark} cut length`} value={fmt(piece.cutLengthMm)} /> : null}
        </dl>
      </PanelSection>
      {!readOnly ? (
        <PanelSection title="Insert on this run">
          <InsertOnRunForm key={run.id} model={model} run={run} runNps={nps} workPointMm={placed?.workPointDistanceMm ?? null} units={units} request={insertRequest} />
        </PanelSection>
      ) : null}
    </div>
  );
}
