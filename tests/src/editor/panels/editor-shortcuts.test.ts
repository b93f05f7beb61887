import { describe, expect, it } from 'vitest';
import { SHORTCUTS, shortcutFor } from '../../../../src/features/editor/panels/editor-shortcuts';

const key = (k: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) => ({
  key: k,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  altKey: false,
  ...mods,
});

describe('shortcutFor', () => {
  it('maps undo and redo with Control or Command', () => {
    expect(shortcutFor(key('z', { ctrlKey: true }), false)).toBe('undo');
    expect(shortcutFor(key('Z', { metaKey: true, shiftKey: true }), false)).toBe('redo');
    expect(shortcutFor(key('y', { ctrlKey: true }), false)).toBe('redo');
  });

  it('maps the direction and tool letters, and leaves keys typed in a text box alone', () => {
    expect(shortcutFor(key('e'), false)).toBe('dir-east');
    expect(shortcutFor(key('U'), false)).toBe('dir-up');
    expect(shortcutFor(key('b'), false)).toBe('insert-set-on');
    expect(shortcutFor(key('Delete'), false)).toBe('delete');
    expect(shortcutFor(key('e'), true)).toBeNull();
    expect(shortcutFor(key('z', { ctrlKey: true }), true)).toBeNull();
    expect(shortcutFor(key('e', { altKey: true }), false)).toBeNull();
  });

  it('lists every action it can return in the keys dialog', () => {
    const listed = new Set(SHORTCUTS.map((s) => s.action));
    for (const k of ['e', 'w', 'n', 's', 'u', 'd', 't', 'b', 'k', 'r', 'f', 'Delete', 'Escape', ']', '[', '1', '2', '3', '4', 'l', '?']) {
      const action = shortcutFor(key(k), false);
      expect(action, k).not.toBeNull();
      expect(listed.has(action!), k).toBe(true);
    }
  });
});
