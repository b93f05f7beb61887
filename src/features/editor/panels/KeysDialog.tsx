import { Dialog } from '../../../components/ui/Dialog';
import { SHORTCUTS } from './editor-shortcuts';

const KEY_TEXT: Record<string, string> = { ArrowLeft: '←', ArrowRight: '→', ArrowUp: '↑', ArrowDown: '↓', 'Shift+?': '?' };

/** A key as people read it: Ctrl+Z, ←. */
function keyText(keys: string): string {
  return KEY_TEXT[keys] ?? keys.replace('Control', 'Ctrl');
}

/** Every key the editor answers to. */
export function KeysDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} title="Editor keys">
      <table className="w-full text-sm">
        <tbody>
          {SHORTCUTS.map((s) => (
            <tr key={s.action} className="border-t border-steel-200">
              <td className="py-1.5 pr-3">
                <kbd className="rounded border border-steel-300 bg-steel-50 px-1.5 py-0.5 font-mono text-xs">{keyText(s.keys)}</kbd>
              </td>
              <td className="py-1.5">{s.label}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-3 text-xs text-steel-600">Direction keys choose the next run's direction and put the cursor in the length box; Enter adds the run.</p>
    </Dialog>
  );
}
