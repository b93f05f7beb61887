import type { ReactNode } from 'react';

interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

/** What a region shows when there is nothing in it yet, and what to do about it. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-lg border border-dashed border-steel-300 bg-steel-50 px-6 py-10 text-center">
      <svg aria-hidden="true" viewBox="0 0 48 24" className="h-6 w-12 text-steel-400">
        <path d="M2 12h44" stroke="currentColor" strokeWidth="2" strokeDasharray="4 5" fill="none" />
      </svg>
      <p className="font-display text-xl font-semibold text-ink-800">{title}</p>
      {children ? <div className="max-w-md text-sm text-steel-600">{children}</div> : null}
      {action}
    </div>
  );
}
