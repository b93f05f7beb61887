import type { ViewPrefs, ViewPreset } from '../model/view-prefs';
import { cn } from '../../../lib/cn';
import { EditorIcon, type EditorIconName } from './editor-icons';

const PRESETS: { id: ViewPreset; label: string; icon: EditorIconName; key: string }[] = [
  { id: 'iso', label: 'Iso', icon: 'iso', key: '1' },
  { id: 'plan', label: 'Plan', icon: 'plan', key: '2' },
  { id: 'elev-north', label: 'Elev. N', icon: 'elevation', key: '3' },
  { id: 'elev-east', label: 'Elev. E', icon: 'elevation', key: '4' },
];

const LABELS: { id: keyof ViewPrefs['labels']; label: string }[] = [
  { id: 'centreToCentre', label: 'C–C' },
  { id: 'centreToFace', label: 'C–F' },
  { id: 'cutLengths', label: 'Cuts' },
  { id: 'welds', label: 'Welds' },
];

/** View presets and label toggles over the canvas. */
export function ViewBar({
  view,
  onPreset,
  onLabels,
  onCog,
}: {
  view: ViewPrefs;
  onPreset: (p: ViewPreset) => void;
  onLabels: (patch: Partial<ViewPrefs['labels']>) => void;
  onCog: (on: boolean) => void;
}) {
  const chip = (on: boolean) =>
    cn('inline-flex min-h-9 items-center gap-1 rounded-md border px-2 text-xs font-semibold', on ? 'border-ink-700 bg-ink-800 text-white' : 'border-steel-300 bg-white/90 text-ink-700 hover:bg-white');
  return (
    <div className="flex flex-wrap items-center gap-1" role="toolbar" aria-label="View">
      {PRESETS.map((p) => (
        <button key={p.id} type="button" className={chip(view.preset === p.id)} onClick={() => onPreset(p.id)} title={`${p.label} view (key ${p.key})`} aria-keyshortcuts={p.key}>
          <EditorIcon name={p.icon} className="h-4 w-4" /> {p.label}
        </button>
      ))}
      <span className="mx-1 h-6 w-px bg-steel-300" aria-hidden="true" />
      {LABELS.map((l) => (
        <button key={l.id} type="button" aria-pressed={view.labels[l.id]} className={chip(view.labels[l.id])} onClick={() => onLabels({ [l.id]: !view.labels[l.id] })} title={`Show ${l.label} labels`}>
          {l.label}
        </button>
      ))}
      <button type="button" aria-pressed={view.showCentreOfGravity} className={chip(view.showCentreOfGravity)} onClick={() => onCog(!view.showCentreOfGravity)} title="Show the centre of gravity">
        CoG
      </button>
    </div>
  );
}
