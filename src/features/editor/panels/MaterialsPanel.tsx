import type { BomItem, SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { cn } from '../../../lib/cn';

/** Quantity as the shop counts it: pipe by length, studs with their nuts, the rest by piece. */
function quantity(item: BomItem, units: LengthUnits): string {
  if (item.category === 'pipe' && item.totalCutMm !== null) return `${formatLength(item.totalCutMm, units)} · ${item.count} pc`;
  if (item.bolting) return `${item.count} studs + ${item.bolting.nutCount} nuts`;
  return String(item.count);
}

/**
 * The live materials list: what the spool is built from, each line with its size,
 * schedule or class, ends, material and standard, and the loose kit (studs with nuts,
 * gaskets, blinds) that ships with it for the joints to its mates.
 */
export function MaterialsPanel({ result, units }: { result: SpoolResult; units: LengthUnits }) {
  const items = result.bom.items;
  if (items.length === 0) return <p className="p-3 text-sm text-steel-600">Nothing to order yet: add a run.</p>;
  const loose = items.filter((i) => i.loose).length;
  return (
    <table className="w-full text-sm" data-testid="materials-list">
      <caption className="sr-only">Materials</caption>
      <thead className="bg-steel-100 text-left text-xs uppercase tracking-wide text-steel-600">
        <tr>
          <th className="px-2 py-1.5">Size</th>
          <th className="px-2 py-1.5">Item</th>
          <th className="px-2 py-1.5">Sch / class</th>
          <th className="px-2 py-1.5">Ends</th>
          <th className="px-2 py-1.5 text-right">Qty</th>
        </tr>
      </thead>
      <tbody>
        {items.map((item) => {
          const text = item.description.startsWith(`${item.sizeLabel} `) ? item.description.slice(item.sizeLabel.length + 1) : item.description;
          return (
            <tr key={`${item.category}|${item.description}`} data-bom-category={item.category} className={cn('border-t border-steel-200', item.loose && 'bg-steel-50')}>
              <td className="px-2 py-1.5 font-mono font-semibold whitespace-nowrap">{item.sizeLabel}</td>
              <td className="px-2 py-1.5 text-xs text-steel-800">
                {text}
                {item.loose ? <span className="ml-1 rounded bg-steel-200 px-1 text-[10px] font-bold uppercase text-ink-700">loose</span> : null}
                {item.note ? <span className="block text-danger-700">{item.note}</span> : null}
              </td>
              <td className="px-2 py-1.5 font-mono text-xs">{item.rating ?? '—'}</td>
              <td className="px-2 py-1.5 text-xs">{item.endPrep ?? '—'}</td>
              <td className="px-2 py-1.5 text-right font-mono">{quantity(item, units)}</td>
            </tr>
          );
        })}
      </tbody>
      <tfoot>
        <tr className="border-t-2 border-steel-300 text-xs text-steel-700">
          <td className="px-2 py-1.5" colSpan={5}>
            {loose} loose line{loose === 1 ? '' : 's'}: shipped with the spool for the joints to its mates, not welded. One stud set and one gasket per flange face.
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
