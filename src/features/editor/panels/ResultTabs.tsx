import { useState } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { LengthUnits } from '../../../../shared/units/length-format';
import { cn } from '../../../lib/cn';
import type { EditorModel } from '../model/editor-model';
import type { Selection } from '../model/editor-selection';
import { useUserNames } from '../hooks/use-user-names';
import { ChecksPanel } from './ChecksPanel';
import { CutListPanel } from './CutListPanel';
import { FlangesPanel } from './FlangesPanel';
import { MaterialsPanel } from './MaterialsPanel';
import { WeightPanel } from './WeightPanel';
import { WeldListPanel } from './WeldListPanel';

type Tab = 'cut' | 'welds' | 'checks' | 'flanges' | 'weight' | 'materials';

/** The live results under the model: cut list, welds, checks, flanges, weight, materials. */
export function ResultTabs({
  model,
  result,
  design,
  units,
  selection,
  readOnly,
}: {
  model: EditorModel;
  result: SpoolResult;
  design: SpoolDesign;
  units: LengthUnits;
  selection: Selection;
  readOnly: boolean;
}) {
  const [tab, setTab] = useState<Tab>('cut');
  const errors = result.issues.filter((i) => i.severity === 'error').length;
  const warnings = result.issues.length - errors;
  const flangeProblems = result.flanges.filter((f) => f.correction).length + result.flangePairs.filter((p) => p.withinTolerance === false).length;
  const onSelect = (s: Selection) => model.select(s);
  const names = useUserNames(result, design);
  const tabs: { id: Tab; label: string; badge?: string; tone?: 'bad' | 'warn' }[] = [
    { id: 'cut', label: 'Cut list', badge: String(result.pieces.length) },
    { id: 'welds', label: 'Welds', badge: String(result.welds.length) },
    { id: 'checks', label: 'Checks', badge: errors ? `${errors} error${errors === 1 ? '' : 's'}` : warnings ? `${warnings}` : 'ok', tone: errors ? 'bad' : warnings ? 'warn' : undefined },
    { id: 'flanges', label: 'Bolt holes', badge: flangeProblems ? `${flangeProblems} to fix` : String(result.flanges.length), tone: flangeProblems ? 'bad' : undefined },
    { id: 'weight', label: 'Weight & CoG', badge: `${Math.round(result.weights.emptyKg)} kg` },
    { id: 'materials', label: 'Materials', badge: String(result.bom.items.length) },
  ];
  return (
    <section aria-label="Results" className="rounded-md border border-steel-200 bg-white">
      <div role="tablist" aria-label="Results" className="flex flex-wrap gap-1 border-b border-steel-200 p-1">
        {tabs.map((t) => (
          <button
            key={t.id}
            role="tab"
            type="button"
            id={`result-tab-${t.id}`}
            aria-selected={tab === t.id}
            aria-controls={`result-panel-${t.id}`}
            onClick={() => setTab(t.id)}
            className={cn(
              'inline-flex min-h-10 items-center gap-2 rounded-md px-3 text-sm font-semibold',
              tab === t.id ? 'bg-ink-800 text-white' : 'text-ink-700 hover:bg-steel-100',
            )}
          >
            {t.label}
            {t.badge ? (
              <span
                className={cn(
                  'rounded px-1.5 text-[11px] font-bold',
                  t.tone === 'bad' ? 'bg-danger-600 text-white' : t.tone === 'warn' ? 'bg-spark-300 text-ink-950' : tab === t.id ? 'bg-ink-600 text-white' : 'bg-steel-200 text-ink-700',
                )}
              >
                {t.badge}
              </span>
            ) : null}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`result-panel-${tab}`} aria-labelledby={`result-tab-${tab}`} className="max-h-80 overflow-auto">
        {tab === 'cut' ? <CutListPanel result={result} units={units} selection={selection} onSelect={onSelect} /> : null}
        {tab === 'welds' ? <WeldListPanel result={result} names={names} onSelect={onSelect} /> : null}
        {tab === 'checks' ? <ChecksPanel result={result} design={design} names={names} onSelect={onSelect} /> : null}
        {tab === 'flanges' ? <FlangesPanel model={model} result={result} names={names} units={units} readOnly={readOnly} onSelect={onSelect} /> : null}
        {tab === 'weight' ? <WeightPanel result={result} units={units} /> : null}
        {tab === 'materials' ? <MaterialsPanel result={result} units={units} /> : null}
      </div>
    </section>
  );
}
