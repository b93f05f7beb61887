import type { Revision } from '../../../../shared/schemas/revision.schema';
import { revisionSchema } from '../../../../shared/schemas/revision.schema';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { ApiError } from '../../../lib/api-error';
import { saveDraft } from '../../spools/api/save-draft';

/** Outcome of one save: the stored draft, or a conflict carrying the version someone else stored. */
export type SaveOutcome = { ok: true; revision: Revision } | { ok: false; conflict: Revision } | { ok: false; error: unknown };

/**
 * PUTs the whole design on top of `version`. A 409 is not an error here: it comes back
 * as a conflict with the stored draft (from the response's `details.current`), so the
 * editor can show both and let the user choose.
 */
export async function saveDraftDesign(spoolId: string, design: SpoolDesign, version: number): Promise<SaveOutcome> {
  try {
    const revision = await saveDraft(spoolId, { design: design as unknown as Record<string, unknown>, version });
    return { ok: true, revision };
  } catch (error) {
    const conflict = conflictOf(error);
    if (conflict) return { ok: false, conflict };
    return { ok: false, error };
  }
}

/** The stored revision a 409 `stale_version` carries, or null. */
export function conflictOf(error: unknown): Revision | null {
  if (!(error instanceof ApiError) || !error.isStale) return null;
  const details = error.details as { current?: unknown } | undefined;
  const parsed = revisionSchema.safeParse(details?.current ?? details);
  return parsed.success ? parsed.data : null;
}
