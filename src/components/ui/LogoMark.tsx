/**
 * Tackline's mark: two pipe ends meeting at a root gap, held by three tack
 * welds (the amber stitches). Drawn for 16–48 px.
 */
export function LogoMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} role="img" aria-label="Tackline">
      <rect x="0" y="0" width="32" height="32" rx="7" fill="#1b2631" />
      <rect x="3" y="11" width="11" height="10" rx="1.5" fill="#b3bec9" />
      <rect x="18" y="11" width="11" height="10" rx="1.5" fill="#b3bec9" />
      <path d="M3 13h11M18 13h11" stroke="#e8ecf0" strokeWidth="1" opacity="0.7" />
      <path d="M14.2 8.5l3.6 3M14.2 14.5l3.6 3M14.2 20.5l3.6 3" stroke="#f9ac35" strokeWidth="2.2" strokeLinecap="round" />
    </svg>
  );
}

/** Mark plus the name set in the display face. */
export function Wordmark({ inverted = false }: { inverted?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2">
      <LogoMark className="h-8 w-8" />
      <span
        className={
          'font-display text-2xl font-bold uppercase tracking-[0.08em] ' + (inverted ? 'text-steel-50' : 'text-ink-900')
        }
      >
        Tack<span className="text-spark-400">line</span>
      </span>
    </span>
  );
}
