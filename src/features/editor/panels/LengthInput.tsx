import { forwardRef, useEffect, useId, useState } from 'react';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { parseLength } from '../../../../shared/units/length-parse';
import { cn } from '../../../lib/cn';

/**
 * A length typed the way the tape reads: millimetres or feet-inches (`1500`, `1.5 m`,
 * `4'-11 1/16"`). A bare number takes the job's units. Shows the reading back in the
 * job's units and the parser's message when it cannot read the text.
 */
export const LengthInput = forwardRef<
  HTMLInputElement,
  {
    label: string;
    units: LengthUnits;
    /** Current value, mm (null: empty). */
    valueMm: number | null;
    /** Called with mm when the text reads as a length (on every valid keystroke when `live`). */
    onChange: (mm: number | null) => void;
    onEnter?: () => void;
    disabled?: boolean;
    compact?: boolean;
    hint?: string;
    name?: string;
  }
>(function LengthInput({ label, units, valueMm, onChange, onEnter, disabled, compact, hint, name }, ref) {
  const id = useId();
  const [text, setText] = useState(valueMm === null ? '' : plain(valueMm, units));
  const [message, setMessage] = useState<string | null>(null);

  // Follow outside changes (another selection, undo) unless the text already means that value.
  useEffect(() => {
    const parsed = parseLength(text, units);
    if (valueMm === null) return;
    if (!parsed.ok || Math.abs(parsed.mm - valueMm) > 0.01) {
      setText(plain(valueMm, units));
      setMessage(null);
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [valueMm, units]);

  return (
    <div className={cn('flex flex-col gap-0.5', compact ? 'min-w-28' : '')}>
      <label htmlFor={id} className="text-xs font-semibold text-ink-700">
        {label}
      </label>
      <input
        ref={ref}
        id={id}
        name={name}
        inputMode="decimal"
        autoComplete="off"
        disabled={disabled}
        value={text}
        aria-invalid={message ? true : undefined}
        aria-describedby={`${id}-note`}
        onChange={(e) => {
          const t = e.target.value;
          setText(t);
          if (t.trim() === '') {
            setMessage(null);
            onChange(null);
            return;
          }
          const parsed = parseLength(t, units);
          if (parsed.ok) {
            setMessage(null);
            onChange(parsed.mm);
          } else {
            setMessage(parsed.message);
            onChange(null);
          }
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && onEnter) {
            e.preventDefault();
            onEnter();
          }
        }}
        className={cn(
          'min-h-10 w-full rounded-md border bg-white px-2 font-mono text-sm text-ink-900 focus:border-spark-500 focus:outline-none focus:ring-2 focus:ring-spark-300 disabled:bg-steel-100',
          message ? 'border-danger-600' : 'border-steel-300',
        )}
      />
      <p id={`${id}-note`} className={cn('min-h-4 text-[11px] leading-4', message ? 'text-danger-700' : 'text-steel-600')}>
        {message ?? (valueMm !== null && text.trim() !== '' ? `= ${formatLength(valueMm, units)}` : (hint ?? (units === 'mm' ? 'mm, or ft-in like 4\'-11 1/16"' : 'ft-in, or mm like 1500 mm')))}
      </p>
    </div>
  );
});

/** A value as editable text: plain mm, or feet-inches as the formatter writes them. */
function plain(mm: number, units: LengthUnits): string {
  if (units === 'ft-in') return formatLength(mm, 'ft-in');
  return String(Math.round(mm * 10) / 10);
}
