/** Millimetres per inch, exact by definition. */
export const MM_PER_INCH = 25.4;

/** Display units a user can choose: millimetres, or feet-inches to 1/16 in. */
export type LengthUnits = 'mm' | 'ft-in';

/** What a formatter prints for a value that is not a finite number. */
export const INVALID_LENGTH_TEXT = '—';

/**
 * Formats millimetres with a fixed number of decimals and the unit: `394.5 mm`.
 * A result that rounds to zero prints without a minus sign. Non-finite input prints `—`.
 */
export function formatMm(mm: number, decimals = 1): string {
  if (!Number.isFinite(mm)) return INVALID_LENGTH_TEXT;
  const places = Math.max(0, Math.min(6, Math.trunc(decimals)));
  const text = mm.toFixed(places);
  const clean = Number(text) === 0 ? (0).toFixed(places) : text;
  return `${clean} mm`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * Formats millimetres as feet-inches to the nearest 1/16 in, fractions reduced:
 * `1'-3 1/2"`, `1'-0"` (never `12"`), `11 15/16"` under a foot, `1/16"`, `0"`.
 * Negative values get a leading minus (`-1'-3 1/2"`). Non-finite input prints `—`.
 */
export function formatFtIn(mm: number): string {
  if (!Number.isFinite(mm)) return INVALID_LENGTH_TEXT;
  // The nudge keeps exact halves (3/32" = 2.38125 mm) rounding up: mm → in division
  // lands a hair under .5 in binary floating point.
  const sixteenths = Math.round((Math.abs(mm) / MM_PER_INCH) * 16 + 1e-9);
  if (sixteenths === 0) return '0"';
  const sign = mm < 0 ? '-' : '';
  const feet = Math.floor(sixteenths / 192);
  const rest = sixteenths % 192;
  const inches = Math.floor(rest / 16);
  const num = rest % 16;
  let fraction = '';
  if (num > 0) {
    const g = gcd(num, 16);
    fraction = `${num / g}/${16 / g}`;
  }
  const inchText = fraction ? (inches > 0 ? `${inches} ${fraction}` : fraction) : String(inches);
  if (feet === 0) return `${sign}${inchText}"`;
  // Under a foot the inches read alone; with feet, "0" keeps the usual 1'-0 1/2" shape.
  const withFeetInches = fraction && inches === 0 ? `0 ${fraction}` : inchText;
  return `${sign}${feet}'-${withFeetInches}"`;
}

/** Formats a length in the chosen units: {@link formatMm} (1 decimal) or {@link formatFtIn}. */
export function formatLength(mm: number, units: LengthUnits): string {
  return units === 'mm' ? formatMm(mm) : formatFtIn(mm);
}
