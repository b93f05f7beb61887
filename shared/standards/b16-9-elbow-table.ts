import type { DataStatus } from './data-status';
import type { Nps } from './nps';

/** One tabulated mm value with its status. */
export type Cell = readonly [mm: number, status: DataStatus];

/** One NPS row of the ASME B16.9 elbow and return tables, mm (metric tables, not converted inches). */
export type ElbowRow = {
  nps: Nps;
  /** Long-radius 90° centre-to-end A. */
  lr90?: Cell;
  /** Long-radius 45° centre-to-end B. */
  lr45?: Cell;
  /** Short-radius 90° centre-to-end A (B16.9 starts SR at NPS 1). */
  sr90?: Cell;
  /** Long-radius 180° return centre-to-centre O and back-to-face K. */
  lr180?: { o: Cell; k: Cell };
  /** Short-radius 180° return centre-to-centre O and back-to-face K. */
  sr180?: { o: Cell; k: Cell };
};

/** Which table of the standard each column is (standard and table only, as users see it). */
export const ELBOW_SOURCES = {
  lr90: 'ASME B16.9 long-radius 90° elbows, centre-to-end A',
  lr45: 'ASME B16.9 long-radius 45° elbows, centre-to-end B',
  sr90: 'ASME B16.9 short-radius 90° elbows, centre-to-end A',
  lr180: 'ASME B16.9 long-radius 180° returns, O and K',
  sr180: 'ASME B16.9 short-radius 180° returns, O and K',
} as const;

/**
 * ASME B16.9 elbows and returns, mm. B16.9 tolerance on A and B is ±2 mm for NPS ½–24;
 * on O ±6 mm (NPS ≤ 8) or ±10 mm (NPS 10–24); on K ±6 mm.
 * Do not derive B from A·tan 22.5°: B16.9 45° elbows are longer than the pure arc.
 */
// prettier-ignore
export const ELBOW_TABLE: readonly ElbowRow[] = [
  // NPS 1/2 LR 90° A = 38, the same as NPS 1: a real anomaly of the table, not a typo.
  { nps: '1/2', lr90: [38, 'S'], lr45: [16, 'S'], lr180: { o: [76, 'S'], k: [48, 'S'] } },
  // NPS 3/4 is disputed between sources: LR 90° A 29 mm (1-1/8 in) in two sheets against 38.1 in one
  // catalogue; the 180° return O/K is 76/51 in one table (A = 38) and 57/43 in another (A = 29);
  // the 45° B is 19.1 in the catalogue and 11 from memory. Only A is carried, marked S~; the 45°
  // and the return are left out rather than guessed.
  { nps: '3/4', lr90: [29, 'S~'] },
  { nps: '1', lr90: [38, 'S'], lr45: [22, 'S'], sr90: [25, 'S'], lr180: { o: [76, 'S'], k: [56, 'S'] }, sr180: { o: [51, 'S'], k: [41, 'S'] } },
  { nps: '1-1/4', lr90: [48, 'S'], lr45: [25, 'S'], sr90: [32, 'S'], lr180: { o: [95, 'S'], k: [70, 'S'] }, sr180: { o: [64, 'S'], k: [52, 'S'] } },
  { nps: '1-1/2', lr90: [57, 'S'], lr45: [29, 'S'], sr90: [38, 'S'], lr180: { o: [114, 'S'], k: [83, 'S'] }, sr180: { o: [76, 'S'], k: [62, 'S'] } },
  { nps: '2', lr90: [76, 'S'], lr45: [35, 'S'], sr90: [51, 'S'], lr180: { o: [152, 'S'], k: [106, 'S'] }, sr180: { o: [102, 'S'], k: [81, 'S'] } },
  // NPS 2-1/2 LR 180° O: 190 in the return table, 191 in a maker's table (2 × 95.25).
  { nps: '2-1/2', lr90: [95, 'S'], lr45: [44, 'S'], sr90: [64, 'S'], lr180: { o: [190, 'S'], k: [132, 'S'] }, sr180: { o: [127, 'S'], k: [100, 'S'] } },
  { nps: '3', lr90: [114, 'S'], lr45: [51, 'S'], sr90: [76, 'S'], lr180: { o: [229, 'S'], k: [159, 'S'] }, sr180: { o: [152, 'S'], k: [121, 'S'] } },
  // NPS 4 LR 45° B: sources give 63.0 / 63.5 / 64; 64 is the B16.9 metric value from memory.
  { nps: '4', lr90: [152, 'S'], lr45: [64, 'M'], sr90: [102, 'S'], lr180: { o: [305, 'S'], k: [210, 'S'] }, sr180: { o: [203, 'S'], k: [159, 'S'] } },
  { nps: '5', lr90: [190, 'S'], lr45: [79, 'S'], sr90: [127, 'S'], lr180: { o: [381, 'S'], k: [262, 'S'] }, sr180: { o: [254, 'S'], k: [197, 'S'] } },
  { nps: '6', lr90: [229, 'S'], lr45: [95, 'S'], sr90: [152, 'S'], lr180: { o: [457, 'S'], k: [313, 'S'] }, sr180: { o: [305, 'S'], k: [237, 'S'] } },
  { nps: '8', lr90: [305, 'S'], lr45: [127, 'S'], sr90: [203, 'S'], lr180: { o: [610, 'S'], k: [414, 'S'] }, sr180: { o: [406, 'S'], k: [313, 'S'] } },
  { nps: '10', lr90: [381, 'S'], lr45: [159, 'S'], sr90: [254, 'S'], lr180: { o: [762, 'S'], k: [518, 'S'] }, sr180: { o: [508, 'S'], k: [391, 'S'] } },
  { nps: '12', lr90: [457, 'S'], lr45: [190, 'S'], sr90: [305, 'S'], lr180: { o: [914, 'S'], k: [619, 'S'] }, sr180: { o: [610, 'S'], k: [467, 'S'] } },
  { nps: '14', lr90: [533, 'S'], lr45: [222, 'S'], sr90: [356, 'S'], lr180: { o: [1067, 'S'], k: [711, 'S'] }, sr180: { o: [711, 'S'], k: [533, 'S'] } },
  { nps: '16', lr90: [610, 'S'], lr45: [254, 'S'], sr90: [406, 'S'], lr180: { o: [1219, 'S'], k: [813, 'S'] }, sr180: { o: [813, 'S'], k: [610, 'S'] } },
  { nps: '18', lr90: [686, 'S'], lr45: [286, 'S'], sr90: [457, 'S'], lr180: { o: [1372, 'S'], k: [914, 'S'] }, sr180: { o: [914, 'S'], k: [686, 'S'] } },
  { nps: '20', lr90: [762, 'S'], lr45: [318, 'S'], sr90: [508, 'S'], lr180: { o: [1524, 'S'], k: [1016, 'S'] }, sr180: { o: [1016, 'S'], k: [762, 'S'] } },
  // NPS 24 LR 90° A: 36 in = 914.4 mm; B16.9 metric 914.
  { nps: '24', lr90: [914, 'S'], lr45: [381, 'S'], sr90: [610, 'S'], lr180: { o: [1829, 'S'], k: [1219, 'S'] }, sr180: { o: [1219, 'S'], k: [914, 'S'] } },
];
