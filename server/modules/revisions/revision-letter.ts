// I and O are skipped: on a shop-floor print they read as 1 and 0 (common practice, no source).
const LETTERS = 'ABCDEFGHJKLMNPQRSTUVWXYZ';

/** Position of a revision letter in the sequence A, B, … Z, AA, AB, … (A = 0); -1 if not one. */
export function revisionLetterIndex(letter: string): number {
  if (!/^[A-Z]{1,3}$/.test(letter)) return -1;
  let index = 0;
  for (const ch of letter) {
    const digit = LETTERS.indexOf(ch);
    if (digit < 0) return -1;
    index = index * LETTERS.length + digit + 1;
  }
  return index - 1;
}

/** The revision letter at `index` (0 = A, 23 = Z, 24 = AA). */
export function revisionLetterAt(index: number): string {
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const digit = (n - 1) % LETTERS.length;
    out = LETTERS[digit] + out;
    n = Math.floor((n - 1) / LETTERS.length);
  }
  return out;
}

/** The letter after the highest of `existing` (A when there are none). */
export function nextRevisionLetter(existing: readonly string[]): string {
  const highest = Math.max(-1, ...existing.map(revisionLetterIndex));
  return revisionLetterAt(highest + 1);
}
