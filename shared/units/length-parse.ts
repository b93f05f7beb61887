import { MM_PER_INCH, type LengthUnits } from './length-format';

/** Result of reading a typed length. */
export type ParsedLength = { ok: true; mm: number } | { ok: false; message: string };

const NUM = String.raw`(?:\d+(?:\.\d*)?|\.\d+)`;
const METRIC = new RegExp(String.raw`^(${NUM})\s*(mm|cm|m)?$`);
const FEET = new RegExp(String.raw`^(${NUM})\s*(?:'|ft|feet|foot)\s*(?:-\s*)?(.*)$`);
const INCH_MARK = String.raw`(?:"|in|inch|inches)`;
// Whole and fraction ("3-1/2", "3 1/2"), fraction alone ("1/2") or a number ("15.5").
const INCHES = new RegExp(
  String.raw`^(?:(\d+)(?:\s*-\s*|\s+)(\d+)\s*/\s*(\d+)|(\d+)\s*/\s*(\d+)|(${NUM}))\s*(${INCH_MARK})?$`,
);

const EXAMPLES = `e.g. 394.5 mm, 0.3945 m, 1'-3 1/2" or 15.5"`;

/**
 * Reads a length as people type it and returns millimetres.
 *
 * Accepts millimetres and metres (`394.5`, `394.5 mm`, `39.45 cm`, `0.3945 m`) and
 * feet-inches (`1' 3-1/2"`, `1'-3 1/2"`, `1'3.5"`, `15.5"`, `15 1/2`, `3'`, `1/2"`, `3 ft 2 in`).
 * A leading minus makes the length negative; a dash after the feet is only a separator.
 * A bare number takes `defaultUnits`: millimetres, or inches when the user works in
 * feet-inches. A bare fraction means inches, so in mm it asks for an inch mark.
 */
export function parseLength(text: string, defaultUnits: LengthUnits): ParsedLength {
  const raw = normalise(text);
  if (raw === '') return { ok: false, message: 'Enter a length' };
  // "1,200" could be 1200 or 1.2: refuse rather than guess.
  if (raw.includes(',')) {
    return {
      ok: false,
      message: `"${text.trim()}" has a comma: use a point for decimals and no thousands separators`,
    };
  }
  let sign = 1;
  let body = raw;
  const signMatch = /^([-+])\s*/.exec(body);
  if (signMatch) {
    sign = signMatch[1] === '-' ? -1 : 1;
    body = body.slice(signMatch[0].length);
  }
  if (body === '') return { ok: false, message: `"${text.trim()}" has a sign but no number` };

  const metric = METRIC.exec(body);
  if (metric) {
    const value = Number(metric[1]);
    const unit = metric[2] ?? (defaultUnits === 'mm' ? 'mm' : 'in');
    const factor = unit === 'm' ? 1000 : unit === 'cm' ? 10 : unit === 'mm' ? 1 : MM_PER_INCH;
    return finite(sign * value * factor, text);
  }

  const feet = FEET.exec(body);
  if (feet) {
    const ft = Number(feet[1]);
    const rest = (feet[2] ?? '').trim();
    if (rest === '') return finite(sign * ft * 12 * MM_PER_INCH, text);
    const inches = readInches(rest);
    if (!inches.ok) return inches.message ? { ok: false, message: inches.message } : junk(text);
    if (inches.value >= 12) {
      return {
        ok: false,
        message: `"${text.trim()}" has ${inches.value} inches after the feet: inches after feet must be under 12`,
      };
    }
    return finite(sign * (ft * 12 + inches.value) * MM_PER_INCH, text);
  }

  const inches = readInches(body);
  if (inches.ok) {
    if (!inches.marked && inches.fraction && defaultUnits === 'mm') {
      return {
        ok: false,
        message: `"${text.trim()}" has a fraction, which means inches: add " to enter inches, or type millimetres as a decimal`,
      };
    }
    return finite(sign * inches.value * MM_PER_INCH, text);
  }
  if (inches.message) return { ok: false, message: inches.message };
  return junk(text);
}

type InchRead =
  { ok: true; value: number; fraction: boolean; marked: boolean } | { ok: false; message?: string };

function readInches(text: string): InchRead {
  const m = INCHES.exec(text);
  if (!m) return { ok: false };
  const marked = m[7] !== undefined;
  if (m[6] !== undefined) return { ok: true, value: Number(m[6]), fraction: false, marked };
  const whole = m[1] !== undefined ? Number(m[1]) : 0;
  const num = Number(m[2] ?? m[4]);
  const den = Number(m[3] ?? m[5]);
  if (den === 0)
    return { ok: false, message: `${num}/${den} is not a fraction: the bottom number cannot be 0` };
  if (m[1] !== undefined && num >= den) {
    return {
      ok: false,
      message: `${num}/${den} after a whole number must be less than 1 (write ${whole + Math.floor(num / den)} ${num % den}/${den})`,
    };
  }
  return { ok: true, value: whole + num / den, fraction: true, marked };
}

function normalise(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\u2032\u2019\u2018`´]/g, "'")
    .replace(/[\u2033\u201c\u201d]|''/g, '"')
    .replace(/\u2212|\u2013|\u2014/g, '-')
    .replace(/\s+/g, ' ')
    .replace(/\s*(ft|feet|foot)\s*/g, ' ft ')
    .replace(/ ft (?=\d)/g, "'")
    .replace(/ ft $/, "'")
    .trim();
}

function finite(mm: number, text: string): ParsedLength {
  if (!Number.isFinite(mm)) return { ok: false, message: `"${text.trim()}" is too large to be a length` };
  return { ok: true, mm: mm === 0 ? 0 : mm };
}

function junk(text: string): ParsedLength {
  return { ok: false, message: `Could not read "${text.trim()}" as a length: type it ${EXAMPLES}` };
}
