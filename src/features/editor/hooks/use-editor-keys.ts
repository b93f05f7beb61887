import { useEffect, useEffectEvent, type RefObject } from 'react';
import { shortcutFor, type ShortcutAction } from '../panels/editor-shortcuts';

function isTextBox(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  const tag = target.tagName;
  if (tag === 'TEXTAREA' || tag === 'SELECT') return true;
  if (tag === 'INPUT') {
    const type = (target as HTMLInputElement).type;
    return !['checkbox', 'radio', 'button', 'submit'].includes(type);
  }
  return false;
}

/**
 * Routes key presses to editor actions while the editor is on the page and no dialog is
 * open. Escape leaves a text box first, so the next key is a command again.
 */
export function useEditorKeys(
  onAction: (action: ShortcutAction, event: KeyboardEvent) => void,
  options: { enabled?: boolean; scope?: RefObject<HTMLElement | null> } = {},
): void {
  const { enabled = true, scope } = options;
  const handle = useEffectEvent(onAction);
  useEffect(() => {
    if (!enabled) return;
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented) return;
      if (document.querySelector('dialog[open]')) return;
      const inBox = isTextBox(event.target);
      if (inBox && event.key === 'Escape') {
        (event.target as HTMLElement).blur();
        return;
      }
      const action = shortcutFor(event, inBox);
      if (!action) return;
      // Arrows and +/- scroll and zoom the page elsewhere: they move the camera only with the editor focused.
      if (/^(orbit|zoom)-/.test(action) && !(scope?.current && event.target instanceof Node && scope.current.contains(event.target))) return;
      event.preventDefault();
      handle(action, event);
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [enabled, scope]);
}
