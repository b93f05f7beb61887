/**
 * Results that rest on standards values taken from a secondary source (status `S~`):
 * flagged to users as plainly as from-memory values (`unconfirmed-data.ts`), one
 * `standard-data-unconfirmed` warning per distinct component or pipe, on its first user.
 * The lookups put the plain note in their `source` sentence, so this reads it from there.
 */
import { SECONDARY_NOTE } from '../standards/data-status';
import { addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, RunPipe } from './node-analysis';

/** The table name part of a lookup's `source` ("ASME B16.5 Class 300 (…)" → "ASME B16.5 Class 300"). */
function tableName(source: string): string {
  const i = source.indexOf(' (');
  return i < 0 ? source : source.slice(0, i);
}

/** Adds one warning per distinct secondary-source value set a node or pipe used. */
export function reportSecondary(
  order: readonly string[],
  analyses: Map<string, NodeAnalysis>,
  pipes: Map<string, RunPipe>,
  issues: IssueSink,
): void {
  const seen = new Map<string, string[]>();
  const note = (key: string, id: string) => {
    const ids = seen.get(key);
    if (ids) {
      if (!ids.includes(id)) ids.push(id);
    } else seen.set(key, [id]);
  };
  for (const [runId, p] of pipes) {
    const src = p.dims?.source;
    if (p.nps && src?.includes(SECONDARY_NOTE))
      note(`NPS ${p.nps} ${p.schedule} pipe (${tableName(src)})`, runId);
  }
  for (const id of order) {
    const a = analyses.get(id);
    if (!a?.source?.includes(SECONDARY_NOTE)) continue;
    // The BOM wording has no orientation or height in it: one warning per kind and size.
    const what = a.bom ? `NPS ${a.bom.nps} ${a.bom.description}` : a.description;
    note(`${what} (${tableName(a.source)})`, id);
  }
  for (const [what, ids] of seen) {
    const also = ids.length > 1 ? ` (used by ${ids.join(', ')})` : '';
    addWarning(issues, 'standard-data-unconfirmed', `${what}: ${SECONDARY_NOTE}${also}`, ids[0]);
  }
}
