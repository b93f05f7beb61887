import type { ReactNode } from 'react';

/** A caution panel: the usual trade cautions, deferring to local codes and qualified people. */
export function SafetyNote({ title = 'Caution', children }: { title?: string; children: ReactNode }) {
  return (
    <aside
      aria-label={title}
      className="flex gap-3 rounded-lg border border-spark-500/40 bg-spark-100 px-4 py-3 text-sm text-ink-800"
    >
      <svg viewBox="0 0 24 24" aria-hidden="true" className="mt-0.5 h-5 w-5 shrink-0 text-spark-700">
        <path d="M12 3l10 18H2z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
        <path d="M12 10v5M12 17.5v.5" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <div>
        <p className="font-semibold">{title}</p>
        <div className="mt-1 space-y-1">{children}</div>
      </div>
    </aside>
  );
}
