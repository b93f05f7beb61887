import type { RotationCorrection, SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { setFlangeBoltRotation } from '../model/commands/edit-node';
import type { EditorModel } from '../model/editor-model';
import type { Selection } from '../model/editor-selection';
import type { UserNames } from '../model/user-names';
import { PanelButton } from './panel-bits';

/** Plain words for a rotation correction (from the flange as designed, looking at its face), in degrees and at the bolt circle. */
export function correctionWords(c: RotationCorrection, units: LengthUnits, names: UserNames): string {
  const arc = c.atBoltCircleMm !== null ? ` (${formatLength(c.atBoltCircleMm, units)} at the bolt circle)` : '';
  const d = c.rotateClockwiseLookingAtFaceDeg;
  return `Turn ${names.node(c.flangeId)} ${Math.abs(d).toFixed(1)}° ${d >= 0 ? 'clockwise' : 'counter-clockwise'} from its drawn position, looking at its face${arc}`;
}

/**
 * Bolt-hole orientation of every flange: its first hole from the plant vertical (or
 * north), whether it straddles, and the correction when a flange that must be
 * two-holed is not, or two flanges disagree.
 */
export function FlangesPanel({
  model,
  result,
  names,
  units,
  readOnly,
  onSelect,
}: {
  model: EditorModel;
  result: SpoolResult;
  names: UserNames;
  units: LengthUnits;
  readOnly: boolean;
  onSelect: (s: Selection) => void;
}) {
  if (result.flanges.length === 0) return <p className="p-3 text-sm text-steel-600">No flanges on this spool.</p>;
  const apply = (flangeId: string, c: RotationCorrection) => {
    const f = result.flanges.find((x) => x.nodeId === flangeId);
    if (!f) return;
    const next = f.rotationDeg + c.rotateClockwiseLookingAtFaceDeg;
    model.edit((d) => setFlangeBoltRotation(d, { nodeId: flangeId, rotationDeg: next }));
  };
  return (
    <div className="flex flex-col gap-3 p-2 text-sm" data-testid="flange-checks">
      <ul className="flex flex-col divide-y divide-steel-200">
        {result.flanges.map((f) => (
          <li key={f.nodeId} className="flex flex-col gap-1 py-2">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <button type="button" className="font-mono font-semibold hover:underline" onClick={() => onSelect({ type: 'node', id: f.nodeId })}>
                {names.node(f.nodeId)}
              </button>
              <span className="text-steel-700">
                {f.type === 'weld-neck-flange' ? 'Weld neck' : 'Slip-on'} NPS {f.nps} Class {f.flangeClass} · {f.boltCount ?? '?'} bolts
              </span>
            </div>
            <p>
              First hole <strong className="font-mono">{f.rotationDeg.toFixed(1)}°</strong> clockwise from{' '}
              {f.reference === 'plant-north' ? 'plant north' : 'the plant vertical'}, seen facing the flange
              {f.bendPlaneRotationDeg !== null ? ` · ${f.bendPlaneRotationDeg.toFixed(1)}° from the plane of bend ${f.bendPlaneNodeId ? names.node(f.bendPlaneNodeId) : ''}` : ''}.
            </p>
            <p className={f.straddles ? 'text-ok-600' : f.mustTwoHole ? 'text-danger-700' : 'text-steel-700'}>
              {f.straddles ? 'Two-holed: holes straddle the centrelines.' : f.mustTwoHole ? 'Not two-holed, but it must be.' : 'Holes on a centreline (allowed for this flange).'}
            </p>
            {f.correction ? (
              <div className="flex flex-wrap items-center gap-2 rounded-md bg-danger-50 p-2 text-danger-700">
                <span>{correctionWords(f.correction, units, names)}</span>
                {!readOnly ? (
                  <PanelButton onClick={() => apply(f.nodeId, f.correction!)}>Apply correction</PanelButton>
                ) : null}
              </div>
            ) : null}
          </li>
        ))}
      </ul>
      {result.flangePairs.length > 0 ? (
        <div>
          <h4 className="font-semibold">Flange to flange</h4>
          <ul className="flex flex-col gap-1">
            {result.flangePairs.map((p) => (
              <li key={`${p.a}-${p.b}`} className={p.withinTolerance === false ? 'text-danger-700' : 'text-steel-800'}>
                {names.node(p.a)} → {names.node(p.b)}:{' '}
                {p.errorMm === null
                  ? 'faces not parallel, no hole match needed'
                  : `${p.errorDeg?.toFixed(1)}° (${formatLength(p.errorMm, units)} at the bolt circle), tolerance ${formatLength(p.toleranceMm, units)} — ${p.withinTolerance ? 'within' : 'outside'}`}
                {p.correction ? <span className="block">{correctionWords(p.correction, units, names)}</span> : null}
                {p.correction && !readOnly ? (
                  <PanelButton className="mt-1" onClick={() => apply(p.correction!.flangeId, p.correction!)}>
                    Apply correction to {names.node(p.correction.flangeId)}
                  </PanelButton>
                ) : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
