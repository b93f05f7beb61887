/**
 * Piece and weld marks ("P12", "W40"), built once per number: every recompute numbers its
 * pieces and welds from 1 again, so the same few hundred strings recur.
 */

/** Marks kept per prefix; later numbers are built each time. */
const MAX_KEPT = 5000;

const pieces: string[] = [];
const welds: string[] = [];

function mark(kept: string[], prefix: string, n: number): string {
  const hit = kept[n - 1];
  if (hit !== undefined) return hit;
  const text = `${prefix}${n}`;
  // Numbers arrive in order from 1, so the array fills densely (kept[i] is mark i + 1).
  if (n - 1 === kept.length && n <= MAX_KEPT) kept.push(text);
  return text;
}

/** Pipe piece mark number `n` (1-based): "P1", "P2"… */
export function pieceMark(n: number): string {
  return mark(pieces, 'P', n);
}

/** Weld mark number `n` (1-based): "W1", "W2"… */
export function weldMark(n: number): string {
  return mark(welds, 'W', n);
}
