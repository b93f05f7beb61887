import type { ReactNode } from 'react';
import { Button, type ButtonVariant } from './Button';
import { Dialog } from './Dialog';
import { InlineError } from './ErrorState';

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
  error?: unknown;
  tone?: Extract<ButtonVariant, 'primary' | 'danger'>;
}

/** "Are you sure?" for a step that is recorded or hard to undo; the safe choice is the plain button. */
export function ConfirmDialog({ open, title, children, confirmLabel, onConfirm, onCancel, busy, error, tone = 'primary' }: ConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onCancel} title={title}>
      <div className="text-sm text-ink-800">{children}</div>
      {error ? (
        <div className="mt-3">
          <InlineError error={error} />
        </div>
      ) : null}
      <div className="mt-4 flex justify-end gap-2">
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        <Button variant={tone} busy={busy} onClick={onConfirm}>
          {confirmLabel}
        </Button>
      </div>
    </Dialog>
  );
}
