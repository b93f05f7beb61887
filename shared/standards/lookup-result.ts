/**
 * Result of a standards-table lookup. A size or combination with no data is a
 * miss carrying a plain sentence naming what is missing, never a guessed value.
 *
 * @example { ok: false, missing: 'No ASME B16.9 long-radius 45° elbow data for NPS 5' }
 */
export type Lookup<T> = { ok: true; value: T } | { ok: false; missing: string };

/** Wraps a found value. */
export function found<T>(value: T): Lookup<T> {
  return { ok: true, value };
}

/** A miss with its sentence. */
export function missing<T>(sentence: string): Lookup<T> {
  return { ok: false, missing: sentence };
}
