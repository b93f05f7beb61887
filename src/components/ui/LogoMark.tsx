/**
 * Tackline's mark: two pipe ends meeting at a root gap, held across it by
 * three tack welds, on a weld-spark amber tile. Drawn for 16–48 px.
 */
export function LogoMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} role="img" aria-label="Tackline">
      <rect x="0" y="0" width="32" height="32" rx="7" fill="#f9ac35" />
      <rect x="3" y="10" width="10.5" height="12" rx="1.5" fill="#1b2631" />
      <rect x="18.5" y="10" width="10.5" height="12" rx="1.5" fill="#1b2631" />
      <path d="M14.4 8l3.2 3.2M14.4 14.4l3.2 3.2M14.4 20.8l3.2 3.2" stroke="#1b2631" strokeWidth="2" strokeLinecap="round" />
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
