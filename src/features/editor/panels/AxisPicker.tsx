import { cn } from '../../../lib/cn';
import { PLANT_AXES, type PlantAxis } from '../model/plant-directions';

/** Six plant-axis buttons; `allowed` greys out directions a fitting cannot take. */
export function AxisPicker({
  label,
  value,
  onPick,
  allowed,
  disabled,
}: {
  label: string;
  value: PlantAxis | null;
  onPick: (axis: PlantAxis) => void;
  allowed?: (axis: PlantAxis) => boolean;
  disabled?: boolean;
}) {
  return (
    <fieldset className="flex flex-col gap-0.5" disabled={disabled}>
      <legend className="text-xs font-semibold text-ink-700">{label}</legend>
      <div className="flex flex-wrap gap-1" role="radiogroup" aria-label={label}>
        {(Object.entries(PLANT_AXES) as [PlantAxis, (typeof PLANT_AXES)[PlantAxis]][]).map(([name, axis]) => {
          const ok = allowed ? allowed(name) : true;
          return (
            <button
              key={name}
              type="button"
              role="radio"
              aria-checked={value === name}
              disabled={!ok}
              aria-label={axis.label}
              onClick={() => onPick(name)}
              className={cn(
                'min-h-10 min-w-10 rounded-md border px-2 font-mono text-sm font-semibold disabled:opacity-30',
                value === name ? 'border-spark-500 bg-spark-200 text-ink-950' : 'border-steel-300 bg-white text-ink-700 hover:bg-steel-100',
              )}
            >
              {axis.short}
            </button>
          );
        })}
      </div>
    </fieldset>
  );
}
