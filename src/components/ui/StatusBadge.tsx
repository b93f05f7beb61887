import { cn } from '../../lib/cn';

/** Colour families for states; every badge also carries its text label. */
export type StatusTone = 'draft' | 'issued' | 'work' | 'check' | 'done' | 'shipped' | 'hold' | 'muted';

const tones: Record<StatusTone, string> = {
  draft: 'bg-state-draft-bg text-state-draft-fg',
  issued: 'bg-state-issued-bg text-state-issued-fg',
  work: 'bg-state-work-bg text-state-work-fg',
  check: 'bg-state-check-bg text-state-check-fg',
  done: 'bg-state-done-bg text-state-done-fg',
  shipped: 'bg-state-shipped-bg text-state-shipped-fg',
  hold: 'bg-state-hold-bg text-state-hold-fg',
  muted: 'bg-steel-100 text-steel-600',
};

/** Glyphs differ by tone too, so the badge reads without colour (print, colour-blind users). */
function ToneGlyph({ tone }: { tone: StatusTone }) {
  const common = { className: 'h-2.5 w-2.5 shrink-0', viewBox: '0 0 10 10', 'aria-hidden': true } as const;
  switch (tone) {
    case 'hold':
      return (
        <svg {...common}>
          <rect x="1" y="1" width="3" height="8" fill="currentColor" />
          <rect x="6" y="1" width="3" height="8" fill="currentColor" />
        </svg>
      );
    case 'done':
    case 'shipped':
      return (
        <svg {...common}>
          <path d="M1 5.5l2.5 2.5L9 2" stroke="currentColor" strokeWidth="2" fill="none" />
        </svg>
      );
    case 'draft':
    case 'muted':
      return (
        <svg {...common}>
          <circle cx="5" cy="5" r="3.5" stroke="currentColor" strokeWidth="1.5" fill="none" />
        </svg>
      );
    default:
      return (
        <svg {...common}>
          <circle cx="5" cy="5" r="4" fill="currentColor" />
        </svg>
      );
  }
}

/** A status pill: glyph + label on a tone colour. */
export function StatusBadge({ tone, label, className }: { tone: StatusTone; label: string; className?: string }) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-xs font-semibold whitespace-nowrap',
        tones[tone],
        className,
      )}
    >
      <ToneGlyph tone={tone} />
      {label}
    </span>
  );
}
