import { useEffect, useId, useRef, type ReactNode } from 'react';

interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  children: ReactNode;
  /** Wider dialogs for multi-column forms. */
  size?: 'md' | 'lg';
}

/**
 * A modal built on the native <dialog>: focus trapping, Escape and the top layer
 * come from the browser. Closing by Escape or the backdrop calls onClose.
 */
export function Dialog({ open, onClose, title, children, size = 'md' }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    if (open && !el.open) el.showModal();
    if (!open && el.open) el.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      onClick={(e) => {
        if (e.target === ref.current) onClose();
      }}
      className={
        'm-auto w-[calc(100%-2rem)] rounded-xl border border-steel-300 bg-white p-0 text-ink-900 shadow-2xl ' +
        (size === 'lg' ? 'max-w-3xl' : 'max-w-lg')
      }
    >
      {open ? (
        <div className="flex max-h-[85vh] flex-col">
          <div className="flex items-center justify-between gap-4 border-b border-steel-200 px-5 py-3">
            <h2 id={titleId} className="text-2xl font-semibold text-ink-900">
              {title}
            </h2>
            <button
              type="button"
              onClick={onClose}
              className="inline-flex h-11 w-11 items-center justify-center rounded-md text-steel-600 hover:bg-steel-100"
              aria-label="Close"
            >
              <svg viewBox="0 0 20 20" aria-hidden="true" className="h-5 w-5">
                <path d="M5 5l10 10M15 5L5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
              </svg>
            </button>
          </div>
          <div className="overflow-y-auto px-5 py-4">{children}</div>
        </div>
      ) : null}
    </dialog>
  );
}
