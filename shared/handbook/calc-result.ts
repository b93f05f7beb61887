/**
 * Result of a handbook or template calculation: the value, or a plain message saying
 * which input is unusable. Calculations return this instead of throwing or producing
 * NaN or negative lengths.
 */
export type Calc<T> = { ok: true; value: T } | { ok: false; message: string };

/** Wraps a value. */
export function ok<T>(value: T): Calc<T> {
  return { ok: true, value };
}

/** A failed calculation with its message. */
export function fail<T>(message: string): Calc<T> {
  return { ok: false, message };
}

/** Message for a length that must be a positive finite number of mm, or null when fine. */
export function positiveLengthProblem(name: string, value: unknown): string | null {
  if (typeof value !== 'number' || !Number.isFinite(value))
    return `${name} must be a number of mm (got ${String(value)})`;
  if (value <= 0) return `${name} must be more than 0 mm (got ${value})`;
  return null;
}
