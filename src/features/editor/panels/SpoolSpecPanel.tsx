import { useState } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { FLANGE_CLASSES, type FlangeClass } from '../../../../shared/standards/flanges';
import type { GasketType } from '../../../../shared/standards/flange-joint-kits';
import { NPS_VALUES, type Nps } from '../../../../shared/standards/nps';
import { SCHEDULE_VALUES, type Schedule } from '../../../../shared/standards/pipe-schedules';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { setDesignSpec } from '../model/commands/edit-node';
import type { EditorModel } from '../model/editor-model';
import { LengthInput } from './LengthInput';
import { Fact, PanelSection, SmallSelect, npsOptions } from './panel-bits';

/**
 * The spool's own spec when nothing is selected: main size, wall, flange class and root
 * gap (each falls back to the job's when cleared), with what the engine resolved.
 */
export function SpoolSpecPanel({ model, design, result, units, readOnly }: { model: EditorModel; design: SpoolDesign; result: SpoolResult | null; units: LengthUnits; readOnly: boolean }) {
  const spec = design.spec ?? {};
  const [gap, setGap] = useState<number | null>(spec.rootGapMm ?? null);
  const set = (patch: Parameters<typeof setDesignSpec>[1]['patch']) => model.edit((d) => setDesignSpec(d, { patch }));
  return (
    <PanelSection title="Spool spec">
      <p className="text-xs text-steel-600">Blank fields follow the job&apos;s spec. Every cut length follows a change here.</p>
      <div className="grid grid-cols-2 gap-2">
        <SmallSelect
          label="Main size"
          value={spec.nps ?? ''}
          disabled={readOnly}
          onChange={(e) => set({ nps: (e.target.value || null) as Nps | null })}
          options={[{ value: '', label: 'not set' }, ...npsOptions(NPS_VALUES)]}
        />
        <SmallSelect
          label="Wall"
          value={spec.schedule ?? ''}
          disabled={readOnly}
          onChange={(e) => set({ schedule: (e.target.value || null) as Schedule | null })}
          options={[{ value: '', label: 'job spec' }, ...SCHEDULE_VALUES.map((s) => ({ value: s, label: /^\d/.test(s) ? `Sch ${s}` : s }))]}
        />
        <SmallSelect
          label="Flange class"
          value={spec.flangeClass ? String(spec.flangeClass) : ''}
          disabled={readOnly}
          onChange={(e) => set({ flangeClass: e.target.value ? (Number(e.target.value) as FlangeClass) : null })}
          options={[
            { value: '', label: 'job spec' },
            ...FLANGE_CLASSES.map((c) => ({ value: String(c), label: `Class ${c}` })),
          ]}
        />
        <SmallSelect
          label="Gaskets"
          value={spec.gasketType ?? ''}
          disabled={readOnly}
          onChange={(e) => set({ gasketType: (e.target.value || null) as GasketType | null })}
          options={[
            { value: '', label: 'job spec' },
            { value: 'spiral-wound', label: 'Spiral-wound (B16.20)' },
            { value: 'sheet', label: 'Sheet (B16.21)' },
          ]}
        />
        <LengthInput
          label="Root gap"
          units={units}
          valueMm={gap}
          disabled={readOnly}
          onChange={setGap}
          onEnter={() => set({ rootGapMm: gap })}
          hint="Enter to apply; blank = job"
        />
      </div>
      {result ? (
        <dl className="mt-1 flex flex-col gap-1">
          <Fact label="In use" value={`${result.spec.schedule} · Class ${result.spec.flangeClass}`} />
          <Fact label="Root gap · saw kerf" value={`${formatLength(result.spec.rootGapMm, units)} · ${formatLength(result.spec.sawKerfMm, units)}`} />
          <Fact label="Shortest piece" value={formatLength(result.spec.minPieceLengthMm, units)} />
          <Fact label="Material" value={result.spec.material} />
          <Fact label="Loose kit" value={`${result.spec.gasketType === 'sheet' ? 'sheet' : 'spiral-wound'} gaskets · ${result.spec.boltingMaterial}`} />
        </dl>
      ) : null}
    </PanelSection>
  );
}
