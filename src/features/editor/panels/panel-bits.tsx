import type { ReactNode, SelectHTMLAttributes, ButtonHTMLAttributes } from 'react';
import { cn } from '../../../lib/cn';

/** A titled block of a side panel. */
export function PanelSection({ title, children, actions }: { title: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="flex flex-col gap-2 border-b border-steel-200 pb-3 last:border-b-0">
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-base font-semibold text-ink-900">{title}</h3>
        {actions}
      </div>
      {children}
    </section>
  );
}

/** A read-only fact: label and value, values in mono so figures line up. */
export function Fact({ label, value, tone }: { label: string; value: ReactNode; tone?: 'warn' | 'bad' }) {
  return (
    <div className="flex items-baseline justify-between gap-3 text-sm">
      <dt className="text-steel-600">{label}</dt>
      <dd className={cn('text-right font-mono', tone === 'bad' ? 'text-danger-700' : tone === 'warn' ? 'text-spark-700' : 'text-ink-900')}>{value}</dd>
    </div>
  );
}

/** A small labelled native select. */
export function SmallSelect({
  label,
  options,
  className,
  ...rest
}: SelectHTMLAttributes<HTMLSelectElement> & { label: string; options: readonly { value: string; label: string }[] }) {
  return (
    <label className={cn('flex flex-col gap-0.5 text-xs font-semibold text-ink-700', className)}>
      {label}
      <select {...rest} className="min-h-10 rounded-md border border-steel-300 bg-white px-2 text-sm font-normal text-ink-900 disabled:bg-steel-100">
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A compact button for panel actions. */
export function PanelButton({
  tone = 'plain',
  className,
  children,
  ...rest
}: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: 'plain' | 'primary' | 'danger' }) {
  return (
    <button
      type="button"
      {...rest}
      className={cn(
        'inline-flex min-h-10 items-center justify-center gap-1.5 rounded-md px-3 text-sm font-semibold disabled:cursor-not-allowed disabled:opacity-50',
        tone === 'primary' && 'bg-spark-400 text-ink-950 hover:bg-spark-300',
        tone === 'danger' && 'border border-danger-600 bg-white text-danger-700 hover:bg-danger-50',
        tone === 'plain' && 'border border-steel-300 bg-white text-ink-800 hover:bg-steel-50',
        className,
      )}
    >
      {children}
    </button>
  );
}

/** Size options for selects: every NPS Tackline has tables for. */
export function npsOptions(values: readonly string[]): { value: string; label: string }[] {
  return values.map((v) => ({ value: v, label: `NPS ${v}` }));
}
