import type { Rect } from './page-setup';

/**
 * Keeps labels on a drawing from landing on each other: each placed label reserves its box,
 * and a new one takes the first candidate spot that is free (or the least crowded one).
 */
export class LabelPlacer {
  private readonly taken: Rect[] = [];

  constructor(private readonly bounds: Rect) {}

  /** Reserves a box without searching (pipe runs, the north arrow). */
  reserve(rect: Rect): void {
    this.taken.push(rect);
  }

  /** Picks the best of the candidate boxes, reserves it and returns its index. */
  place(candidates: Rect[]): number {
    let best = 0;
    let bestScore = Infinity;
    candidates.forEach((c, i) => {
      let score = 0;
      for (const t of this.taken) score += overlapArea(c, t);
      score += outsideArea(c, this.bounds) * 4;
      // Earlier candidates are preferred: they are closer to what they label.
      score += i * 0.01;
      if (score < bestScore) {
        bestScore = score;
        best = i;
      }
    });
    this.taken.push(candidates[best]!);
    return best;
  }
}

function overlapArea(a: Rect, b: Rect): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

function outsideArea(a: Rect, bounds: Rect): number {
  return a.w * a.h - overlapArea(a, bounds);
}
