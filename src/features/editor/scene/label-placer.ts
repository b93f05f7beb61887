/**
 * Screen-space label placement: every label near its anchor, none covering another.
 * Pure (no DOM, no three): the scene projects anchors and measures the labels, this
 * decides where each goes. Pixels, origin top left, y down.
 */

/** A label to place: its anchor on screen and its measured size. */
export type LabelBox = {
  /** Anchor point, px. */
  x: number;
  y: number;
  width: number;
  height: number;
  /** Lower is placed first (keeps its best spot); ties keep input order. */
  priority: number;
};

/** Where a label went: its centre, px, or hidden when no spot near its anchor is free. */
export type PlacedLabel = { x: number; y: number; visible: boolean };

/** A screen rectangle, px. */
export type Rect = { left: number; top: number; right: number; bottom: number };

/** Gap kept between labels, px. */
const GAP = 2;

/**
 * Offsets tried around the anchor, in units of the label's own size: centred first, then
 * above, below, right, left, the diagonals, then twice as far out.
 */
const CANDIDATES: readonly (readonly [number, number])[] = [
  [0, 0],
  [0, -1],
  [0, 1],
  [1, 0],
  [-1, 0],
  [1, -1],
  [-1, -1],
  [1, 1],
  [-1, 1],
  [0, -2],
  [0, 2],
  [2, 0],
  [-2, 0],
  [2, -2],
  [-2, -2],
  [2, 2],
  [-2, 2],
];

function overlaps(a: Rect, b: Rect): boolean {
  return a.left < b.right + GAP && b.left < a.right + GAP && a.top < b.bottom + GAP && b.top < a.bottom + GAP;
}

function rectAt(cx: number, cy: number, w: number, h: number): Rect {
  return { left: cx - w / 2, top: cy - h / 2, right: cx + w / 2, bottom: cy + h / 2 };
}

/**
 * Places labels greedily by priority: each takes the first candidate spot (see
 * CANDIDATES) that lies inside `view` and covers no label placed before it and no
 * `keepClear` rectangle; a label with no free spot is hidden rather than drawn over
 * another. O(n² · candidates); fine for the few hundred labels the scene draws.
 */
export function placeLabels(labels: readonly LabelBox[], view: { width: number; height: number }, keepClear: readonly Rect[] = []): PlacedLabel[] {
  const order = labels.map((_, i) => i).sort((a, b) => labels[a]!.priority - labels[b]!.priority || a - b);
  const taken: Rect[] = [...keepClear];
  const out: PlacedLabel[] = labels.map((l) => ({ x: l.x, y: l.y, visible: false }));
  for (const i of order) {
    const l = labels[i]!;
    if (!Number.isFinite(l.x) || !Number.isFinite(l.y)) continue;
    // Sideways steps of half a width (the label's edge at the anchor), vertical of a full height.
    const stepX = l.width / 2 + GAP;
    const stepY = l.height + GAP;
    for (const [dx, dy] of CANDIDATES) {
      const cx = l.x + dx * stepX;
      const cy = l.y + dy * stepY;
      const r = rectAt(cx, cy, l.width, l.height);
      if (r.left < 0 || r.top < 0 || r.right > view.width || r.bottom > view.height) continue;
      if (taken.some((t) => overlaps(r, t))) continue;
      taken.push(r);
      out[i] = { x: cx, y: cy, visible: true };
      break;
    }
  }
  return out;
}

/** True when two placed labels (centre + size) overlap: for tests and checks. */
export function labelsOverlap(a: { x: number; y: number; width: number; height: number }, b: { x: number; y: number; width: number; height: number }): boolean {
  const ra = rectAt(a.x, a.y, a.width, a.height);
  const rb = rectAt(b.x, b.y, b.width, b.height);
  return ra.left < rb.right && rb.left < ra.right && ra.top < rb.bottom && rb.top < ra.bottom;
}
