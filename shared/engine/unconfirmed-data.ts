/**
 * Results that rest on standards values marked `M` (from memory, not yet checked against
 * the standard): collected while the take-offs are looked up, then reported as one
 * warning per distinct table value, naming the table, size and value.
 */
import type { DataStatus } from '../standards/data-status';
import { addWarning, type IssueSink } from './issues';

/** Table values from memory that a result used, keyed by what they are. */
export type UnconfirmedSink = Map<string, { standard: string; componentIds: string[] }>;

/** A new, empty sink. */
export function unconfirmedSink(): UnconfirmedSink {
  return new Map();
}

/**
 * Notes that `componentId` (node or run id) used `what` (e.g. "NPS 12 reducer length
 * H = 203 mm") from `standard` when `status` is `M`; other statuses are ignored.
 */
export function noteUnconfirmed(
  sink: UnconfirmedSink,
  status: DataStatus,
  what: string,
  standard: string,
  componentId: string,
): void {
  if (status !== 'M') return;
  const hit = sink.get(what);
  if (!hit) sink.set(what, { standard, componentIds: [componentId] });
  else if (!hit.componentIds.includes(componentId)) hit.componentIds.push(componentId);
}

/** Issues one `standard-data-unconfirmed` warning per noted value, on its first user. */
export function reportUnconfirmed(sink: UnconfirmedSink, issues: IssueSink): void {
  for (const [what, { standard, componentIds }] of sink) {
    const also = componentIds.length > 1 ? ` (used by ${componentIds.join(', ')})` : '';
    addWarning(
      issues,
      'standard-data-unconfirmed',
      `${what} is from memory, not yet checked against ${standard}: confirm before cutting${also}`,
      componentIds[0],
    );
  }
}

/** "12.7" from 12.7, "203" from 203.0: a table value as the sentence writes it. */
export function mmText(x: number): string {
  return `${Math.round(x * 100) / 100}`;
}
