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

const BOM_CATEGORY: Record<string, string> = {
  pipe: 'Pipe',
  fitting: 'Fitting',
  flange: 'Flange',
  'socket-fitting': 'Socket fitting',
  'branch-outlet': 'Branch outlet',
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

/** Bill of materials. */
export function bomBlock(result: SpoolResult, units: LengthUnits, size: number): FlowBlock {
  const rows: TableRow[] = result.bom.items.map((item, i) => ({
    cells: [
      String(i + 1),
      BOM_CATEGORY[item.category] ?? item.category,
      item.description,
      item.category === 'pipe' && item.totalCutMm !== null
        ? formatLength(item.totalCutMm, units)
        : String(item.count),
    ],
  }));
  return tableBlock({
    title: 'Bill of materials',
    size,
    columns: [
      { header: 'Item', weight: 0.5 },
      { header: 'Category', weight: 1.1 },
      { header: 'Description', weight: 4.4, wrap: true },
      { header: 'Qty', weight: 1.2, align: 'right', font: 'body-bold' },
    ],
    rows,
    footnote: 'Pipe quantities are total cut length (kerf not included).',
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
