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

/** What users are told when a value rests on memory (status `M`). */
export const UNCONFIRMED_NOTE = 'dimension not yet confirmed against the standard: check before cutting';

/** What users are told when a value was taken from a secondary source (status `S~`). */
export const SECONDARY_NOTE =
  'dimension taken from a secondary source, not yet confirmed against the standard: check before cutting';

/** The plain warning for a status, or null when the value is confirmed (`S`, `C`). */
export function statusWarning(status: DataStatus): string | null {
  return status === 'M' ? UNCONFIRMED_NOTE : status === 'S~' ? SECONDARY_NOTE : null;
}

/**
 * A table's name as users see it ("ASME B16.5 Class 150"), with the plain warning for
 * `status` after it when the value is not confirmed.
 */
export function withStatusNote(tableName: string, status: DataStatus): string {
  const w = statusWarning(status);
  return w ? `${tableName} (${w})` : tableName;
}
