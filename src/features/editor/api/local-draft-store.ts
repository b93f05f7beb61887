import { spoolDesignSchema, type SpoolDesign } from '../../../../shared/schemas/spool-design.schema';

/**
 * Unsaved designs kept in the browser, so a reload, a crash or a lost connection loses
 * nothing. Keyed by spool, draft and the draft version the edits were made on: a copy
 * made on an older version than the server's is a conflict, not a silent overwrite.
 */
const PREFIX = 'tackline.editor.unsaved';

/** One kept copy. */
export type LocalDraft = { spoolId: string; draftId: string; baseVersion: number; design: SpoolDesign; keptAt: string };

function key(spoolId: string, draftId: string, baseVersion: number): string {
  return `${PREFIX}:${spoolId}:${draftId}:v${baseVersion}`;
}

function storage(): Storage | null {
  try {
    return typeof window !== 'undefined' ? window.localStorage : null;
  } catch {
    return null; // private mode or storage disabled: saving to the server still works
  }
}

/** Keeps the design (replacing any older copy for this draft). */
export function keepLocalDraft(spoolId: string, draftId: string, baseVersion: number, design: SpoolDesign): void {
  const s = storage();
  if (!s) return;
  clearLocalDrafts(spoolId, draftId);
  const value: LocalDraft = { spoolId, draftId, baseVersion, design, keptAt: new Date().toISOString() };
  try {
    s.setItem(key(spoolId, draftId, baseVersion), JSON.stringify(value));
  } catch {
    // Quota exceeded: the server copy is the fallback; nothing else to do here.
  }
}

/** The kept copy for this draft, if any (validated; a corrupt copy is dropped). */
export function readLocalDraft(spoolId: string, draftId: string): LocalDraft | null {
  const s = storage();
  if (!s) return null;
  const prefix = `${PREFIX}:${spoolId}:${draftId}:v`;
  for (let i = 0; i < s.length; i++) {
    const k = s.key(i);
    if (!k || !k.startsWith(prefix)) continue;
    try {
      const raw = JSON.parse(s.getItem(k) ?? 'null') as Partial<LocalDraft> | null;
      const design = spoolDesignSchema.safeParse(raw?.design);
      if (raw && design.success && typeof raw.baseVersion === 'number') {
        return { spoolId, draftId, baseVersion: raw.baseVersion, design: design.data, keptAt: String(raw.keptAt ?? '') };
      }
    } catch {
      // fall through to removal
    }
    s.removeItem(k);
    return null;
  }
  return null;
}

/** Drops every kept copy of this draft (after a successful save). */
export function clearLocalDrafts(spoolId: string, draftId: string): void {
  const s = storage();
  if (!s) return;
  const prefix = `${PREFIX}:${spoolId}:${draftId}:`;
  const doomed: string[] = [];
  for (let i = 0; i < s.length; i++) {
    const k = s.key(i);
    if (k && k.startsWith(prefix)) doomed.push(k);
  }
  doomed.forEach((k) => s.removeItem(k));
}
