import type { DataStatus } from './data-status';
import type { Nps } from './nps';

/**
 * Stud-bolt lengths for raised-face flanges, ASME B16.5 drilling tables (mm, without the
 * height of the points; B16.5 para. 6.10.2). Number and diameter of the studs are the
 * flange table's (`b16-5-flange-table.ts`); only the length lives here.
 *
 * Class 150 and 300 lengths are for the 2 mm raised face, Class 600 for the 7 mm face.
 */
export type StudLengthRow = { nps: Nps; lengthMm: number; status: DataStatus };

/** Which table each class's lengths come from (standard, table, edition). */
export const STUD_LENGTH_SOURCES = {
  150: 'ASME B16.5-2009 Table 7, stud bolts, 2 mm raised face',
  300: 'ASME B16.5 Class 300 drilling table, stud bolts, 2 mm raised face (from memory)',
  600: 'ASME B16.5-2013 Table 15, stud bolts, 7 mm raised face',
} as const;

// prettier-ignore
const C150: readonly [Nps, number][] = [
  ['1/2', 55], ['3/4', 65], ['1', 65], ['1-1/4', 70], ['1-1/2', 70], ['2', 85], ['2-1/2', 90],
  ['3', 90], ['4', 90], ['5', 95], ['6', 100], ['8', 110], ['10', 115], ['12', 120],
  ['14', 135], ['16', 135], ['18', 145], ['20', 160], ['24', 170],
];

// From memory (status M): no reproduction of the Class 300 table was at hand. A secondary
// bolting chart (lengths rounded to 5 mm) agrees within 5 mm for NPS 1/2–4.
// prettier-ignore
const C300: readonly [Nps, number][] = [
  ['1/2', 65], ['3/4', 75], ['1', 75], ['1-1/4', 85], ['1-1/2', 90], ['2', 85], ['2-1/2', 100],
  ['3', 110], ['4', 115], ['5', 120], ['6', 120], ['8', 140], ['10', 160], ['12', 170],
  ['14', 180], ['16', 190], ['18', 195], ['20', 205], ['24', 230],
];

// NPS 3-1/2 (140 mm in the table) left out: not an Nps here.
// prettier-ignore
const C600: readonly [Nps, number][] = [
  ['1/2', 75], ['3/4', 90], ['1', 90], ['1-1/4', 95], ['1-1/2', 110], ['2', 110], ['2-1/2', 120],
  ['3', 125], ['4', 145], ['5', 165], ['6', 170], ['8', 190], ['10', 215], ['12', 220],
  ['14', 235], ['16', 255], ['18', 275], ['20', 285], ['24', 330],
];

const rows = (raw: readonly [Nps, number][], status: DataStatus): StudLengthRow[] =>
  raw.map(([nps, lengthMm]) => ({ nps, lengthMm, status }));

/** Raised-face stud-bolt lengths by class, mm. */
export const STUD_LENGTH_TABLE: Readonly<Record<150 | 300 | 600, readonly StudLengthRow[]>> = {
  150: rows(C150, 'S'),
  300: rows(C300, 'M'),
  600: rows(C600, 'S'),
};
