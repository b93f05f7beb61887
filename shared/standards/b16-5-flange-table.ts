import type { DataStatus } from './data-status';
import type { Nps } from './nps';

/**
 * One NPS row of ASME B16.5 for one pressure class, metric tables (mm), except hole and
 * bolt sizes which B16.5 gives in inches even in its metric tables.
 *
 * Raised-face convention: B16.5-2003 and later. Thickness `tf` and the hub lengths `y*`
 * EXCLUDE the raised face for Classes 150 and 300; the raised face (2 mm in the metric
 * tables, 1/16 in in the inch tables) is added on top. Tables from 1999 and earlier
 * include a 1.6 mm face in tf and Y, so their Y is about 1.6 mm longer.
 */
export type FlangeRow = {
  nps: Nps;
  /** Flange outside diameter O. */
  odMm: number;
  /** Bolt-circle diameter W. */
  boltCircleMm: number;
  boltCount: number;
  /** Bolt-hole diameter, inches as B16.5 writes it ('5/8', '1-1/8'). */
  holeIn: string;
  /** Stud / bolt size, inches. */
  boltIn: string;
  /** Minimum flange thickness tf, excluding the raised face. */
  tfMm: number;
  /** Weld-neck length through hub Y, excluding the raised face. */
  yWeldNeckMm: number;
  /** Slip-on length through hub Y, excluding the raised face. */
  ySlipOnMm: number;
  /** Hub diameter at the base X. */
  hubBaseMm: number;
  /** Raised-face diameter R. */
  raisedFaceDiaMm: number;
  /** Status of OD, bolt circle, count, hole and bolt size. */
  drillingStatus: DataStatus;
  /** Status of the weld-neck Y. */
  yWeldNeckStatus: DataStatus;
  /** Status of tf, slip-on Y, X and R. */
  bodyStatus: DataStatus;
  /** Note on where S values came from or any rounding conflict. */
  note?: string;
};

type Raw = [
  Nps,
  number,
  number,
  number,
  string,
  string,
  number,
  number,
  number,
  number,
  number,
  DataStatus,
  DataStatus,
  DataStatus,
  string?,
];

function rows(raw: readonly Raw[]): FlangeRow[] {
  return raw.map(([nps, od, bc, n, hole, bolt, tf, ywn, yso, x, r, dS, yS, bS, note]) => ({
    nps,
    odMm: od,
    boltCircleMm: bc,
    boltCount: n,
    holeIn: hole,
    boltIn: bolt,
    tfMm: tf,
    yWeldNeckMm: ywn,
    ySlipOnMm: yso,
    hubBaseMm: x,
    raisedFaceDiaMm: r,
    drillingStatus: dS,
    yWeldNeckStatus: yS,
    bodyStatus: bS,
    ...(note ? { note } : {}),
  }));
}

/**
 * Where each class table's values come from: the standard, table and edition only (the
 * row notes and statuses say how far each value is confirmed).
 */
export const FLANGE_SOURCES = {
  150: 'ASME B16.5-2009 Table 7 (Class 150 drilling); tf, Y, X and R from the pre-2003 Class 150 dimension table less the 1.6 mm face',
  300: 'ASME B16.5 Class 300 dimension table, pre-2003 edition converted from inches (NPS 1/2–3); NPS 4–8 drilling as ASME B16.36 Class 400 (same pattern); the rest from memory',
  600: 'ASME B16.5-2013 Table 15 (Class 600 drilling); Table 16 body dimensions from memory',
} as const;

/** Table names as users see them, one per class ("ASME B16.5 Class 150"). */
export const FLANGE_TABLE_NAMES = {
  150: 'ASME B16.5 Class 150',
  300: 'ASME B16.5 Class 300',
  600: 'ASME B16.5 Class 600',
} as const;

// Columns: nps, O, W, bolts, hole, bolt, tf, Y(WN), Y(SO), X, R, drilling, Y(WN), body status
// prettier-ignore
const C150: readonly Raw[] = [
  ['1/2', 90, 60.3, 4, '5/8', '1/2', 9.6, 46, 14, 30, 34.9, 'S', 'C', 'C'],
  ['3/4', 100, 69.9, 4, '5/8', '1/2', 11.2, 51, 14, 38, 42.9, 'S', 'C', 'C'],
  ['1', 110, 79.4, 4, '5/8', '1/2', 12.7, 54, 16, 49, 50.8, 'S', 'C', 'C'],
  ['1-1/4', 115, 88.9, 4, '5/8', '1/2', 14.3, 56, 19, 59, 63.5, 'S', 'C', 'C'],
  ['1-1/2', 125, 98.4, 4, '5/8', '1/2', 15.9, 60, 21, 65, 73.0, 'S', 'C', 'C'],
  ['2', 150, 120.7, 4, '3/4', '5/8', 17.5, 62, 24, 78, 92.1, 'S', 'C', 'C'],
  ['2-1/2', 180, 139.7, 4, '3/4', '5/8', 20.7, 68, 27, 90, 104.8, 'S', 'C', 'C'],
  ['3', 190, 152.4, 4, '3/4', '5/8', 22.3, 68, 29, 108, 127.0, 'S', 'C', 'C'],
  ['4', 230, 190.5, 8, '3/4', '5/8', 22.3, 75, 32, 135, 157.2, 'S', 'C', 'C'],
  ['5', 255, 215.9, 8, '7/8', '3/4', 22.3, 87, 35, 164, 185.7, 'S', 'C', 'C'],
  ['6', 280, 241.3, 8, '7/8', '3/4', 23.9, 87, 38, 192, 215.9, 'S', 'C', 'C'],
  ['8', 345, 298.5, 8, '7/8', '3/4', 27.0, 100, 43, 246, 269.9, 'S', 'C', 'C'],
  ['10', 405, 362.0, 12, '1', '7/8', 28.6, 100, 48, 305, 323.8, 'S', 'C', 'C'],
  ['12', 485, 431.8, 12, '1', '7/8', 30.2, 113, 54, 365, 381.0, 'S', 'C', 'C'],
  ['14', 535, 476.3, 12, '1-1/8', '1', 33.4, 125, 56, 400, 412.8, 'S', 'C', 'C'],
  ['16', 595, 539.8, 16, '1-1/8', '1', 35.0, 125, 62, 457, 469.9, 'S', 'C', 'C'],
  ['18', 635, 577.9, 16, '1-1/4', '1-1/8', 38.1, 138, 67, 505, 533.4, 'S', 'C', 'C'],
  ['20', 700, 635.0, 20, '1-1/4', '1-1/8', 41.3, 143, 71, 559, 584.2, 'S', 'C', 'C'],
  ['24', 815, 749.3, 20, '1-3/8', '1-1/4', 46.1, 151, 81, 663, 692.2, 'S', 'C', 'C'],
];

const ROUNDED_BC =
  'bolt circle is the exact conversion of the B16.5 fractional inch value; one source converts a two-decimal inch figure and differs by about 0.2 mm';

// prettier-ignore
const C300: readonly Raw[] = [
  ['1/2', 95, 66.7, 4, '5/8', '1/2', 12.7, 51, 21, 38, 34.9, 'S~', 'S~', 'S~', ROUNDED_BC],
  ['3/4', 115, 82.6, 4, '3/4', '5/8', 14.3, 56, 24, 48, 42.9, 'S~', 'S~', 'S~', 'source lists OD 117 (converted inch); B16.5 metric 115'],
  ['1', 125, 88.9, 4, '3/4', '5/8', 15.9, 60, 25, 54, 50.8, 'S', 'S~', 'S~', 'source lists OD 124 (converted inch) and Y 60.4; B16.5 metric 125 and 60'],
  ['1-1/4', 135, 98.4, 4, '3/4', '5/8', 17.5, 64, 25, 64, 63.5, 'S~', 'S~', 'S~', ROUNDED_BC],
  ['1-1/2', 155, 114.3, 4, '7/8', '3/4', 19.1, 67, 29, 70, 73.0, 'S', 'S~', 'S~'],
  ['2', 165, 127.0, 8, '3/4', '5/8', 20.7, 68, 32, 84, 92.1, 'S', 'S~', 'S~'],
  ['2-1/2', 190, 149.2, 8, '7/8', '3/4', 23.9, 75, 37, 100, 104.8, 'S~', 'S~', 'S~', ROUNDED_BC],
  ['3', 210, 168.3, 8, '7/8', '3/4', 27.0, 78, 41, 117, 127.0, 'S~', 'S~', 'S~', ROUNDED_BC],
  ['4', 255, 200.0, 8, '7/8', '3/4', 30.2, 84, 46, 146, 157.2, 'S~', 'M', 'M', 'bolt circle and count confirmed by the Class 400 drilling (same pattern); OD, hole and bolt from memory'],
  ['5', 280, 235.0, 8, '7/8', '3/4', 33.4, 97, 49, 178, 185.7, 'S~', 'M', 'M', 'bolt circle and count confirmed by the Class 400 drilling (same pattern); OD, hole and bolt from memory'],
  ['6', 320, 269.9, 12, '7/8', '3/4', 35.0, 97, 51, 206, 215.9, 'S~', 'M', 'M', 'bolt circle and count confirmed by the Class 400 drilling (same pattern); OD, hole and bolt from memory'],
  ['8', 380, 330.2, 12, '1', '7/8', 39.7, 110, 60, 260, 269.9, 'S~', 'M', 'M', 'bolt circle and count confirmed by the Class 400 drilling (same pattern); OD, hole and bolt from memory'],
  ['10', 445, 387.4, 16, '1-1/8', '1', 46.1, 116, 65, 321, 323.8, 'M', 'M', 'M'],
  ['12', 520, 450.8, 16, '1-1/4', '1-1/8', 49.3, 129, 71, 375, 381.0, 'M', 'M', 'M'],
  ['14', 585, 514.4, 20, '1-1/4', '1-1/8', 52.4, 141, 75, 425, 412.8, 'M', 'M', 'M'],
  ['16', 650, 571.5, 20, '1-3/8', '1-1/4', 55.6, 144, 81, 483, 469.9, 'M', 'M', 'M'],
  ['18', 710, 628.6, 24, '1-3/8', '1-1/4', 58.8, 157, 87, 533, 533.4, 'M', 'M', 'M'],
  ['20', 775, 685.8, 24, '1-3/8', '1-1/4', 62.0, 160, 94, 587, 584.2, 'M', 'M', 'M'],
  ['24', 915, 812.8, 24, '1-5/8', '1-1/2', 68.3, 167, 105, 702, 692.2, 'M', 'M', 'M'],
];

const C600_DRILLING =
  'OD, bolt circle and bolt count as B16.5 Table 15; hole and bolt diameters from memory, agreeing with the part of the table that could be read';
const C600_BODY =
  'tf, Y, X and R from memory (the inch values converted); for Class 400 and above the 7 mm raised face is not included in tf or Y';

// Class 600: ASME B16.5 Table 15 drilling; NPS 3-1/2 left out (not an Nps here).
// prettier-ignore
const C600: readonly Raw[] = [
  ['1/2', 95, 66.7, 4, '5/8', '1/2', 14.3, 52, 22, 38, 34.9, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['3/4', 115, 82.6, 4, '3/4', '5/8', 15.9, 57, 25, 48, 42.9, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['1', 125, 88.9, 4, '3/4', '5/8', 17.5, 62, 27, 54, 50.8, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['1-1/4', 135, 98.4, 4, '3/4', '5/8', 20.7, 67, 29, 64, 63.5, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['1-1/2', 155, 114.3, 4, '7/8', '3/4', 22.3, 70, 32, 70, 73.0, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['2', 165, 127.0, 8, '3/4', '5/8', 25.4, 73, 37, 84, 92.1, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['2-1/2', 190, 149.2, 8, '7/8', '3/4', 28.6, 79, 41, 100, 104.8, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['3', 210, 168.3, 8, '7/8', '3/4', 31.8, 83, 46, 117, 127.0, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['4', 275, 215.9, 8, '1', '7/8', 38.1, 102, 54, 152, 157.2, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['5', 330, 266.7, 8, '1-1/8', '1', 44.5, 114, 60, 189, 185.7, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['6', 355, 292.1, 12, '1-1/8', '1', 47.7, 117, 67, 222, 215.9, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['8', 420, 349.2, 12, '1-1/4', '1-1/8', 55.6, 133, 76, 273, 269.9, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['10', 510, 431.8, 16, '1-3/8', '1-1/4', 63.5, 152, 86, 343, 323.8, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['12', 560, 489.0, 20, '1-3/8', '1-1/4', 66.7, 156, 92, 400, 381.0, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['14', 605, 527.0, 20, '1-1/2', '1-3/8', 69.9, 165, 94, 432, 412.8, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['16', 685, 603.2, 20, '1-5/8', '1-1/2', 76.2, 178, 106, 495, 469.9, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['18', 745, 654.0, 20, '1-3/4', '1-5/8', 82.6, 184, 117, 546, 533.4, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['20', 815, 723.9, 24, '1-3/4', '1-5/8', 88.9, 190, 127, 610, 584.2, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
  ['24', 940, 838.2, 24, '2', '1-7/8', 101.6, 203, 140, 718, 692.2, 'S~', 'M', 'M', `${C600_DRILLING}; ${C600_BODY}`],
];

/**
 * ASME B16.5 Class 150, 300 and 600 flange rows. Classes 150 and 300 follow the 2003+
 * raised-face convention (tf and Y exclude the 2 mm face); Class 600's tf and Y exclude its
 * 7 mm face in every edition.
 */
export const FLANGE_TABLE: Readonly<Record<150 | 300 | 600, readonly FlangeRow[]>> = {
  150: rows(C150),
  300: rows(C300),
  600: rows(C600),
};
