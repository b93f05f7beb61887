/** Every editor action a key reaches. `keys` is in `aria-keyshortcuts` form. */
export type ShortcutAction =
  | 'undo'
  | 'redo'
  | 'dir-east'
  | 'dir-west'
  | 'dir-north'
  | 'dir-south'
  | 'dir-up'
  | 'dir-down'
  | 'insert-tee'
  | 'insert-set-on'
  | 'insert-socket'
  | 'insert-reducer'
  | 'make-flange'
  | 'delete'
  | 'deselect'
  | 'select-next'
  | 'select-previous'
  | 'view-iso'
  | 'view-plan'
  | 'view-elev-north'
  | 'view-elev-east'
  | 'toggle-labels'
  | 'orbit-left'
  | 'orbit-right'
  | 'orbit-up'
  | 'orbit-down'
  | 'zoom-in'
  | 'zoom-out'
  | 'help';

/** The key map, shown in the keys dialog and on button titles. */
export const SHORTCUTS: { action: ShortcutAction; keys: string; label: string }[] = [
  { action: 'undo', keys: 'Control+Z', label: 'Undo' },
  { action: 'redo', keys: 'Control+Shift+Z', label: 'Redo (also Control+Y)' },
  { action: 'dir-east', keys: 'E', label: 'Next run east, then type its length' },
  { action: 'dir-west', keys: 'W', label: 'Next run west' },
  { action: 'dir-north', keys: 'N', label: 'Next run north' },
  { action: 'dir-south', keys: 'S', label: 'Next run south' },
  { action: 'dir-up', keys: 'U', label: 'Next run up' },
  { action: 'dir-down', keys: 'D', label: 'Next run down' },
  { action: 'insert-tee', keys: 'T', label: 'Insert a tee on the selected run' },
  { action: 'insert-set-on', keys: 'B', label: 'Insert a set-on branch on the selected run' },
  { action: 'insert-socket', keys: 'K', label: 'Insert a socket (half coupling) on the selected run' },
  { action: 'insert-reducer', keys: 'R', label: 'Insert a reducer on the selected run' },
  { action: 'make-flange', keys: 'F', label: 'Make the selected open end a weld-neck flange' },
  { action: 'delete', keys: 'Delete', label: 'Delete the selection (and what hangs off it)' },
  { action: 'deselect', keys: 'Escape', label: 'Clear the selection' },
  { action: 'select-next', keys: ']', label: 'Select the next component' },
  { action: 'select-previous', keys: '[', label: 'Select the previous component' },
  { action: 'view-iso', keys: '1', label: 'Isometric view' },
  { action: 'view-plan', keys: '2', label: 'Plan view (north up)' },
  { action: 'view-elev-north', keys: '3', label: 'Elevation looking north' },
  { action: 'view-elev-east', keys: '4', label: 'Elevation looking east' },
  { action: 'toggle-labels', keys: 'L', label: 'Dimension labels on or off' },
  { action: 'orbit-left', keys: 'ArrowLeft', label: 'Turn the view 15° (click the model first, so the page does not scroll)' },
  { action: 'orbit-right', keys: 'ArrowRight', label: 'Turn the view 15° the other way' },
  { action: 'orbit-up', keys: 'ArrowUp', label: 'Look from higher (also ArrowDown: lower)' },
  { action: 'orbit-down', keys: 'ArrowDown', label: 'Look from lower' },
  { action: 'zoom-in', keys: '+', label: 'Zoom in (- zooms out)' },
  { action: 'zoom-out', keys: '-', label: 'Zoom out' },
  { action: 'help', keys: 'Shift+?', label: 'Show these keys' },
];

const SINGLE: Record<string, ShortcutAction> = {
  e: 'dir-east',
  w: 'dir-west',
  n: 'dir-north',
  s: 'dir-south',
  u: 'dir-up',
  d: 'dir-down',
  t: 'insert-tee',
  b: 'insert-set-on',
  k: 'insert-socket',
  r: 'insert-reducer',
  f: 'make-flange',
  delete: 'delete',
  backspace: 'delete',
  escape: 'deselect',
  ']': 'select-next',
  '[': 'select-previous',
  '1': 'view-iso',
  '2': 'view-plan',
  '3': 'view-elev-north',
  '4': 'view-elev-east',
  l: 'toggle-labels',
  arrowleft: 'orbit-left',
  arrowright: 'orbit-right',
  arrowup: 'orbit-up',
  arrowdown: 'orbit-down',
  '+': 'zoom-in',
  '=': 'zoom-in',
  '-': 'zoom-out',
  '?': 'help',
};

/**
 * The action a key press means, or null. Keys typed into a text box are the box's own,
 * except Escape. Control/Command+Z and +Y are undo and redo everywhere but text boxes.
 */
export function shortcutFor(event: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>, inTextBox: boolean): ShortcutAction | null {
  const key = event.key.toLowerCase();
  const mod = event.ctrlKey || event.metaKey;
  if (inTextBox) return null;
  if (mod && key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (mod && key === 'y') return 'redo';
  if (mod || event.altKey) return null;
  return SINGLE[key] ?? null;
}
