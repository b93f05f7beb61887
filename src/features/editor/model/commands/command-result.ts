import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import { spoolDesignSchema } from '../../../../../shared/schemas/spool-design.schema';
import type { Selection } from '../editor-selection';

/**
 * What every editor command returns: a new design (the old one is never mutated) or a
 * plain-words error that leaves the design as it was.
 */
export type CommandResult =
  | {
      ok: true;
      design: SpoolDesign;
      /** Undo-stack label, e.g. "Extend 1,500 mm east". */
      label: string;
      /** What to select afterwards (the new tip, the inserted fitting…). */
      select?: Selection;
      /** Ids removed along with the target (a deleted branch's subtree), for the UI to say so. */
      removedIds?: string[];
    }
  | { ok: false; error: string };

/** A failed command. */
export function fail(error: string): CommandResult {
  return { ok: false, error };
}

/**
 * A successful command, after checking the new design against the document schema:
 * a command that would write an invalid document fails instead.
 */
export function done(
  design: SpoolDesign,
  label: string,
  extra: { select?: Selection; removedIds?: string[] } = {},
): CommandResult {
  const parsed = spoolDesignSchema.safeParse(design);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return fail(`That change would make an invalid design (${first?.path.join('.') ?? ''}: ${first?.message ?? 'invalid'})`);
  }
  // Keep the command's own objects (zod's output is a deep copy): unchanged nodes and runs
  // stay the same objects, so views memoised on them skip work.
  return { ok: true, design, label, ...extra };
}
