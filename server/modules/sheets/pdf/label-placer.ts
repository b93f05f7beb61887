import type { Rect } from './page-setup';

/** Side of one coverage cell, pt. Small enough that a 6 pt pipe box is seen as such. */
const CELL = 4;
/** Cells kept beyond the drawing area on each side, so labels just outside it still score. */
const MARGIN_CELLS = 16;

/**
 * Keeps labels on a drawing from landing on each other: each placed label reserves its box,
 * and a new one takes the first candidate spot that is free (or the least crowded one).
 *
 * Reserved boxes are kept as covered area per 4 pt cell, not as a list: scoring a candidate
 * costs the cells it covers, however many labels a crowded drawing already holds (a list of
 * boxes per cell made a long spool's labels quadratic once they crowded the same cells).
 */
export class LabelPlacer {
  private readonly cols: number;
  private readonly rows: number;
  private readonly x0: number;
  private readonly y0: number;
  /** Reserved area (pt²) inside each cell, row-major. */
  private readonly covered: Float64Array;

  constructor(private readonly bounds: Rect) {
    this.x0 = bounds.x - MARGIN_CELLS * CELL;
    this.y0 = bounds.y - MARGIN_CELLS * CELL;
    this.cols = Math.max(1, Math.ceil(bounds.w / CELL) + 2 * MARGIN_CELLS);
    this.rows = Math.max(1, Math.ceil(bounds.h / CELL) + 2 * MARGIN_CELLS);
    this.covered = new Float64Array(this.cols * this.rows);
  }

  /** Reserves a box without searching (pipe runs, the north arrow). */
  reserve(rect: Rect): void {
    this.eachCell(rect, (index, area) => {
      this.covered[index]! += area;
    });
  }

  /** Picks the best of the candidate boxes, reserves it and returns its index. */
  place(candidates: Rect[]): number {
    let best = 0;
    let bestScore = Infinity;
    candidates.forEach((c, i) => {
      // Earlier candidates are preferred: they are closer to what they label.
      let score = outsideArea(c, this.bounds) * 4 + i * 0.01;
      if (score >= bestScore) return;
      // Reserved area is taken as spread evenly over its cell: the overlap with a cell the
      // candidate covers in part counts in proportion.
      this.eachCell(c, (index, area) => {
        score += (this.covered[index]! * area) / (CELL * CELL);
      });
      if (score < bestScore) {
        bestScore = score;
        best = i;
      }
    });
    this.reserve(candidates[best]!);
    return best;
  }

  /** Calls `fn` with each grid cell `rect` overlaps and the overlap area (pt²). */
  private eachCell(rect: Rect, fn: (index: number, area: number) => void): void {
    if (!(rect.w > 0 && rect.h > 0)) return;
    const left = rect.x - this.x0;
    const top = rect.y - this.y0;
    const right = left + rect.w;
    const bottom = top + rect.h;
    const c0 = Math.max(0, Math.floor(left / CELL));
    const c1 = Math.min(this.cols - 1, Math.floor(right / CELL));
    const r0 = Math.max(0, Math.floor(top / CELL));
    const r1 = Math.min(this.rows - 1, Math.floor(bottom / CELL));
    for (let r = r0; r <= r1; r += 1) {
      const h = Math.min(bottom, (r + 1) * CELL) - Math.max(top, r * CELL);
      if (h <= 0) continue;
      for (let c = c0; c <= c1; c += 1) {
        const w = Math.min(right, (c + 1) * CELL) - Math.max(left, c * CELL);
        if (w > 0) fn(r * this.cols + c, w * h);
      }
    }
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
