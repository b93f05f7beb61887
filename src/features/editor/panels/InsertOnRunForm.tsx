import { useEffect, useRef, useState } from 'react';
import type { SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';
import type { EndSpec } from '../../../../shared/schemas/spool-design-node.schema';
import { NPS_VALUES, compareNps, type Nps } from '../../../../shared/standards/nps';
import type { LengthUnits } from '../../../../shared/units/length-format';
import { describeInline, insertOnRun, type InlineComponent } from '../model/commands/insert-on-run';
import { describeOrientation, orientationReference } from '../model/orientation-words';
import type { EditorModel } from '../model/editor-model';
import { PLANT_AXES, type PlantAxis } from '../model/plant-directions';
import { perpendicular } from '../model/vector';
import { AxisPicker } from './AxisPicker';
import { LengthInput } from './LengthInput';
import { PanelButton, SmallSelect, npsOptions } from './panel-bits';
import { END_OPTIONS, endFromChoice, type EndChoice } from './end-options';

/** The fittings that go on a run. */
export type InsertType = 'tee' | 'set-on-branch' | 'half-coupling' | 'branch-outlet' | 'reducer';

const TYPE_OPTIONS: { value: InsertType; label: string }[] = [
  { value: 'set-on-branch', label: 'Set-on branch' },
  { value: 'tee', label: 'Tee' },
  { value: 'half-coupling', label: 'Socket (half coupling)' },
  { value: 'branch-outlet', label: 'Branch outlet (maker\'s height)' },
  { value: 'reducer', label: 'Reducer (size change)' },
];

/**
 * Puts a fitting on the selected run, at a distance from the run's start work point: a
 * branch (tee or set-on, with its first run and end), a socket, or a reducer.
 */
export function InsertOnRunForm({
  model,
  run,
  runNps,
  workPointMm,
  units,
  request,
}: {
  model: EditorModel;
  run: SpoolRun;
  runNps: Nps | null;
  workPointMm: number | null;
  units: LengthUnits;
  /** A keyboard request to insert this type (the nonce re-focuses on repeats). */
  request: { type: InsertType; nonce: number } | null;
}) {
  const [type, setType] = useState<InsertType>('set-on-branch');
  const [distanceMm, setDistanceMm] = useState<number | null>(workPointMm !== null ? Math.round(workPointMm / 2) : null);
  const [branchAxis, setBranchAxis] = useState<PlantAxis | null>(null);
  const [branchMm, setBranchMm] = useState<number | null>(null);
  const smaller = NPS_VALUES.filter((n) => !runNps || compareNps(n, runNps) <= 0);
  const [branchNps, setBranchNps] = useState<Nps>(runNps ?? '6');
  const [toNps, setToNps] = useState<Nps>(smaller.at(-2) ?? '4');
  const [endChoice, setEndChoice] = useState<EndChoice>('bevel');
  const [reducerType, setReducerType] = useState<'concentric' | 'eccentric'>('concentric');
  const [orientation, setOrientation] = useState('0');
  const [socketBranch, setSocketBranch] = useState(false);
  const [outletEnd, setOutletEnd] = useState<'butt' | 'socket'>('socket');
  const [outletHeightMm, setOutletHeightMm] = useState<number | null>(null);
  const distanceRef = useRef<HTMLInputElement>(null);

  // A keyboard request picks the type (during render, React's pattern for derived state)…
  const [seenRequest, setSeenRequest] = useState(request);
  if (request !== seenRequest) {
    setSeenRequest(request);
    if (request) setType(request.type);
  }
  // …and puts the cursor in the distance box.
  useEffect(() => {
    if (!request) return;
    distanceRef.current?.focus();
    distanceRef.current?.select();
  }, [request]);

  const small = type === 'half-coupling' || type === 'branch-outlet';
  const hasBranch = type === 'tee' || type === 'set-on-branch' || (small && socketBranch);
  const submit = () => {
    if (distanceMm === null) return;
    let component: InlineComponent;
    if (type === 'tee') component = { kind: 'tee', ...(branchNps !== runNps ? { branchNps } : {}) };
    else if (type === 'set-on-branch') component = { kind: 'set-on-branch' };
    else if (type === 'half-coupling') {
      const deg = Number(orientation);
      component = { kind: 'half-coupling', branchNps, ...(!socketBranch && Number.isFinite(deg) ? { orientationDeg: deg } : {}) };
    } else if (type === 'branch-outlet') {
      if (outletHeightMm === null) {
        model.apply(() => ({ ok: false, error: "Give the outlet's height from the maker's catalogue" }));
        return;
      }
      const deg = Number(orientation);
      component = { kind: 'branch-outlet', branchNps, outletEnd, heightMm: outletHeightMm, ...(!socketBranch && Number.isFinite(deg) ? { orientationDeg: deg } : {}) };
    } else component = { kind: 'reducer', toNps, type: reducerType, ...(reducerType === 'eccentric' ? { flatSide: 'top' as const } : {}) };
    const branch =
      hasBranch && branchAxis && branchMm !== null
        ? { direction: PLANT_AXES[branchAxis].vector, lengthMm: branchMm, nps: branchNps, end: endFromChoice(endChoice) as EndSpec }
        : undefined;
    if (hasBranch && !branch) {
      model.apply(() => ({ ok: false, error: 'Give the branch a direction and a length' }));
      return;
    }
    model.edit((design, ctx) => insertOnRun(design, { runId: run.id, distanceMm, component, ...(branch ? { branch } : {}) }, ctx), {
      fit: { what: `the ${describeInline(component)}` },
    });
  };

  return (
    <form
      aria-label="Insert on this run"
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <SmallSelect label="Fitting" value={type} onChange={(e) => setType(e.target.value as InsertType)} options={TYPE_OPTIONS} />
      <LengthInput
        ref={distanceRef}
        label="Distance from the run's start work point"
        units={units}
        valueMm={distanceMm}
        onChange={setDistanceMm}
        onEnter={submit}
      />
      {type === 'reducer' ? (
        <div className="grid grid-cols-2 gap-2">
          <SmallSelect label="To size" value={toNps} onChange={(e) => setToNps(e.target.value as Nps)} options={npsOptions(smaller.filter((n) => n !== runNps))} />
          <SmallSelect
            label="Type"
            value={reducerType}
            onChange={(e) => setReducerType(e.target.value as 'concentric' | 'eccentric')}
            options={[
              { value: 'concentric', label: 'Concentric' },
              { value: 'eccentric', label: 'Eccentric, flat on top' },
            ]}
          />
        </div>
      ) : (
        <SmallSelect
          label={small ? 'Outlet size' : 'Branch size'}
          value={branchNps}
          onChange={(e) => setBranchNps(e.target.value as Nps)}
          options={npsOptions(type === 'half-coupling' ? smaller.filter((n) => compareNps(n, '2') <= 0) : smaller)}
        />
      )}
      {type === 'branch-outlet' ? (
        <div className="grid grid-cols-2 gap-2">
          <SmallSelect
            label="Outlet end"
            value={outletEnd}
            onChange={(e) => setOutletEnd(e.target.value as 'butt' | 'socket')}
            options={[
              { value: 'socket', label: 'Socket weld' },
              { value: 'butt', label: 'Butt weld' },
            ]}
          />
          <LengthInput label="Height off the header" units={units} valueMm={outletHeightMm} onChange={setOutletHeightMm} hint="from the maker's catalogue" />
        </div>
      ) : null}
      {small ? (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={socketBranch} onChange={(e) => setSocketBranch(e.target.checked)} className="h-5 w-5" />
          with a branch pipe (else an open socket)
        </label>
      ) : null}
      {small && !socketBranch ? (
        <label className="flex flex-col gap-0.5 text-xs font-semibold text-ink-700">
          {orientationReference(run.direction).fieldLabel}
          <input
            value={orientation}
            onChange={(e) => setOrientation(e.target.value)}
            inputMode="decimal"
            className="min-h-10 rounded-md border border-steel-300 bg-white px-2 font-mono text-sm"
          />
          {Number.isFinite(Number(orientation)) && orientation.trim() !== '' ? (
            <span className="font-normal text-steel-600" data-testid="orientation-words">{describeOrientation(run.direction, Number(orientation))}</span>
          ) : null}
        </label>
      ) : null}
      {hasBranch ? (
        <>
          <AxisPicker
            label="Branch direction"
            value={branchAxis}
            onPick={setBranchAxis}
            allowed={(a) => perpendicular(PLANT_AXES[a].vector, run.direction)}
          />
          <LengthInput label="Branch length, centre-to-face" units={units} valueMm={branchMm} onChange={setBranchMm} onEnter={submit} />
          <SmallSelect label="Branch end" value={endChoice} onChange={(e) => setEndChoice(e.target.value as EndChoice)} options={END_OPTIONS} />
        </>
      ) : null}
      <PanelButton tone="primary" type="submit" disabled={distanceMm === null}>
        Insert
      </PanelButton>
    </form>
  );
}
