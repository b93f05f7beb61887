import { useSyncExternalStore } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { EditorModel, EditorSnapshot } from '../model/editor-model';

/** The model's snapshot, re-rendering on each change (the thin React bridge). */
export function useEditorSnapshot(model: EditorModel): EditorSnapshot {
  return useSyncExternalStore(model.subscribe, model.getSnapshot, model.getSnapshot);
}

/**
 * The engine result for the snapshot's design. The model computes once per design and
 * engine setting and returns the same object until either changes, so calling it on
 * every render is free.
 */
export function useEditorResult(model: EditorModel, snapshot: EditorSnapshot): SpoolResult | null {
  return snapshot.design ? model.getResult() : null;
}
