import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { Revision } from '../../../../shared/schemas/revision.schema';
import { spoolDesignSchema, type SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { spoolKeys } from '../../spools/api/spool-keys';
import { clearLocalDrafts, keepLocalDraft } from '../api/local-draft-store';
import { saveDraftDesign } from '../api/save-draft-design';
import type { EditorModel } from '../model/editor-model';

/** Where the design stands against the server. */
export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error' | 'off';

/** A conflict: this browser's design against the one someone stored meanwhile. */
export type DraftConflict = { mine: SpoolDesign; theirs: Revision; theirsDesign: SpoolDesign | null };

/** Quiet time after the last edit before saving, ms. */
const AUTOSAVE_DELAY_MS = 800;

/**
 * Saves the editor's design to the spool's working draft a moment after each change,
 * with optimistic locking on the draft version. Every change is also kept in local
 * storage until the server has it. On a 409 autosave stops and the conflict is offered
 * to the user: keep mine (saved on top of theirs) or take theirs (mine stays on undo).
 */
export function useDraftAutosave({
  model,
  spoolId,
  draft,
  enabled,
}: {
  model: EditorModel;
  spoolId: string;
  /** The draft being edited and the version it was loaded at (null: nothing to save to). */
  draft: { id: string; version: number } | null;
  enabled: boolean;
}) {
  const queryClient = useQueryClient();
  // What the server holds is saved until an edit says otherwise; 'off' is derived below.
  const [status, setStatus] = useState<SaveStatus>('saved');
  const [error, setError] = useState<unknown>(null);
  const [conflict, setConflict] = useState<DraftConflict | null>(null);
  const versionRef = useRef(draft?.version ?? 0);
  const savedRevisionRef = useRef(model.getSnapshot().designRevision);
  const timerRef = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlightRef = useRef<Promise<boolean> | null>(null);
  const conflictRef = useRef(false);
  const draftId = draft?.id ?? null;

  // A new draft (or the first load) resets what counts as saved.
  useEffect(() => {
    versionRef.current = draft?.version ?? 0;
    savedRevisionRef.current = model.getSnapshot().designRevision;
    // Only the draft's identity matters here; its version moves with our own saves.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [draftId, enabled, model]);

  const saveNow = useCallback(async (): Promise<boolean> => {
    if (!enabled || !draftId || conflictRef.current) return false;
    if (timerRef.current) clearTimeout(timerRef.current);
    if (inFlightRef.current) await inFlightRef.current;
    const snap = model.getSnapshot();
    if (!snap.design) return false;
    if (snap.designRevision === savedRevisionRef.current) return true;
    const revisionAtSend = snap.designRevision;
    setStatus('saving');
    const run = (async () => {
      const outcome = await saveDraftDesign(spoolId, snap.design!, versionRef.current);
      if (outcome.ok) {
        versionRef.current = outcome.revision.version;
        savedRevisionRef.current = revisionAtSend;
        queryClient.setQueryData(spoolKeys.revision(spoolId, outcome.revision.id), outcome.revision);
        void queryClient.invalidateQueries({ queryKey: spoolKeys.detail(spoolId), exact: true });
        const now = model.getSnapshot();
        const stillDirty = now.designRevision !== revisionAtSend;
        // Edits made while this save was in flight sit on top of the new version now.
        if (stillDirty && now.design) keepLocalDraft(spoolId, draftId, versionRef.current, now.design);
        else clearLocalDrafts(spoolId, draftId);
        setError(null);
        setStatus(stillDirty ? 'unsaved' : 'saved');
        return true;
      }
      if ('conflict' in outcome) {
        conflictRef.current = true;
        const parsed = spoolDesignSchema.safeParse(outcome.conflict.design);
        setConflict({ mine: snap.design!, theirs: outcome.conflict, theirsDesign: parsed.success ? parsed.data : null });
        setStatus('conflict');
        return false;
      }
      setError(outcome.error);
      setStatus('error');
      return false;
    })();
    inFlightRef.current = run;
    try {
      return await run;
    } finally {
      inFlightRef.current = null;
    }
  }, [enabled, draftId, model, spoolId, queryClient]);

  // Watch the model: keep a local copy at once, save after a quiet moment.
  useEffect(() => {
    if (!enabled || !draftId) return;
    return model.subscribe(() => {
      const snap = model.getSnapshot();
      if (snap.designRevision === savedRevisionRef.current || !snap.design) return;
      keepLocalDraft(spoolId, draftId, versionRef.current, snap.design);
      if (conflictRef.current) return;
      setStatus((s) => (s === 'saving' ? s : 'unsaved'));
      if (timerRef.current) clearTimeout(timerRef.current);
      timerRef.current = setTimeout(() => void saveNow(), AUTOSAVE_DELAY_MS);
    });
  }, [enabled, draftId, model, spoolId, saveNow]);

  // Saved work must not be lost to a closed tab: warn while something is unsaved.
  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (model.getSnapshot().designRevision !== savedRevisionRef.current && enabled) e.preventDefault();
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload);
      if (timerRef.current) clearTimeout(timerRef.current);
    };
  }, [model, enabled]);

  /** Saves this browser's design on top of the stored one. */
  const keepMine = useCallback(async () => {
    if (!conflict) return;
    versionRef.current = conflict.theirs.version;
    conflictRef.current = false;
    setConflict(null);
    savedRevisionRef.current = -1; // force a save even if nothing changed since
    await saveNow();
  }, [conflict, saveNow]);

  /** Loads the stored design; this browser's stays one undo step away. */
  const takeTheirs = useCallback(() => {
    if (!conflict?.theirsDesign) return;
    versionRef.current = conflict.theirs.version;
    model.replaceDesign(conflict.theirsDesign, { undoable: true, label: 'Take the stored version' });
    savedRevisionRef.current = model.getSnapshot().designRevision;
    if (draftId) clearLocalDrafts(spoolId, draftId);
    conflictRef.current = false;
    setConflict(null);
    setStatus('saved');
  }, [conflict, model, draftId, spoolId]);

  /** Opens a conflict found at load time (a kept local copy made on an older version). */
  const raiseConflict = useCallback((mine: SpoolDesign, theirs: Revision) => {
    const parsed = spoolDesignSchema.safeParse(theirs.design);
    conflictRef.current = true;
    setConflict({ mine, theirs, theirsDesign: parsed.success ? parsed.data : null });
    setStatus('conflict');
  }, []);

  return { status: enabled && draftId ? status : ('off' as SaveStatus), error, conflict, saveNow, keepMine, takeTheirs, raiseConflict, version: () => versionRef.current };
}
