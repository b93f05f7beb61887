import type { Cell } from './b16-9-elbow-table';
import type { DataStatus } from './data-status';
import type { Nps } from './nps';

/** Concentric/eccentric reducer length H (by large end) and the small ends B16.9 lists. */
export type ReducerRow = {
  large: Nps;
  h: Cell;
  smallEnds: readonly Nps[];
  /** Status of the small-end list (which combinations B16.9 makes). */
  smallEndsStatus: DataStatus;
};

/** Cap length E up to the limiting wall, E1 above it, mm. */
export type CapRow = { nps: Nps; e: Cell; e1: Cell; limitingWallMm: Cell };

/** Which table of the standard each lookup reads (standard and table only). */
export const REDUCER_CAP_SOURCES = {
  reducer: 'ASME B16.9 Table 11, reducers, end-to-end H',
  cap: 'ASME B16.9 Table 10, caps, length E / E1',
} as const;

/**
 * ASME B16.9 reducers, mm. H depends only on the large end. Tolerance on H ±2 mm (from memory).
 */
// prettier-ignore
export const REDUCER_TABLE: readonly ReducerRow[] = [
  { large: '3/4', h: [38, 'S'], smallEnds: ['1/2'], smallEndsStatus: 'S' },
  { large: '1', h: [51, 'S'], smallEnds: ['3/4', '1/2'], smallEndsStatus: 'S' },
  { large: '1-1/4', h: [51, 'S'], smallEnds: ['1', '3/4', '1/2'], smallEndsStatus: 'S' },
  { large: '1-1/2', h: [64, 'S'], smallEnds: ['1-1/4', '1', '3/4', '1/2'], smallEndsStatus: 'S' },
  { large: '2', h: [76, 'S'], smallEnds: ['1-1/2', '1-1/4', '1', '3/4'], smallEndsStatus: 'S' },
  { large: '2-1/2', h: [89, 'S'], smallEnds: ['2', '1-1/2', '1-1/4', '1'], smallEndsStatus: 'S' },
  { large: '3', h: [89, 'S'], smallEnds: ['2-1/2', '2', '1-1/2', '1-1/4'], smallEndsStatus: 'S' },
  { large: '4', h: [102, 'S'], smallEnds: ['3', '2-1/2', '2', '1-1/2'], smallEndsStatus: 'S' },
  { large: '5', h: [127, 'S'], smallEnds: ['4', '3', '2-1/2', '2'], smallEndsStatus: 'S' },
  { large: '6', h: [140, 'S'], smallEnds: ['5', '4', '3', '2-1/2'], smallEndsStatus: 'S' },
  { large: '8', h: [152, 'S'], smallEnds: ['6', '5', '4'], smallEndsStatus: 'S' },
  { large: '10', h: [178, 'S'], smallEnds: ['8', '6', '5', '4'], smallEndsStatus: 'S' },
  { large: '12', h: [203, 'M'], smallEnds: ['10', '8', '6', '5'], smallEndsStatus: 'M' },
  { large: '14', h: [330, 'M'], smallEnds: ['12', '10', '8', '6'], smallEndsStatus: 'M' },
  { large: '16', h: [356, 'M'], smallEnds: ['14', '12', '10', '8'], smallEndsStatus: 'M' },
  { large: '18', h: [381, 'M'], smallEnds: ['16', '14', '12', '10'], smallEndsStatus: 'M' },
  { large: '20', h: [508, 'M'], smallEnds: ['18', '16', '14', '12'], smallEndsStatus: 'M' },
  { large: '24', h: [508, 'M'], smallEnds: ['20', '18', '16', '14'], smallEndsStatus: 'M' },
];

/**
 * ASME B16.9 caps, mm. E applies to walls up to the limiting wall, E1 above it.
 * Tolerance on E: ±3 mm for NPS ≤ 4, ±6 mm for NPS 5–24.
 */
// prettier-ignore
export const CAP_TABLE: readonly CapRow[] = (
  [
    ['1/2', 25, 25, 4.57, 'S'], ['3/4', 25, 25, 3.81, 'S'], ['1', 38, 38, 4.57, 'S'],
    ['1-1/4', 38, 38, 4.83, 'S'], ['1-1/2', 38, 38, 5.08, 'S'], ['2', 38, 44, 5.59, 'S'],
    ['2-1/2', 38, 51, 7.11, 'S'], ['3', 51, 64, 7.62, 'S'], ['4', 64, 76, 8.64, 'S'],
    ['5', 76, 89, 9.65, 'S'], ['6', 89, 102, 10.92, 'S'], ['8', 102, 127, 12.7, 'S'],
    ['10', 127, 152, 12.7, 'S'], ['12', 152, 178, 12.7, 'S'], ['14', 165, 191, 12.7, 'S'],
    ['16', 178, 203, 12.7, 'S'], ['18', 203, 229, 12.7, 'S'], ['20', 229, 254, 12.7, 'S'],
    ['24', 267, 305, 12.7, 'S'],
  ] as const
).map(([nps, e, e1, wall, status]) => ({ nps, e: [e, status], e1: [e1, status], limitingWallMm: [wall, 'M'] }));
