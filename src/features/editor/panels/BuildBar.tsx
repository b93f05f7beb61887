import { forwardRef, type ReactNode } from 'react';
import type { RunLengthKind } from '../../../../shared/schemas/spool-design-run.schema';
import type { ElbowRadius } from '../../../../shared/schemas/spool-design-primitives.schema';
import { cn } from '../../../lib/cn';
import { PLANT_AXES, type PlantAxis } from '../model/plant-directions';
import type { LengthUnits } from '../../../../shared/units/length-format';
import { EditorIcon } from './editor-icons';
import { LengthInput } from './LengthInput';
import { SHORTCUTS } from './editor-shortcuts';
import { AxisPicker } from './AxisPicker';
import { perpendicular } from '../model/vector';

/** What the next run will be. */
export type BuildDraft = {
  axis: PlantAxis | 'offset';
  /** Offset components for a rolling or skewed run (east, north, up; any unit). */
  offset: { east: number; north: number; up: number };
  lengthMm: number | null;
  kind: RunLengthKind | 'auto';
  radius: ElbowRadius;
  /** Turning straight back: the side the 180° return steps to. */
  returnSide: PlantAxis | null;
};

export const LENGTH_KIND_OPTIONS: { value: RunLengthKind | 'auto'; label: string }[] = [
  { value: 'auto', label: 'Work point to work point' },
  { value: 'centre-to-centre', label: 'Centre-to-centre' },
  { value: 'centre-to-face', label: 'Centre-to-face' },
  { value: 'face-to-face', label: 'Face-to-face' },
  { value: 'cut', label: 'Cut length (0 = fittings welded together)' },
];

/**
 * The run builder: pick a plant direction (or offsets for a rolling run), type the
 * length and what it measures, press Enter. It grows from `fromLabel`.
 */
export const BuildBar = forwardRef<
  HTMLInputElement,
  {
    draft: BuildDraft;
    onDraft: (draft: BuildDraft) => void;
    onAdd: () => void;
    fromLabel: ReactNode;
    units: LengthUnits;
    disabled: boolean;
    /** Set when the chosen direction doubles back on the run: the run's direction (the return's side is square to it). */
    turningBackFrom: { x: number; y: number; z: number } | null;
  }
>(function BuildBar({ draft, onDraft, onAdd, fromLabel, units, disabled, turningBackFrom }, lengthRef) {
  const axes = Object.entries(PLANT_AXES) as [PlantAxis, (typeof PLANT_AXES)[PlantAxis]][];
  return (
    <form
      aria-label="Add a run"
      className="flex flex-wrap items-start gap-3 rounded-md border border-steel-200 bg-steel-50 p-2"
      onSubmit={(e) => {
        e.preventDefault();
        onAdd();
      }}
    >
      <fieldset className="flex flex-col gap-0.5" disabled={disabled}>
        <legend className="text-xs font-semibold text-ink-700">Direction</legend>
        <div className="flex flex-wrap gap-1" role="radiogroup" aria-label="Run direction">
          {axes.map(([name, axis]) => {
            const key = SHORTCUTS.find((s) => s.action === `dir-${name}`)?.keys ?? '';
            return (
              <button
                key={name}
                type="button"
                role="radio"
                aria-checked={draft.axis === name}
                aria-keyshortcuts={key}
                aria-label={axis.label}
                title={`Key ${key}`}
                onClick={() => onDraft({ ...draft, axis: name })}
                className={cn(
                  'min-h-10 min-w-10 rounded-md border px-2 font-mono text-sm font-semibold',
                  draft.axis === name ? 'border-spark-500 bg-spark-200 text-ink-950' : 'border-steel-300 bg-white text-ink-700 hover:bg-steel-100',
                )}
              >
                {axis.short}
              </button>
            );
          })}
          <button
            type="button"
            role="radio"
            aria-checked={draft.axis === 'offset'}
            title="Rolling or skewed run: give its east, north and up offsets"
            onClick={() => onDraft({ ...draft, axis: 'offset' })}
            className={cn(
              'min-h-10 rounded-md border px-2 text-sm font-semibold',
              draft.axis === 'offset' ? 'border-spark-500 bg-spark-200 text-ink-950' : 'border-steel-300 bg-white text-ink-700 hover:bg-steel-100',
            )}
          >
            Offsets…
          </button>
        </div>
        <p className="min-h-4 text-[11px] text-steel-600">{fromLabel ? <>from {fromLabel}</> : 'select an open end'}</p>
      </fieldset>
      {draft.axis === 'offset' ? (
        <fieldset className="flex gap-1" disabled={disabled}>
          <legend className="text-xs font-semibold text-ink-700">Offsets (E · N · Up, ratio)</legend>
          {(['east', 'north', 'up'] as const).map((k) => (
            <input
              key={k}
              aria-label={`${k} offset`}
              type="number"
              step="any"
              value={draft.offset[k]}
              onChange={(e) => onDraft({ ...draft, offset: { ...draft.offset, [k]: Number(e.target.value) } })}
              className="min-h-10 w-20 rounded-md border border-steel-300 bg-white px-2 font-mono text-sm"
            />
          ))}
        </fieldset>
      ) : null}
      {turningBackFrom ? (
        <AxisPicker
          label="180° return steps to"
          value={draft.returnSide}
          onPick={(a) => onDraft({ ...draft, returnSide: a })}
          allowed={(a) => perpendicular(PLANT_AXES[a].vector, turningBackFrom)}
          disabled={disabled}
        />
      ) : null}
      <div className="w-36">
        <LengthInput
          ref={lengthRef}
          name="run-length"
          label="Length"
          units={units}
          valueMm={draft.lengthMm}
          onChange={(mm) => onDraft({ ...draft, lengthMm: mm })}
          onEnter={onAdd}
          disabled={disabled}
        />
      </div>
      <label className="flex flex-col gap-0.5 text-xs font-semibold text-ink-700">
        Measured
        <select
          value={draft.kind}
          disabled={disabled}
          onChange={(e) => onDraft({ ...draft, kind: e.target.value as BuildDraft['kind'] })}
          className="min-h-10 rounded-md border border-steel-300 bg-white px-2 text-sm font-normal"
        >
          {LENGTH_KIND_OPTIONS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-0.5 text-xs font-semibold text-ink-700">
        Bend
        <select
          value={draft.radius}
          disabled={disabled}
          onChange={(e) => onDraft({ ...draft, radius: e.target.value as ElbowRadius })}
          className="min-h-10 rounded-md border border-steel-300 bg-white px-2 text-sm font-normal"
        >
          <option value="long">Long radius</option>
          <option value="short">Short radius</option>
        </select>
      </label>
      <button
        type="submit"
        disabled={disabled || draft.lengthMm === null}
        className="mt-4 inline-flex min-h-10 items-center gap-1.5 rounded-md bg-spark-400 px-3 text-sm font-semibold text-ink-950 hover:bg-spark-300 disabled:opacity-50"
        aria-keyshortcuts="Enter"
        title="Or press Enter in the length box"
      >
        <EditorIcon name="run" /> Add run
      </button>
    </form>
  );
});
