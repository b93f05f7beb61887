import { FLANGE_CLASSES } from '../../../../shared/standards/flanges';
import { useState } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import { NPS_VALUES } from '../../../../shared/standards/nps';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { endWords, setEnd, setFlangeBoltRotation, setNodeProperties } from '../model/commands/edit-node';
import { useUserNames } from '../hooks/use-user-names';
import { describeOrientation, orientationReference } from '../model/orientation-words';
import type { EditorModel } from '../model/editor-model';
import { END_OPTIONS, endFromChoice, type EndChoice } from './end-options';
import { Fact, PanelButton, PanelSection, SmallSelect, npsOptions } from './panel-bits';
import { EditorIcon } from './editor-icons';

const KIND_WORDS: Record<SpoolNode['kind'], string> = {
  end: 'Open end',
  elbow: 'Elbow',
  return: 'Return',
  tee: 'Tee',
  'set-on-branch': 'Set-on branch',
  'half-coupling': 'Socket (half coupling)',
  'branch-outlet': 'Branch outlet',
  reducer: 'Reducer',
  'socket-fitting': 'Socket-weld fitting',
};

/** Properties of a selected node's component, editable where the document allows. */
export function NodeProperties({
  model,
  design,
  result,
  node,
  units,
  readOnly,
  onDelete,
}: {
  model: EditorModel;
  design: SpoolDesign;
  result: SpoolResult | null;
  node: SpoolNode;
  units: LengthUnits;
  readOnly: boolean;
  onDelete: (id: string) => void;
}) {
  const component = result?.components.find((c) => c.nodeId === node.id) ?? null;
  const flange = result?.flanges.find((f) => f.nodeId === node.id) ?? null;
  const patch = (p: Record<string, unknown>) => model.edit((d) => setNodeProperties(d, { nodeId: node.id, patch: p }));
  const [rotation, setRotation] = useState('');
  const [shownFor, setShownFor] = useState<SpoolNode | null>(null);
  if (shownFor !== node) {
    setShownFor(node);
    setRotation(node.kind === 'end' && 'boltRotationDeg' in node.end && node.end.boltRotationDeg !== undefined ? String(node.end.boltRotationDeg) : '');
  }
  const p = component?.position;
  const names = useUserNames(result, design);
  const headerAxis = component && (component.shape.type === 'branch-connection' || component.shape.type === 'set-on-branch') ? component.shape.headerAxis : null;
  const placedOrientation = component?.shape.type === 'branch-connection' ? component.shape.orientationDeg : null;
  const kindWords = node.kind === 'end' ? capitalise(endWords(node.end)) : KIND_WORDS[node.kind];

  return (
    <div className="flex flex-col gap-3" data-testid="node-properties">
      <PanelSection
        title={`${kindWords} ${names.node(node.id)}`}
        actions={
          !readOnly ? (
            <PanelButton tone="danger" onClick={() => onDelete(node.id)} title="Removes this component (key Del)" aria-keyshortcuts="Delete">
              <EditorIcon name="trash" className="h-4 w-4" /> Delete
            </PanelButton>
          ) : null
        }
      >
        {component ? <p className="text-sm text-ink-800">{component.description}</p> : null}
        {component?.source ? <p className="text-xs text-steel-600">Dimensions: {component.source}</p> : null}

        {node.kind === 'end' ? (
          <>
            <SmallSelect
              label="End"
              value={node.end.type}
              disabled={readOnly}
              onChange={(e) => model.edit((d) => setEnd(d, { nodeId: node.id, end: endFromChoice(e.target.value as EndChoice) }), { fit: { what: 'that end' } })}
              options={END_OPTIONS}
            />
            {node.end.type === 'weld-neck-flange' || node.end.type === 'slip-on-flange' ? (
              <>
                <SmallSelect
                  label="Class"
                  value={String(node.end.flangeClass ?? '')}
                  disabled={readOnly}
                  onChange={(e) => {
                    const end = { ...node.end } as Record<string, unknown>;
                    if (e.target.value) end.flangeClass = Number(e.target.value);
                    else delete end.flangeClass;
                    patch({ end });
                  }}
                  options={[
                    { value: '', label: 'Spool spec' },
                    ...FLANGE_CLASSES.map((c) => ({ value: String(c), label: `Class ${c}` })),
                  ]}
                />
                <form
                  className="flex items-end gap-2"
                  onSubmit={(e) => {
                    e.preventDefault();
                    const deg = rotation.trim() === '' ? null : Number(rotation);
                    model.edit((d) => setFlangeBoltRotation(d, { nodeId: node.id, rotationDeg: deg }));
                  }}
                >
                  <label className="flex flex-1 flex-col gap-0.5 text-xs font-semibold text-ink-700">
                    First bolt hole, ° clockwise from the reference (blank: straddle)
                    <input
                      value={rotation}
                      disabled={readOnly}
                      inputMode="decimal"
                      onChange={(e) => setRotation(e.target.value)}
                      className="min-h-10 rounded-md border border-steel-300 bg-white px-2 font-mono text-sm font-normal"
                    />
                  </label>
                  {!readOnly ? <PanelButton type="submit">Set</PanelButton> : null}
                </form>
                <label className="flex items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="h-5 w-5"
                    disabled={readOnly}
                    checked={node.end.mustTwoHole !== false}
                    onChange={(e) => patch({ end: { ...node.end, mustTwoHole: e.target.checked } })}
                  />
                  Must be two-holed (holes straddle the centrelines)
                </label>
                <label className="flex items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="h-5 w-5"
                    disabled={readOnly}
                    checked={node.end.blind === true}
                    onChange={(e) => patch({ end: { ...node.end, blind: e.target.checked } })}
                  />
                  Blind flange bolted on
                </label>
              </>
            ) : null}
            {node.end.type === 'bevel' ? (
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  className="h-5 w-5"
                  disabled={readOnly}
                  checked={node.end.fieldWeld !== false}
                  onChange={(e) => patch({ end: { ...node.end, fieldWeld: e.target.checked } })}
                />
                Welded in the field
              </label>
            ) : null}
          </>
        ) : null}

        {node.kind === 'elbow' ? (
          <div className="grid grid-cols-2 gap-2">
            <SmallSelect
              label="Radius"
              value={node.radius ?? 'long'}
              disabled={readOnly}
              onChange={(e) => patch({ radius: e.target.value })}
              options={[
                { value: 'long', label: 'Long radius' },
                { value: 'short', label: 'Short radius' },
              ]}
            />
            <SmallSelect
              label="Made as"
              value={node.construction ?? 'fitting'}
              disabled={readOnly}
              onChange={(e) => patch({ construction: e.target.value })}
              options={[
                { value: 'fitting', label: 'Butt-weld elbow' },
                { value: 'mitre', label: 'Mitred from pipe' },
              ]}
            />
          </div>
        ) : null}

        {node.kind === 'tee' ? (
          <SmallSelect
            label="Branch size"
            value={node.branchNps ?? ''}
            disabled={readOnly}
            onChange={(e) => patch({ branchNps: e.target.value || undefined })}
            options={[{ value: '', label: 'Equal tee' }, ...npsOptions(NPS_VALUES)]}
          />
        ) : null}

        {node.kind === 'reducer' ? (
          <div className="grid grid-cols-2 gap-2">
            <SmallSelect label="To size" value={node.toNps} disabled={readOnly} onChange={(e) => patch({ toNps: e.target.value })} options={npsOptions(NPS_VALUES)} />
            <SmallSelect
              label="Type"
              value={node.type ?? 'concentric'}
              disabled={readOnly}
              onChange={(e) => patch({ type: e.target.value, flatSide: e.target.value === 'eccentric' ? 'top' : undefined })}
              options={[
                { value: 'concentric', label: 'Concentric' },
                { value: 'eccentric', label: 'Eccentric, flat on top' },
              ]}
            />
          </div>
        ) : null}

        {node.kind === 'half-coupling' || node.kind === 'branch-outlet' ? (
          <label className="flex flex-col gap-0.5 text-xs font-semibold text-ink-700">
            {headerAxis ? orientationReference(headerAxis).fieldLabel : 'Orientation, ° clockwise looking along the header run; 0° = top of pipe (plant north on a vertical run)'}
            <input
              defaultValue={node.orientationDeg ?? ''}
              key={`${node.id}-${node.orientationDeg ?? ''}`}
              disabled={readOnly}
              inputMode="decimal"
              onBlur={(e) => {
                const v = e.target.value.trim();
                patch({ orientationDeg: v === '' ? undefined : Number(v) });
              }}
              className="min-h-10 rounded-md border border-steel-300 bg-white px-2 font-mono text-sm font-normal"
            />
          </label>
        ) : null}
      </PanelSection>

      <PanelSection title="Computed">
        <dl className="flex flex-col gap-1">
          {p ? <Fact label="Work point (E · N · Up)" value={`${fmtCoord(p.x, units)} · ${fmtCoord(p.y, units)} · ${fmtCoord(p.z, units)}`} /> : null}
          {component?.ends.map((e, i) => (
            <Fact key={i} label={`Take-off, end ${i + 1} (${e.joint})`} value={e.takeOffMm === null ? '—' : formatLength(e.takeOffMm, units)} />
          ))}
          {headerAxis && placedOrientation !== null ? <Fact label="Orientation" value={describeOrientation(headerAxis, placedOrientation)} /> : null}
          {flange?.raisedFaceMm ? <Fact label="Raised face (in the take-off)" value={`${formatLength(flange.raisedFaceMm, units)}, ASME B16.5 metric; inch-made flanges are often 1.6 mm`} /> : null}
          {component?.massKg ? <Fact label="Weight (est.)" value={`${component.massKg.toFixed(1)} kg`} /> : null}
          {flange ? (
            <>
              <Fact label={`First hole from ${flange.reference === 'plant-north' ? 'plant north' : 'plant vertical'}`} value={`${flange.rotationDeg.toFixed(1)}°`} />
              <Fact label="Holes straddle centrelines" value={flange.straddles ? 'yes' : 'no'} tone={!flange.straddles && flange.mustTwoHole ? 'bad' : undefined} />
              {flange.boltCount ? <Fact label="Bolts" value={`${flange.boltCount} on ${flange.boltCircleMm ? formatLength(flange.boltCircleMm, units) : '—'} circle`} /> : null}
            </>
          ) : null}
        </dl>
      </PanelSection>
    </div>
  );
}

function fmtCoord(mm: number, units: LengthUnits): string {
  return formatLength(mm, units).replace(' mm', '');
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
