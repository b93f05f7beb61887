import { shopMarks, withShopMarks } from './shop-marks';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import type { FlowBlock } from './flow-layout';
import { paragraphBlock } from './paragraph-block';
import { SHEET_CAUTIONS } from './sheet-cautions';
import { tableBlock, type TableRow } from './table-block';

const LB_PER_KG = 2.2046226218;

/** The point CoG offsets are measured from: the root node's work point, named as the sheet shows it. */
export interface WeightDatum {
  label: string;
  position: Vec3;
}

/** Formats a mass in kg, with pounds too for inch shops. */
export function formatMass(kg: number, units: LengthUnits): string {
  const k = `${kg.toFixed(1)} kg`;
  return units === 'ft-in' ? `${k} (${(kg * LB_PER_KG).toFixed(0)} lb)` : k;
}

function signed(mm: number, units: LengthUnits): string {
  const text = formatLength(Math.abs(mm), units);
  return mm < -0.05 ? `−${text}` : `+${text}`;
}

/** Weights empty and water-filled and the centre of gravity, offset from a named datum. */
export function weightsBlock(
  result: SpoolResult,
  units: LengthUnits,
  datum: WeightDatum,
  size: number,
): FlowBlock {
  const w = result.weights;
  const cogCells = (p: Vec3 | null): string[] =>
    p
      ? [
          signed(p.x - datum.position.x, units),
          signed(p.y - datum.position.y, units),
          signed(p.z - datum.position.z, units),
        ]
      : ['—', '—', '—'];
  const rows: TableRow[] = [
    { cells: ['Empty', formatMass(w.emptyKg, units), ...cogCells(w.centreOfGravity)], emphasis: 'total' },
    {
      cells: [
        'Water-filled (hydrotest)',
        formatMass(w.waterFilledKg, units),
        ...cogCells(w.centreOfGravityFilled),
      ],
    },
  ];
  if (w.notIncluded.length > 0) {
    rows.push({
      cells: [
        `Not weighed: ${w.notIncluded.length} item${w.notIncluded.length > 1 ? 's' : ''}`,
        '',
        '',
        '',
        '',
      ],
      emphasis: 'warn',
    });
  }
  return tableBlock({
    title: 'Weight and centre of gravity (estimate)',
    size,
    columns: [
      { header: '', weight: 1.7 },
      { header: 'Mass', weight: 1.4, align: 'right', font: 'body-bold' },
      { header: 'CoG east', weight: 1.1, align: 'right' },
      { header: 'CoG north', weight: 1.1, align: 'right' },
      { header: 'CoG up', weight: 1.1, align: 'right' },
    ],
    rows,
    footnote: `CoG measured from ${datum.label} (plant axes). Steel 7850 kg/m³. ${w.caution}`,
  });
}

/** Sheet notes: what the numbers include, conventions, the revision note, the design's own text. */
export function notesBlock(lines: string[], size: number): FlowBlock {
  return paragraphBlock({ title: 'Notes', paragraphs: lines, size, list: 'numbered' });
}

/** The safety cautions, boxed. */
export function cautionsBlock(size: number): FlowBlock {
  return paragraphBlock({
    title: 'Cautions',
    paragraphs: [...SHEET_CAUTIONS],
    size,
    tone: 'caution',
    list: 'bullet',
  });
}

/** Engine errors (and warnings), boxed in red at the top of the sheet. */
export function issuesBlock(result: SpoolResult, size: number): FlowBlock | null {
  const errors = result.issues.filter((i) => i.severity === 'error');
  const warnings = result.issues.filter((i) => i.severity === 'warning');
  if (errors.length === 0 && warnings.length === 0) return null;
  // Users see shop marks, never the design's node ids.
  const marks = shopMarks(result);
  const ref = (id: string | null | undefined) =>
    id ? `(${marks.get(id) ?? withShopMarks(id, marks, result)}) ` : '';
  const paragraphs = [
    ...errors.map((i) => `ERROR ${ref(i.componentId)}${withShopMarks(i.message, marks, result)}`),
    ...warnings.map((i) => `Warning ${ref(i.componentId)}${withShopMarks(i.message, marks, result)}`),
  ];
  return paragraphBlock({
    title:
      errors.length > 0
        ? `Design errors: ${errors.length} — not for fabrication until fixed`
        : `Warnings: ${warnings.length}`,
    paragraphs,
    size,
    tone: errors.length > 0 ? 'error' : 'caution',
    list: 'none',
  });
}
