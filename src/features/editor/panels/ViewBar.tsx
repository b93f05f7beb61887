import type { ViewPrefs, ViewPreset } from '../model/view-prefs';
import { cn } from '../../../lib/cn';
import { EditorIcon, type EditorIconName } from './editor-icons';

const PRESETS: { id: ViewPreset; label: string; spoken: string; icon: EditorIconName; key: string }[] = [
  { id: 'iso', label: 'Iso', spoken: 'Isometric', icon: 'iso', key: '1' },
  { id: 'plan', label: 'Plan', spoken: 'Plan', icon: 'plan', key: '2' },
  { id: 'elev-north', label: 'Elev. N', spoken: 'Elevation looking north', icon: 'elevation', key: '3' },
  { id: 'elev-east', label: 'Elev. E', spoken: 'Elevation looking east', icon: 'elevation', key: '4' },
];

/** `label` is shown, `spoken` is the accessible name, `hint` the tooltip (never a repeat of the name). */
const LABELS: { id: keyof ViewPrefs['labels']; label: string; spoken: string; hint: string }[] = [
  { id: 'centreToCentre', label: 'C–C', spoken: 'Centre-to-centre labels', hint: 'Work point to work point dimensions on the model' },
  { id: 'centreToFace', label: 'C–F', spoken: 'Centre-to-face labels', hint: 'Fitting centre to flange face or open end' },
  { id: 'cutLengths', label: 'Cuts', spoken: 'Cut length labels', hint: 'Saw length of each pipe piece' },
  { id: 'welds', label: 'Welds', spoken: 'Weld number labels', hint: 'W numbers at each joint' },
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
        <button key={p.id} type="button" className={chip(view.preset === p.id)} onClick={() => onPreset(p.id)} aria-label={`${p.spoken} view`} title={`Key ${p.key}`} aria-keyshortcuts={p.key}>
          <EditorIcon name={p.icon} className="h-4 w-4" /> {p.label}
        </button>
      ))}
      <span className="mx-1 h-6 w-px bg-steel-300" aria-hidden="true" />
      {LABELS.map((l) => (
        <button key={l.id} type="button" aria-pressed={view.labels[l.id]} className={chip(view.labels[l.id])} onClick={() => onLabels({ [l.id]: !view.labels[l.id] })} aria-label={l.spoken} title={l.hint}>
          {l.label}
        </button>
      ))}
      <button type="button" aria-pressed={view.showCentreOfGravity} className={chip(view.showCentreOfGravity)} onClick={() => onCog(!view.showCentreOfGravity)} aria-label="Centre of gravity" title="Marker with the estimated weight">
        CoG
      </button>
    </div>
  );
}
