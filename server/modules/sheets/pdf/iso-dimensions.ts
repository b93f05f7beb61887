import type { Box } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { drawDimension, drawDimensionBetween, type PagePoint } from './dimension-line';
import { isoProjectDirection, PLANT_AXES as AXES, type IsoViewport } from './iso-projection';
import { boxAround } from './iso-labels';
import type { LabelPlacer } from './label-placer';
import type { Rect } from './page-setup';
import { INK } from './sheet-style';
import { drawText } from './text';
import { dot, normalise, perpendicularAxis, sub } from './vec3-math';

/** One dimension the drawing printed: what it measures, its value and the text shown. */
export interface PrintedDimension {
  kind: 'run' | 'centre-to-face' | 'overall' | 'offset';
  /** Run id, open-end node id, the plant axis for overall dimensions, `<runId>.<axis>` for an offset leg. */
  ref: string;
  mm: number;
  text: string;
}

/** Plant axis names as the overall dimensions print them. */
export const AXIS_NAME = { x: 'E–W', y: 'N–S', z: 'vertical' } as const;

/**
 * Overall dimensions along each plant axis between the extreme points, outside everything else,
 * with extension lines along another plant axis on whichever side keeps them shortest. One that
 * cannot sit inside the drawing area is left out (the overall line under the drawing has it).
 */
export function drawOverallDimensions(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  placer: LabelPlacer,
  points: Vec3[],
  box: Box,
  area: Rect,
  units: LengthUnits,
  dimSize: number,
  ring: number,
): PrintedDimension[] {
  const printed: PrintedDimension[] = [];
  const pagePoints = points.map((p) => ({ p, q: view.project(p) }));
  for (const axis of ['x', 'y', 'z'] as const) {
    const size = box.sizeMm[axis];
    if (!(size > 1)) continue;
    const min = Math.min(...pagePoints.map((pp) => pp.p[axis]));
    const max = Math.max(...pagePoints.map((pp) => pp.p[axis]));
    // Every point at either extreme may anchor the dimension; the one nearest the line is used.
    const loSet = pagePoints.filter((pp) => pp.p[axis] <= min + 0.5);
    const hiSet = pagePoints.filter((pp) => pp.p[axis] >= max - 0.5);
    // Extension lines run along another plant axis, on whichever side keeps them shortest.
    const projected = isoProjectDirection(AXES[axis]);
    const d = unit2(projected);
    const expectedLength = size * view.scale * Math.hypot(projected.u, projected.v);
    const text = `overall ${AXIS_NAME[axis]} ${formatLength(size, units)}`;
    doc.font('cond-bold').fontSize(dimSize);
    // Too short to carry its own text: the overall line under the drawing gives it.
    if (expectedLength < doc.widthOfString(text) + 12) continue;
    const others = (['x', 'y', 'z'] as const).filter((k) => k !== axis);
    let best: { a: PagePoint; b: PagePoint; a2: PagePoint; b2: PagePoint; cost: number } | null = null;
    for (const k of others) {
      for (const sign of [1, -1]) {
        const o = unit2(
          isoProjectDirection({ x: AXES[k].x * sign, y: AXES[k].y * sign, z: AXES[k].z * sign }),
        );
        let n = { x: -d.y, y: d.x };
        if (n.x * o.x + n.y * o.y < 0) n = { x: -n.x, y: -n.y };
        const along = n.x * o.x + n.y * o.y;
        if (along < 0.3) continue; // nearly parallel to the dimension line
        // Outside the whole spool if that fits on the page, else just outside the two anchor points.
        const outside = Math.max(...pagePoints.map((pp) => pp.q.x * n.x + pp.q.y * n.y)) + ring;
        for (const [wide, penalty] of [
          [true, 0],
          [false, 300],
        ] as const) {
          const foot = (q: PagePoint, level: number) => {
            const u = (level - (q.x * n.x + q.y * n.y)) / along;
            return { x: q.x + o.x * u, y: q.y + o.y * u, u };
          };
          const pick = (set: typeof pagePoints, level: number) =>
            set.map((pp) => ({ q: pp.q, f: foot(pp.q, level) })).reduce((a, b) => (b.f.u < a.f.u ? b : a));
          let la = pick(loSet, outside);
          let lb = pick(hiSet, outside);
          if (!wide) {
            const level = Math.max(la.q.x * n.x + la.q.y * n.y, lb.q.x * n.x + lb.q.y * n.y) + ring * 0.6;
            la = pick(loSet, level);
            lb = pick(hiSet, level);
          }
          const fa = la.f;
          const fb = lb.f;
          // The line must read true: between points that also differ along the other axes, its
          // drawn length can be far from the size it is labelled with. Such a pair is not used.
          const drawnLength = Math.hypot(fb.x - fa.x, fb.y - fa.y);
          if (Math.abs(drawnLength - expectedLength) > 0.15 * expectedLength) continue;
          const inside = [fa, fb].every(
            (f) =>
              f.x > area.x + 10 &&
              f.x < area.x + area.w - 10 &&
              f.y > area.y + 10 &&
              f.y < area.y + area.h - 20,
          );
          // Short extension lines; a small preference for below (the usual place).
          const cost = fa.u + fb.u + penalty + (inside ? 0 : 10_000) + (k === 'z' && sign === -1 ? -20 : 0);
          if (!best || cost < best.cost) best = { a: la.q, b: lb.q, a2: fa, b2: fb, cost };
        }
      }
    }
    // One that cannot sit on the page is left to the overall line printed under the drawing.
    if (!best || best.cost >= 10_000) continue;
    const drawn = drawDimensionBetween(doc, best.a, best.b, best.a2, best.b2, text, {
      size: dimSize,
      color: INK.black,
    });
    placer.reserve(boxAround(drawn.centre, drawn.width, drawn.height));
    printed.push({ kind: 'overall', ref: axis, mm: size, text: formatLength(size, units) });
  }
  return printed;
}

/**
 * A run that is not along a plant axis (a rolling or simple offset) gets its legs drawn dashed
 * along the plant axes, each dimensioned: the set, roll and run a fitter lays out with a square.
 */
export function drawOffsetLegs(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  placer: LabelPlacer,
  runId: string,
  start: Vec3,
  end: Vec3,
  units: LengthUnits,
  size: number,
  centroid: PagePoint,
): PrintedDimension[] {
  const delta = sub(end, start);
  const axes = (['x', 'y', 'z'] as const).filter((k) => Math.abs(delta[k]) > 0.5);
  if (axes.length < 2) return [];
  const out: PrintedDimension[] = [];
  let p = start;
  for (const k of axes) {
    const q = { ...p, [k]: p[k] + delta[k] };
    const a = view.project(p);
    const b = view.project(q);
    doc
      .save()
      .lineWidth(0.6)
      .strokeColor(INK.muted)
      .dash(3, { space: 2 })
      .moveTo(a.x, a.y)
      .lineTo(b.x, b.y)
      .stroke()
      .undash()
      .restore();
    const mmValue = Math.abs(delta[k]);
    const text = formatLength(mmValue, units);
    placeDimension(doc, view, placer, p, q, text, size, centroid, [12, 24], INK.muted);
    out.push({ kind: 'offset', ref: `${runId}.${k}`, mm: mmValue, text });
    p = q;
  }
  return out;
}

export function placeDimension(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  placer: LabelPlacer,
  from: Vec3,
  to: Vec3,
  text: string,
  size: number,
  centroid: PagePoint,
  distances: number[],
  color?: string,
): { centre: PagePoint; width: number; height: number } {
  const a = view.project(from);
  const b = view.project(to);
  const dir = normalise(sub(to, from));
  // Offset along an iso axis square to the run, on either side, nearer and farther.
  const axisA = perpendicularAxis(dir);
  const axisB = perpendicularAxis(
    dir,
    [
      { x: 1, y: 0, z: 0 },
      { x: 0, y: 1, z: 0 },
      { x: 0, y: 0, z: 1 },
    ].filter((v) => Math.abs(dot(v, axisA)) < 0.9),
  );
  const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  const candidates: { offset: PagePoint; box: Rect }[] = [];
  doc.font('cond-bold').fontSize(size);
  const tw = doc.widthOfString(text) + 4;
  for (const d of distances) {
    for (const axis of [axisA, axisB]) {
      const pd = isoProjectDirection(axis);
      const l = Math.hypot(pd.u, pd.v);
      if (l < 1e-6) continue;
      for (const sign of [1, -1]) {
        const off = { x: (sign * pd.u * d) / l, y: (-sign * pd.v * d) / l };
        candidates.push({
          offset: off,
          box: rotatedBox({ x: mid.x + off.x, y: mid.y + off.y }, a, b, tw, size + 2),
        });
      }
    }
  }
  // Prefer the side away from the spool's middle, so dimensions sit outside the pipework.
  candidates.sort((p, q) => awayScore(q.offset, mid, centroid) - awayScore(p.offset, mid, centroid));
  const stable = candidates
    .map((c, i) => ({ ...c, i }))
    .sort(
      (p, q) =>
        distances.indexOf(closest(distances, p.offset)) - distances.indexOf(closest(distances, q.offset)) ||
        p.i - q.i,
    );
  const chosen = stable[placer.place(stable.map((c) => c.box))]!;
  return drawDimension(doc, a, b, chosen.offset, text, { size, color });
}

/** A revision triangle with the revision letter, beside a changed dimension. */
export function revisionTriangle(
  doc: PDFKit.PDFDocument,
  placer: LabelPlacer,
  box: { centre: PagePoint; width: number; height: number },
  letter: string,
  size: number,
): void {
  const side = size * 1.9;
  const h = (side * Math.sqrt(3)) / 2;
  const spots = [
    { x: box.centre.x + box.width / 2 + side * 0.7, y: box.centre.y },
    { x: box.centre.x - box.width / 2 - side * 0.7, y: box.centre.y },
    { x: box.centre.x, y: box.centre.y - box.height / 2 - h * 0.7 },
    { x: box.centre.x, y: box.centre.y + box.height / 2 + h * 0.7 },
  ];
  const c = spots[placer.place(spots.map((p) => ({ x: p.x - side / 2, y: p.y - h / 2, w: side, h })))]!;
  doc.save();
  doc
    .lineWidth(1)
    .moveTo(c.x, c.y - h / 2)
    .lineTo(c.x + side / 2, c.y + h / 2)
    .lineTo(c.x - side / 2, c.y + h / 2)
    .closePath()
    .fillAndStroke('#ffffff', INK.warn);
  doc.restore();
  drawText(doc, letter, c.x - side / 2, c.y - size * 0.2, {
    font: 'cond-bold',
    size: size * 0.85,
    width: side,
    align: 'center',
    color: INK.warn,
  });
}

function closest(distances: number[], off: PagePoint): number {
  const l = Math.hypot(off.x, off.y);
  return distances.reduce((best, d) => (Math.abs(d - l) < Math.abs(best - l) ? d : best), distances[0]!);
}

function awayScore(offset: PagePoint, mid: PagePoint, centroid: PagePoint): number {
  return offset.x * (mid.x - centroid.x) + offset.y * (mid.y - centroid.y) >= 0 ? 1 : 0;
}

function rotatedBox(centre: PagePoint, a: PagePoint, b: PagePoint, w: number, h: number): Rect {
  const r = Math.atan2(b.y - a.y, b.x - a.x);
  const bw = Math.abs(w * Math.cos(r)) + Math.abs(h * Math.sin(r));
  const bh = Math.abs(w * Math.sin(r)) + Math.abs(h * Math.cos(r));
  return boxAround(centre, bw, bh);
}

function unit2(p: { u: number; v: number }): PagePoint {
  const l = Math.hypot(p.u, p.v) || 1;
  return { x: p.u / l, y: -p.v / l };
}
