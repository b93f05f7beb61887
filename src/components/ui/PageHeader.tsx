import type { ReactNode } from 'react';

interface PageHeaderProps {
  eyebrow?: ReactNode;
  title: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
}

/** Page title block: a small eyebrow line, the title, actions on the right (wrapping under on tablets). */
export function PageHeader({ eyebrow, title, actions, children }: PageHeaderProps) {
  return (
    <header className="flex flex-col gap-3 border-b border-steel-200 pb-4 md:flex-row md:items-end md:justify-between">
      <div className="min-w-0">
        {eyebrow ? <div className="text-sm font-medium text-steel-600">{eyebrow}</div> : null}
        <h1 className="truncate text-3xl font-bold text-ink-900 md:text-4xl">{title}</h1>
        {children}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}
