/** Length units a job can show: millimetres, or feet-inches to 1/16". */
export type LengthUnits = 'mm' | 'ft-in';

const MM_PER_INCH = 25.4;

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Formats inches as feet-inches with a fraction rounded to the nearest 1/16" (e.g. 1'-2 3/16"). */
export function formatFeetInches(totalInches: number): string {
  const sign = totalInches < 0 ? '-' : '';
  const sixteenths = Math.round(Math.abs(totalInches) * 16);
  const feet = Math.floor(sixteenths / (12 * 16));
  const restSixteenths = sixteenths - feet * 12 * 16;
  const wholeInches = Math.floor(restSixteenths / 16);
  const frac = restSixteenths % 16;
  let fraction = '';
  if (frac > 0) {
    const d = gcd(frac, 16);
    fraction = `${frac / d}/${16 / d}`;
  }
  const inchPart = fraction ? (wholeInches > 0 ? `${wholeInches} ${fraction}` : fraction) : String(wholeInches);
  return feet > 0 ? `${sign}${feet}'-${inchPart}"` : `${sign}${inchPart}"`;
}

/** Formats a millimetre value in the job's units, always with its unit. */
export function formatLength(mm: number, units: LengthUnits, mmDecimals = 1): string {
  if (!Number.isFinite(mm)) return '—';
  if (units === 'ft-in') return formatFeetInches(mm / MM_PER_INCH);
  const rounded = Number(mm.toFixed(mmDecimals));
  return `${rounded.toLocaleString('en-GB', { maximumFractionDigits: mmDecimals })} mm`;
}

/** Human label for a units setting. */
export function unitsLabel(units: LengthUnits): string {
  return units === 'mm' ? 'Millimetres (mm)' : 'Feet-inches (ft-in, 1/16")';
}
