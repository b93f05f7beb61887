import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router';
import { cn } from '../../lib/cn';
import { Spinner } from './Spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger';

const base =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 text-sm font-semibold transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-50 select-none whitespace-nowrap';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-spark-400 text-ink-950 hover:bg-spark-300 active:bg-spark-500 shadow-sm',
  secondary: 'border border-steel-300 bg-white text-ink-800 hover:bg-steel-50 active:bg-steel-100',
  ghost: 'text-ink-700 hover:bg-steel-200/60 active:bg-steel-200',
  danger: 'bg-danger-600 text-white hover:bg-danger-700',
};

/** Class names for a button-looking element, for links and labels. */
export function buttonClass(variant: ButtonVariant = 'secondary', extra?: string): string {
  return cn(base, variants[variant], extra);
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  busy?: boolean;
  icon?: ReactNode;
}

/** The app's button: 44 px tall for gloved or touch use; `busy` shows a spinner and blocks re-submits. */
export function Button({ variant = 'secondary', busy = false, icon, className, children, disabled, type, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      className={buttonClass(variant, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy ? <Spinner size="sm" label="" /> : icon}
      {children}
    </button>
  );
}

/** A router link styled as a button. */
export function ButtonLink({ variant = 'secondary', className, ...rest }: LinkProps & { variant?: ButtonVariant }) {
  return <Link className={buttonClass(variant, typeof className === 'string' ? className : undefined)} {...rest} />;
}
