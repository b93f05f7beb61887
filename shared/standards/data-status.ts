/**
 * How far a tabulated standards value can be trusted.
 *
 * - `S`  a published source states the value.
 * - `S~` a source states it, but the source is secondary, rounded differently or
 *        only confirms part of the row (the row's note says how).
 * - `C`  computed from confirmed values or a confirmed formula.
 * - `M`  from memory only, not yet confirmed against the standard. Consumers should
 *        show it as unconfirmed (the cut sheet flags it).
 */
export type DataStatus = 'S' | 'S~' | 'C' | 'M';

const RANK: Record<DataStatus, number> = { S: 3, 'S~': 2, C: 1, M: 0 };

/** The weaker of several statuses: a value is only as good as its weakest input. */
export function weakestStatus(...statuses: DataStatus[]): DataStatus {
  let weakest: DataStatus = 'S';
  for (const s of statuses) if (RANK[s] < RANK[weakest]) weakest = s;
  return weakest;
}

/** Plain words for a status, for tooltips and sheet footnotes. */
export const DATA_STATUS_LABEL: Record<DataStatus, string> = {
  S: 'published source',
  'S~': 'secondary source (see note)',
  C: 'computed from confirmed values',
  M: 'from memory, unconfirmed',
};
