import type { Cell } from './b16-9-elbow-table';
import { NPS_VALUES, type Nps } from './nps';

const npsRank = (n: Nps) => NPS_VALUES.indexOf(n);

/** One tee of ASME B16.9, mm: run centre-to-end C and outlet centre-to-end M. */
export type TeeRow = { run: Nps; branch: Nps; c: Cell; m: Cell };

/** Which table of the standard each lookup reads (standard and table only). */
export const TEE_SOURCES = {
  straight: 'ASME B16.9 Table 8, straight tees, C = M',
  reducing: 'ASME B16.9 Table 8, reducing outlet tees, C and M',
} as const;

/**
 * Straight tees (run = branch), ASME B16.9, mm. Tolerance on C and M: ±2 mm for NPS ½–24.
 */
// prettier-ignore
export const STRAIGHT_TEE_TABLE: readonly TeeRow[] = (
  [
    ['1/2', 25, 'S'], ['3/4', 29, 'S'], ['1', 38, 'S'], ['1-1/4', 48, 'S'], ['1-1/2', 57, 'S'],
    ['2', 64, 'S'], ['2-1/2', 76, 'S'], ['3', 86, 'S'], ['4', 105, 'S'], ['5', 124, 'S'],
    ['6', 143, 'S'], ['8', 178, 'S'], ['10', 216, 'S'], ['12', 254, 'S'], ['14', 279, 'S'],
    ['16', 305, 'S'], ['18', 343, 'S'], ['20', 381, 'S'], ['24', 432, 'S'],
  ] as const
).map(([nps, mm, status]) => ({ run: nps, branch: nps, c: [mm, status], m: [mm, status] }));

/**
 * Reducing outlet tees, ASME B16.9, mm: C is the run's straight-tee value, M the outlet.
 * Only the outlet sizes B16.9 lists for each run (down three to five steps) are present.
 */
// prettier-ignore
export const REDUCING_TEE_TABLE: readonly TeeRow[] = (
  [
    ['3/4', '1/2', 29, 29],
    ['1', '3/4', 38, 38], ['1', '1/2', 38, 38],
    ['1-1/4', '1', 48, 48], ['1-1/4', '3/4', 48, 48], ['1-1/4', '1/2', 48, 48],
    ['1-1/2', '1-1/4', 57, 57], ['1-1/2', '1', 57, 57], ['1-1/2', '3/4', 57, 57], ['1-1/2', '1/2', 57, 57],
    ['2', '1-1/2', 64, 60], ['2', '1-1/4', 64, 57], ['2', '1', 64, 51], ['2', '3/4', 64, 44],
    ['2-1/2', '2', 76, 70], ['2-1/2', '1-1/2', 76, 67], ['2-1/2', '1-1/4', 76, 64], ['2-1/2', '1', 76, 57],
    ['3', '2-1/2', 86, 83], ['3', '2', 86, 76], ['3', '1-1/2', 86, 73], ['3', '1-1/4', 86, 70],
    ['4', '3', 105, 98], ['4', '2-1/2', 105, 95], ['4', '2', 105, 89], ['4', '1-1/2', 105, 86],
    ['5', '4', 124, 117], ['5', '3', 124, 111], ['5', '2-1/2', 124, 108], ['5', '2', 124, 105],
    ['6', '5', 143, 137], ['6', '4', 143, 130], ['6', '3', 143, 124], ['6', '2-1/2', 143, 121],
    ['8', '6', 178, 168], ['8', '5', 178, 162], ['8', '4', 178, 156],
    ['10', '8', 216, 203], ['10', '6', 216, 194], ['10', '5', 216, 191], ['10', '4', 216, 184],
    ['12', '10', 254, 241], ['12', '8', 254, 229], ['12', '6', 254, 219], ['12', '5', 254, 216],
    ['14', '12', 279, 270], ['14', '10', 279, 257], ['14', '8', 279, 248], ['14', '6', 279, 238],
    ['16', '14', 305, 305], ['16', '12', 305, 295], ['16', '10', 305, 283], ['16', '8', 305, 273], ['16', '6', 305, 264],
    ['18', '16', 343, 330], ['18', '14', 343, 330], ['18', '12', 343, 321], ['18', '10', 343, 308], ['18', '8', 343, 298],
    ['20', '18', 381, 368], ['20', '16', 381, 356], ['20', '14', 381, 356], ['20', '12', 381, 346], ['20', '10', 381, 333], ['20', '8', 381, 324],
    ['24', '20', 432, 419], ['24', '18', 432, 406], ['24', '16', 432, 397], ['24', '14', 432, 397], ['24', '12', 432, 381], ['24', '10', 432, 368],
  ] as const
).map(([run, branch, c, m]) => {
  // Sourced (a reproduction of the B16.9 metric Table 8) for runs up to NPS 12 with outlets down to NPS 6.
  const sourced = npsRank(run) < npsRank('12') || (run === '12' && npsRank(branch) >= npsRank('6'));
  const status = sourced ? ('S' as const) : ('M' as const);
  return { run, branch, c: [c, status], m: [m, status] };
});
