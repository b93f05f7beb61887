import { useId, useState } from 'react';
import { formatLength, formatMm, type LengthUnits } from '../../../shared/units/length-format';
import { parseLength } from '../../../shared/units/length-parse';
import { cn } from '../../lib/cn';

interface LengthFieldProps {
  label: string;
  /** The stored value, always millimetres. */
  valueMm: number;
  /** Called with millimetres, or NaN while the text is not a length (the schema then refuses it). */
  onChangeMm: (mm: number) => void;
  onBlur?: () => void;
  /** Units the person types and reads in (a bare number means mm, or inches in ft-in). */
  units: LengthUnits;
  hint?: string;
  error?: string;
  name?: string;
}

function display(mm: number, units: LengthUnits): string {
  if (!Number.isFinite(mm)) return '';
  return units === 'mm' ? String(Number(mm.toFixed(2))) : formatLength(mm, 'ft-in');
}

/**
 * A length typed the way the tape reads: millimetres (`2.4`, `2.4 mm`) or
 * feet-inches (`1/8"`, `1'-3 1/2"`), stored as millimetres. The other unit is
 * echoed underneath so a slip (inches typed as mm) shows at once.
 */
export function LengthField({ label, valueMm, onChangeMm, onBlur, units, hint, error, name }: LengthFieldProps) {
  const id = useId();
  const [text, setText] = useState(() => display(valueMm, units));
  const [shownUnits, setShownUnits] = useState(units);
  const [parseError, setParseError] = useState<string | null>(null);

  // The job's units changed: show the same length in the new units.
  if (units !== shownUnits) {
    setShownUnits(units);
    setText(display(valueMm, units));
    setParseError(null);
  }

  const message = parseError ?? error;
  const echo = Number.isFinite(valueMm) && !parseError ? (units === 'mm' ? `≈ ${formatLength(valueMm, 'ft-in')}` : `= ${formatMm(valueMm)}`) : null;

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink-800">
        {label}
      </label>
      <div className="relative">
        <input
          id={id}
          name={name}
          type="text"
          inputMode={units === 'mm' ? 'decimal' : 'text'}
          autoComplete="off"
          spellCheck={false}
          value={text}
          aria-invalid={message ? true : undefined}
          aria-describedby={`${id}-note`}
          onChange={(e) => {
            const next = e.target.value;
            setText(next);
            const parsed = parseLength(next, units);
            setParseError(parsed.ok ? null : parsed.message);
            onChangeMm(parsed.ok ? parsed.mm : Number.NaN);
          }}
          onBlur={onBlur}
          className={cn(
            'block min-h-11 w-full rounded-md border bg-white px-3 pr-14 font-mono text-base text-ink-900',
            'focus:border-spark-500 focus:outline-none focus:ring-2 focus:ring-spark-300',
            message ? 'border-danger-600' : 'border-steel-300',
          )}
        />
        <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center font-mono text-sm text-steel-500">
          {units === 'mm' ? 'mm' : 'ft-in'}
        </span>
      </div>
      <p id={`${id}-note`} className={cn('text-xs', message ? 'text-sm text-danger-700' : 'text-steel-600')}>
        {message ?? [echo, hint].filter(Boolean).join(' · ')}
      </p>
    </div>
  );
}
