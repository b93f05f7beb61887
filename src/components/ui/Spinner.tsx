import { cn } from '../../lib/cn';

interface SpinnerProps {
  size?: 'sm' | 'md' | 'lg';
  /** Text for screen readers and, when not empty, shown beside the spinner. */
  label?: string;
  className?: string;
}

const sizes = { sm: 'h-4 w-4 border-2', md: 'h-6 w-6 border-2', lg: 'h-10 w-10 border-[3px]' };

/** A spinning ring; pass `label=""` inside buttons. */
export function Spinner({ size = 'md', label = 'Loading…', className }: SpinnerProps) {
  return (
    <span role="status" className={cn('inline-flex items-center gap-2 text-steel-600', className)}>
      <span
        aria-hidden="true"
        className={cn('inline-block animate-spin rounded-full border-current border-r-transparent', sizes[size])}
      />
      {label ? <span className="text-sm">{label}</span> : <span className="sr-only">Working…</span>}
    </span>
  );
}

/** A centred spinner for a region that is still loading. */
export function LoadingBlock({ label = 'Loading…' }: { label?: string }) {
  return (
    <div className="flex min-h-40 items-center justify-center p-8">
      <Spinner size="lg" label={label} />
    </div>
  );
}
