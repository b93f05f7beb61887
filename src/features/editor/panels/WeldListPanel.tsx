import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { Selection } from '../model/editor-selection';
import type { UserNames } from '../model/user-names';

const TYPE_WORDS = { butt: 'Butt', socket: 'Socket', branch: 'Branch', flange: 'Flange', 'slip-on-fillet': 'Slip-on fillet' } as const;

/** The weld map as a list: every joint numbered, shop or field, with its size. */
export function WeldListPanel({ result, names, onSelect }: { result: SpoolResult; names: UserNames; onSelect: (s: Selection) => void }) {
  if (result.welds.length === 0) return <p className="p-3 text-sm text-steel-600">No welds yet.</p>;
  const field = result.welds.filter((w) => w.location === 'field').length;
  return (
    <table className="w-full text-sm" data-testid="weld-list">
      <caption className="sr-only">Weld list</caption>
      <thead className="bg-steel-100 text-left text-xs uppercase tracking-wide text-steel-600">
        <tr>
          <th className="px-2 py-1.5">Weld</th>
          <th className="px-2 py-1.5">Type</th>
          <th className="px-2 py-1.5">Size</th>
          <th className="px-2 py-1.5">Where</th>
          <th className="px-2 py-1.5">Joins</th>
        </tr>
      </thead>
      <tbody>
        {result.welds.map((w) => (
          <tr key={w.mark} className="cursor-pointer border-t border-steel-200 hover:bg-spark-100/60" onClick={() => onSelect({ type: 'node', id: w.nodeId })}>
            <td className="px-2 py-1.5 font-mono font-semibold">{w.mark}</td>
            <td className="px-2 py-1.5">{TYPE_WORDS[w.type]}</td>
            <td className="px-2 py-1.5 font-mono">{w.nps}"</td>
            <td className="px-2 py-1.5">{w.location === 'field' ? 'Field' : 'Shop'}</td>
            <td className="px-2 py-1.5 text-xs text-steel-700">{names.text(w.joins)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr className="border-t-2 border-steel-300 text-steel-700">
          <td className="px-2 py-1.5" colSpan={5}>
            {result.welds.length} welds ({result.welds.length - field} shop, {field} field) · {result.diameterInches.toLocaleString('en-GB')} diameter-inches
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
