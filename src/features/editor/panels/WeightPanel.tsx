import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { Fact } from './panel-bits';

/** The spool's estimated weights and centre of gravity, with the lifting caution. */
export function WeightPanel({ result, units }: { result: SpoolResult; units: LengthUnits }) {
  const w = result.weights;
  const cog = w.centreOfGravity;
  const xyz = (v: { x: number; y: number; z: number }) => `E ${formatLength(v.x, units)} · N ${formatLength(v.y, units)} · Up ${formatLength(v.z, units)}`;
  return (
    <div className="flex flex-col gap-2 p-2" data-testid="weight-panel">
      <dl className="flex flex-col gap-1">
        <Fact label="Empty (estimate)" value={`${w.emptyKg.toFixed(1)} kg`} />
        <Fact label="Water-filled (estimate)" value={`${w.waterFilledKg.toFixed(1)} kg`} />
        <Fact label="Centre of gravity, empty" value={cog ? xyz(cog) : '—'} />
        {w.centreOfGravityFilled ? <Fact label="Centre of gravity, filled" value={xyz(w.centreOfGravityFilled)} /> : null}
      </dl>
      {w.notIncluded.length > 0 ? <p className="text-sm text-spark-700">Not weighed (no dimensions): {w.notIncluded.join(', ')}</p> : null}
      <p role="note" className="rounded-md border border-spark-300 bg-spark-100 p-2 text-sm text-ink-800">
        <strong>Lifting:</strong> weights and centres of gravity are estimates; lifts are planned by a competent person.
        {w.caution && !w.caution.toLowerCase().includes('competent') ? ` ${w.caution}` : ''}
      </p>
    </div>
  );
}
