import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import type { Selection } from '../model/editor-selection';
import { cn } from '../../../lib/cn';

/** The live cut list: every pipe piece with its saw length and end preparation. */
export function CutListPanel({ result, units, selection, onSelect }: { result: SpoolResult; units: LengthUnits; selection: Selection; onSelect: (s: Selection) => void }) {
  if (result.pieces.length === 0) return <p className="p-3 text-sm text-steel-600">No pipe pieces yet: add a run.</p>;
  const totalCut = result.pieces.reduce((sum, p) => sum + (p.cutLengthMm ?? 0), 0);
  return (
    <table className="w-full text-sm" data-testid="cut-list">
      <caption className="sr-only">Cut list</caption>
      <thead className="bg-steel-100 text-left text-xs uppercase tracking-wide text-steel-600">
        <tr>
          <th className="px-2 py-1.5">Piece</th>
          <th className="px-2 py-1.5">Size</th>
          <th className="px-2 py-1.5 text-right">Cut length</th>
          <th className="px-2 py-1.5">Ends</th>
          <th className="px-2 py-1.5">Heat</th>
        </tr>
      </thead>
      <tbody>
        {result.pieces.map((p) => {
          const selected = selection?.type === 'run' && p.runIds.includes(selection.id);
          return (
            <tr
              key={p.mark}
              data-piece={p.mark}
              className={cn('cursor-pointer border-t border-steel-200 hover:bg-spark-100/60', selected && 'bg-spark-100')}
              onClick={() => onSelect({ type: 'run', id: p.runIds[0]! })}
            >
              <td className="px-2 py-1.5 font-mono font-semibold">
                <button type="button" className="underline-offset-2 hover:underline" onClick={() => onSelect({ type: 'run', id: p.runIds[0]! })}>
                  {p.mark}
                </button>
              </td>
              <td className="px-2 py-1.5 font-mono">
                {p.nps}" {p.schedule}
              </td>
              <td className={cn('px-2 py-1.5 text-right font-mono font-semibold', p.cutLengthMm === null && 'text-danger-700')} data-cut-mm={p.cutLengthMm ?? ''}>
                {p.cutLengthMm === null ? 'impossible' : formatLength(p.cutLengthMm, units)}
              </td>
              <td className="px-2 py-1.5 text-xs text-steel-700">{p.ends.map((e) => e.label).join(' / ')}</td>
              <td className="px-2 py-1.5 font-mono text-xs">{p.heat ?? '—'}</td>
            </tr>
          );
        })}
      </tbody>
      <tfoot>
        <tr className="border-t-2 border-steel-300 text-steel-700">
          <td className="px-2 py-1.5" colSpan={2}>
            {result.pieces.length} piece{result.pieces.length === 1 ? '' : 's'}
          </td>
          <td className="px-2 py-1.5 text-right font-mono">{formatLength(totalCut, units)}</td>
          <td className="px-2 py-1.5 text-xs" colSpan={2}>
            saw kerf {formatLength(result.spec.sawKerfMm, units)} per cut, root gap {formatLength(result.spec.rootGapMm, units)}
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
