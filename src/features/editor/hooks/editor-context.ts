import { createContext, useContext } from 'react';
import type { LengthUnits } from '../../../../shared/units/length-format';
import type { EditorModel } from '../model/editor-model';

/** What every panel of one editor shares: its model and the job's display units. */
export type EditorContextValue = { model: EditorModel; units: LengthUnits };

export const EditorContext = createContext<EditorContextValue | null>(null);

/** The surrounding editor; panels only work inside one. */
export function useEditorContext(): EditorContextValue {
  const value = useContext(EditorContext);
  if (!value) throw new Error('Editor panels must be inside <EditorContext.Provider>');
  return value;
}
