import type { Rect } from './page-setup';

const CELL = 32; // pt; a spatial hash keeps a crowded drawing's label search near-linear

/**
 * Keeps labels on a drawing from landing on each other: each placed label reserves its box,
 * and a new one takes the first candidate spot that is free (or the least crowded one).
 */
export class LabelPlacer {
  private readonly taken: Rect[] = [];
  private readonly grid = new Map<string, number[]>();

  constructor(private readonly bounds: Rect) {}

  /** Reserves a box without searching (pipe runs, the north arrow). */
  reserve(rect: Rect): void {
    const id = this.taken.push(rect) - 1;
    for (const key of cellsOf(rect)) {
      const list = this.grid.get(key);
      if (list) list.push(id);
      else this.grid.set(key, [id]);
    }
  }

  /** Picks the best of the candidate boxes, reserves it and returns its index. */
  place(candidates: Rect[]): number {
    let best = 0;
    let bestScore = Infinity;
    candidates.forEach((c, i) => {
      let score = 0;
      const seen = new Set<number>();
      for (const key of cellsOf(c)) {
        for (const id of this.grid.get(key) ?? []) {
          if (seen.has(id)) continue;
          seen.add(id);
          score += overlapArea(c, this.taken[id]!);
        }
      }
      score += outsideArea(c, this.bounds) * 4;
      // Earlier candidates are preferred: they are closer to what they label.
      score += i * 0.01;
      if (score < bestScore) {
        bestScore = score;
        best = i;
      }
    });
    this.reserve(candidates[best]!);
    return best;
  }
}

function cellsOf(r: Rect): string[] {
  const keys: string[] = [];
  const x0 = Math.floor(r.x / CELL);
  const x1 = Math.floor((r.x + r.w) / CELL);
  const y0 = Math.floor(r.y / CELL);
  const y1 = Math.floor((r.y + r.h) / CELL);
  for (let x = x0; x <= x1; x += 1) for (let y = y0; y <= y1; y += 1) keys.push(`${x},${y}`);
  return keys;
}

function overlapArea(a: Rect, b: Rect): number {
  const w = Math.min(a.x + a.w, b.x + b.w) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.h, b.y + b.h) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

function outsideArea(a: Rect, bounds: Rect): number {
  return a.w * a.h - overlapArea(a, bounds);
}
