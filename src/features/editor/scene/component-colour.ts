import { SCENE_COLOURS } from './scene-palette';

/** State of a pickable mesh, for its colour. */
export type PickState = { selected: boolean; severity: 'error' | 'warning' | null };

/** The colour a mesh shows: selection first, then its worst issue, then its material colour. */
export function colourFor(state: PickState, base: string): string {
  if (state.selected) return SCENE_COLOURS.selected;
  if (state.severity === 'error') return SCENE_COLOURS.error;
  if (state.severity === 'warning') return SCENE_COLOURS.warning;
  return base;
}
