import { shopMarks, withShopMarks } from './shop-marks';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import type { FlowBlock } from './flow-layout';
import { tableBlock, type TableRow } from './table-block';

const WELD_TYPE: Record<string, string> = {
  butt: 'Butt',
  socket: 'Socket',
  branch: 'Branch',
  flange: 'Flange (butt)',
  'slip-on-fillet': 'Slip-on fillet',
};

const len = (mm: number | null, units: LengthUnits): string =>
  mm === null ? 'NOT COMPUTED' : formatLength(mm, units);

/** Cut list: one row per pipe piece with size, schedule, material, cut length and end preparations. */
export function cutListBlock(
  result: SpoolResult,
  units: LengthUnits,
  size: number,
  revisionMark: { letter: string; pieces: Set<string> } | null = null,
): FlowBlock {
  const rows: TableRow[] = result.pieces.map((p) => {
    const notes: string[] = [];
    if (p.shortPointLengthMm !== null) notes.push(`short point ${formatLength(p.shortPointLengthMm, units)}`);
    if (p.fieldFitAllowanceMm > 0)
      notes.push(`incl. ${formatLength(p.fieldFitAllowanceMm, units)} field fit`);
    if (p.heat) notes.push(`heat ${p.heat}`);
    return {
      cells: [
        p.mark,
        p.nps,
        p.schedule,
        p.material,
        len(p.cutLengthMm, units),
        `${p.ends[0].label} / ${p.ends[1].label}`,
        notes.join('; '),
        ...(revisionMark ? [revisionMark.pieces.has(p.mark) ? revisionMark.letter : ''] : []),
      ],
      emphasis: p.cutLengthMm === null ? 'warn' : revisionMark?.pieces.has(p.mark) ? 'group' : undefined,
    };
  });
  const total = result.pieces.reduce((s, p) => s + (p.cutLengthMm ?? 0), 0);
  if (rows.length > 1)
    rows.push({
      cells: [
        'Total',
        '',
        '',
        '',
        formatLength(total, units),
        `${rows.length} pieces`,
        '',
        ...(revisionMark ? [''] : []),
      ],
      emphasis: 'total',
    });
  return tableBlock({
    title: 'Cut list',
    size,
    columns: [
      { header: 'Piece', weight: 0.7, font: 'body-bold' },
      { header: 'NPS', weight: 0.6 },
      { header: 'Sch', weight: 0.6 },
      { header: 'Material', weight: 1.8 },
      { header: 'Cut length', weight: 1.5, align: 'right', font: 'body-bold' },
      { header: 'End preps (start / end)', weight: 2.6, wrap: true },
      { header: 'Notes', weight: 1.9, wrap: true },
      ...(revisionMark
        ? [{ header: 'Rev', weight: 0.45, align: 'center' as const, font: 'body-bold' as const }]
        : []),
    ],
    rows,
    footnote: `${revisionMark ? `Rev ${revisionMark.letter}: changed in this revision. ` : ''}Cut length = work point distance − fitting take-offs − ${formatLength(result.spec.rootGapMm, units)} root gap per butt weld. Saw kerf (${formatLength(result.spec.sawKerfMm, units)}) is not included: see the job saw list.`,
  });
}

/** Weld list: joint mark, type, size, shop or field, what it joins. */
export function weldListBlock(result: SpoolResult, size: number): FlowBlock {
  const marks = shopMarks(result);
  const rows: TableRow[] = result.welds.map((w) => ({
    cells: [
      w.mark,
      WELD_TYPE[w.type] ?? w.type,
      `NPS ${w.nps}`,
      w.location === 'field' ? 'FIELD' : 'shop',
      withShopMarks(w.joins, marks, result),
    ],
    emphasis: w.location === 'field' ? 'group' : undefined,
  }));
  const shop = result.welds.filter((w) => w.location === 'shop').length;
  return tableBlock({
    title: 'Weld list',
    size,
    columns: [
      { header: 'Weld', weight: 0.7, font: 'body-bold' },
      { header: 'Type', weight: 1.3 },
      { header: 'Size', weight: 0.9 },
      { header: 'Shop / field', weight: 0.9 },
      { header: 'Joins', weight: 3, wrap: true },
    ],
    rows,
    footnote: `${result.welds.length} welds (${shop} shop, ${result.welds.length - shop} field), ${round(result.diameterInches, 2)} diameter-inches.`,
  });
}

/** What the BOM quantity column prints for a line. */
function bomQuantity(item: SpoolResult['bom']['items'][number], units: LengthUnits): string {
  if (item.category === 'pipe' && item.totalCutMm !== null)
    return `${formatLength(item.totalCutMm, units)} (${item.count} pc)`;
  if (item.bolting)
    return `${item.count} studs, ${item.bolting.nutCount} nuts (${item.bolting.joints} × ${item.bolting.perJoint})`;
  return String(item.count);
}

/**
 * Bill of materials: size (both sizes for reducing items and outlets), the item with its
 * material and standard, schedule or class, end preparation and quantity. Loose items (studs
 * with nuts, gaskets, blinds) are marked: they ship with the spool, not welded to it.
 */
export function bomBlock(result: SpoolResult, units: LengthUnits, size: number): FlowBlock {
  const rows: TableRow[] = result.bom.items.map((item, i) => {
    const text = item.description.startsWith(`${item.sizeLabel} `)
      ? item.description.slice(item.sizeLabel.length + 1)
      : item.description;
    return {
      cells: [
        String(i + 1),
        item.sizeLabel,
        item.note ? `${text}. ${item.note}` : text,
        item.rating ?? '',
        item.endPrep ?? '',
        bomQuantity(item, units),
        item.loose ? 'LOOSE' : '',
      ],
      emphasis: item.note ? 'warn' : item.loose ? 'group' : undefined,
    };
  });
  return tableBlock({
    title: 'Bill of materials',
    size,
    columns: [
      // Narrow columns hold one short word each ("No.", "LOOSE", "bevel 37.5°"): wide enough
      // for it on A4 and Letter, so it wraps between words, never inside one.
      { header: 'No.', weight: 0.45 },
      { header: 'Size', weight: 1.0, font: 'body-bold', wrap: true },
      { header: 'Description, material, standard', weight: 3.9, wrap: true },
      { header: 'Sch / class', weight: 1.1, wrap: true },
      { header: 'Ends', weight: 1.05, wrap: true },
      { header: 'Qty', weight: 1.4, align: 'right', font: 'body-bold', wrap: true },
      { header: 'Loose', weight: 0.85, align: 'center' },
    ],
    rows,
    footnote:
      'Pipe quantities are total cut length per size and schedule (kerf not included). LOOSE: shipped loose with the spool for the joint to its mate, not welded; one stud set and one gasket per flange face. Stud lengths exclude the points (ASME B16.5). BW: bevelled for butt welding (ASME B16.25); SW: socket weld; RF: raised face.',
  });
}

/** Overall and envelope sizes, listed as well as drawn. */
export function overallBlock(result: SpoolResult, units: LengthUnits, size: number): FlowBlock | null {
  if (!result.overall) return null;
  const { workPointBox: wp, envelopeBox: env } = result.overall;
  const row = (label: string, b: typeof wp): TableRow => ({
    cells: [
      label,
      formatLength(b.sizeMm.x, units),
      formatLength(b.sizeMm.y, units),
      formatLength(b.sizeMm.z, units),
    ],
  });
  return tableBlock({
    title: 'Overall dimensions',
    size,
    columns: [
      { header: '', weight: 2.2 },
      { header: 'East–west', weight: 1.3, align: 'right' },
      { header: 'North–south', weight: 1.3, align: 'right' },
      { header: 'Vertical', weight: 1.3, align: 'right' },
    ],
    rows: [row('Work points and faces', wp), row('Shipping envelope (outside of pipe)', env)],
  });
}

function round(value: number, places: number): string {
  return String(Number(value.toFixed(places)));
}
