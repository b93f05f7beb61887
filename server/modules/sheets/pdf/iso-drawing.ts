import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { drawDimension, drawDimensionBetween, type PagePoint } from './dimension-line';
import { fitIsoViewport, isoProjectDirection, type IsoViewport } from './iso-projection';
import { drawComponentSymbol, PIPE_WIDTH, SMALL_BORE_WIDTH, strokePolyline } from './iso-symbols';
import { LabelPlacer } from './label-placer';
import type { Rect } from './page-setup';
import { SHORT_CAUTION } from './sheet-cautions';
import { INK, type TypeSizes } from './sheet-style';
import { drawText, measureWrapped } from './text';
import { distance, dot, normalise, perpendicularAxis, sub } from './vec3-math';

/** One dimension the drawing printed: what it measures, its value and the text shown. */
export interface PrintedDimension {
  kind: 'run' | 'centre-to-face' | 'overall' | 'offset';
  /** Run id, open-end node id, the plant axis for overall dimensions, `<runId>.<axis>` for an offset leg. */
  ref: string;
  mm: number;
  text: string;
}

export interface IsoDrawingInput {
  result: SpoolResult;
  units: LengthUnits;
  sizes: TypeSizes;
  /** Sheet tag per flange node ("F1"), matching the flange orientation details. */
  flangeTags: Map<string, string>;
  /** Runs changed since the previous issued revision, marked with a revision triangle. */
  revisionMark?: { letter: string; runs: Set<string> } | null;
}

const SMALL = new Set(['1/2', '3/4', '1', '1-1/4', '1-1/2']);
const AXES: Record<'x' | 'y' | 'z', Vec3> = {
  x: { x: 1, y: 0, z: 0 },
  y: { x: 0, y: 1, z: 0 },
  z: { x: 0, y: 0, z: 1 },
};
const AXIS_NAME = { x: 'E–W', y: 'N–S', z: 'vertical' } as const;

/**
 * Draws the spool as a single-line isometric in `area`: pipe and fittings, flange tags, weld
 * balloons, piece marks, run and centre-to-face dimensions, overall dimensions, the centre of
 * gravity and a north arrow. Returns every dimension it printed.
 */
export function drawIsometric(
  doc: PDFKit.PDFDocument,
  area: Rect,
  input: IsoDrawingInput,
): PrintedDimension[] {
  const { result, units, sizes } = input;
  const printed: PrintedDimension[] = [];
  const points: Vec3[] = [
    ...result.workPoints.map((w) => w.position),
    ...result.components.flatMap((c) => c.ends.map((e) => e.point)),
    ...result.pieces.flatMap((p) => [p.start, p.end]),
  ];
  // Leave room round the spool for dimensions (inner ring) and overall dimensions (outer ring).
  // Run dimensions sit 20–50 pt off the pipe; overall dimensions a ring beyond everything.
  const ring = 62;
  const view = fitIsoViewport(points, area, ring + sizes.dimension * 2 + 10);
  const placer = new LabelPlacer(area);
  const centroid = pageCentroid(view, points);

  doc.save();
  doc.rect(area.x, area.y, area.w, area.h).clip();

  // North arrow and axes, top-left, reserved first so nothing lands on it.
  const arrowBox = drawNorthArrow(doc, { x: area.x + 56, y: area.y + 44 }, sizes);
  placer.reserve(arrowBox);
  // Footer lines under the drawing (bottom up): cautions, scale note, overall sizes.
  const cautionH = measureWrapped(doc, SHORT_CAUTION, area.w - 8, { size: sizes.small });
  let footY = area.y + area.h - cautionH - 3;
  drawText(doc, SHORT_CAUTION, area.x + 4, footY, {
    size: sizes.small,
    color: INK.muted,
    width: area.w - 8,
    wrap: true,
  });
  footY -= sizes.small + 3;
  drawText(
    doc,
    'ISOMETRIC — NOT TO SCALE. Work to the figures, never measure the drawing.',
    area.x + 4,
    footY,
    {
      font: 'body-semibold',
      size: sizes.small,
      color: INK.muted,
      width: area.w - 8,
    },
  );
  const overallY = footY - sizes.small - 3;
  placer.reserve({ x: area.x, y: overallY - 2, w: area.w, h: area.y + area.h - overallY + 2 });

  // Pipe pieces, then fitting bodies over them.
  for (const piece of result.pieces) {
    strokePolyline(doc, view, [piece.start, piece.end], SMALL.has(piece.nps) ? SMALL_BORE_WIDTH : PIPE_WIDTH);
    reserveSegment(placer, view.project(piece.start), view.project(piece.end));
  }
  for (const component of result.components) {
    drawComponentSymbol(doc, view, component);
    for (const end of component.ends)
      reserveSegment(placer, view.project(component.position), view.project(end.point));
  }

  // Dimensions: each run work point to work point (centre-to-centre, or centre-to-face at an end).
  const dimSize = sizes.dimension;
  for (const run of result.runs) {
    const length = run.workPointDistanceMm;
    if (!(length > 0.05)) continue;
    const text = formatLength(length, units);
    const box = placeDimension(doc, view, placer, run.start, run.end, text, dimSize, centroid, [20, 35, 50]);
    if (input.revisionMark?.runs.has(run.runId))
      revisionTriangle(doc, placer, box, input.revisionMark.letter, sizes.small);
    printed.push({ kind: 'run', ref: run.runId, mm: length, text });
    printed.push(
      ...drawOffsetLegs(doc, view, placer, run.runId, run.start, run.end, units, sizes.small, centroid),
    );
  }
  // Centre-to-face at open ends not already dimensioned by their run.
  for (const end of result.openEnds) {
    if (end.centreToFaceMm === null || !end.fromNodeId) continue;
    const from = result.workPoints.find((w) => w.nodeId === end.fromNodeId)?.position;
    if (!from) continue;
    // Usually the end's own run already dimensions it (in either direction).
    const same = result.runs.some(
      (r) =>
        Math.abs(r.workPointDistanceMm - (end.centreToFaceMm ?? 0)) < 0.05 &&
        ((distance(r.end, end.facePoint) < 0.5 && distance(r.start, from) < 0.5) ||
          (distance(r.start, end.facePoint) < 0.5 && distance(r.end, from) < 0.5)),
    );
    if (same) {
      printed.push({
        kind: 'centre-to-face',
        ref: end.nodeId,
        mm: end.centreToFaceMm,
        text: formatLength(end.centreToFaceMm, units),
      });
      continue;
    }
    const text = formatLength(end.centreToFaceMm, units);
    placeDimension(doc, view, placer, from, end.facePoint, text, dimSize, centroid, [28, 42, 56]);
    printed.push({ kind: 'centre-to-face', ref: end.nodeId, mm: end.centreToFaceMm, text });
  }
  // Overall dimensions along each plant axis, from the extreme points, outside everything else.
  if (result.overall) {
    const box = result.overall.workPointBox;
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
      const d = unit2(isoProjectDirection(AXES[axis]));
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
      const text = `overall ${AXIS_NAME[axis]} ${formatLength(size, units)}`;
      const drawn = drawDimensionBetween(doc, best.a, best.b, best.a2, best.b2, text, {
        size: dimSize,
        color: INK.black,
      });
      placer.reserve(boxAround(drawn.centre, drawn.width, drawn.height));
      printed.push({ kind: 'overall', ref: axis, mm: size, text: formatLength(size, units) });
    }
    const parts = (['x', 'y', 'z'] as const).map(
      (k) => `${AXIS_NAME[k]} ${formatLength(box.sizeMm[k], units)}`,
    );
    drawText(doc, `Overall, work points and faces: ${parts.join('  ·  ')}`, area.x + 4, overallY, {
      font: 'body-bold',
      size: sizes.small,
      color: INK.black,
      width: area.w - 8,
    });
  }

  // Piece marks at each piece's middle.
  for (const piece of result.pieces) {
    const a = view.project(piece.start);
    const b = view.project(piece.end);
    const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
    tagLabel(doc, placer, mid, piece.mark, sizes.small, 'rect', normalTo(a, b));
  }
  // Small-bore connections: which one, and its clock position round the header.
  for (const c of result.components) {
    if (c.shape.type !== 'branch-connection' && c.shape.type !== 'set-on-branch') continue;
    const tip = c.ends.reduce(
      (a, b) => (distance(b.point, c.position) > distance(a.point, c.position) ? b : a),
      c.ends[0]!,
    );
    const angle = c.shape.orientationDeg;
    const text = `${c.nodeId} NPS ${c.shape.branchNps}${angle === null ? '' : ` at ${Number(angle.toFixed(1))}°`}`;
    tagLabel(
      doc,
      placer,
      view.project(c.shape.type === 'branch-connection' ? tip.point : c.position),
      text,
      sizes.small,
      'rect',
      null,
    );
  }
  // Flange tags.
  for (const f of result.flanges) {
    const tag = input.flangeTags.get(f.nodeId);
    if (tag) tagLabel(doc, placer, view.project(f.faceCentre), tag, sizes.small, 'hex', null);
  }
  // Welds: shop welds a dot, field welds a ring; each with a numbered balloon.
  for (const weld of result.welds) {
    const p = view.project(weld.position);
    doc.save();
    if (weld.location === 'field') {
      doc.lineWidth(1.2).strokeColor(INK.black).circle(p.x, p.y, 3.4).fillAndStroke('#ffffff', INK.black);
    } else {
      doc.circle(p.x, p.y, 2.4).fill(INK.black);
    }
    doc.restore();
    tagLabel(
      doc,
      placer,
      p,
      weld.location === 'field' ? `${weld.mark} FW` : weld.mark,
      sizes.small,
      'balloon',
      null,
    );
  }
  // Centre of gravity.
  const cog = result.weights.centreOfGravity;
  if (cog) {
    const p = view.project(cog);
    doc.save().lineWidth(0.9).strokeColor(INK.warn);
    doc.circle(p.x, p.y, 5).stroke();
    doc
      .moveTo(p.x - 7, p.y)
      .lineTo(p.x + 7, p.y)
      .moveTo(p.x, p.y - 7)
      .lineTo(p.x, p.y + 7)
      .stroke();
    doc.restore();
    const cogText = `CoG, empty ${result.weights.emptyKg.toFixed(0)} kg`;
    doc.font('cond-bold').fontSize(sizes.small);
    const labelW = doc.widthOfString(cogText) + 2;
    const spots = [
      { x: p.x + 9, y: p.y + 6 },
      { x: p.x - 9 - labelW, y: p.y - 6 - sizes.small },
      { x: p.x + 9, y: p.y - 6 - sizes.small },
      { x: p.x - 9 - labelW, y: p.y + 6 },
      { x: p.x - labelW / 2, y: p.y + 10 },
      { x: p.x - labelW / 2, y: p.y - 10 - sizes.small },
    ];
    const chosen =
      spots[placer.place(spots.map((q) => ({ x: q.x, y: q.y, w: labelW, h: sizes.small + 2 })))]!;
    const lx = chosen.x;
    const ly = chosen.y;
    drawText(doc, cogText, lx, ly, { font: 'cond-bold', size: sizes.small, color: INK.warn, width: labelW });
  }
  doc.restore();
  return printed;
}

/**
 * A run that is not along a plant axis (a rolling or simple offset) gets its legs drawn dashed
 * along the plant axes, each dimensioned: the set, roll and run a fitter lays out with a square.
 */
function drawOffsetLegs(
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

function placeDimension(
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
function revisionTriangle(
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

function boxAround(c: PagePoint, w: number, h: number): Rect {
  return { x: c.x - w / 2, y: c.y - h / 2, w, h };
}

function unit2(p: { u: number; v: number }): PagePoint {
  const l = Math.hypot(p.u, p.v) || 1;
  return { x: p.u / l, y: -p.v / l };
}

function normalTo(a: PagePoint, b: PagePoint): PagePoint {
  const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  return { x: -(b.y - a.y) / l, y: (b.x - a.x) / l };
}

function pageCentroid(view: IsoViewport, points: Vec3[]): PagePoint {
  if (points.length === 0) return { x: 0, y: 0 };
  let x = 0;
  let y = 0;
  for (const p of points) {
    const q = view.project(p);
    x += q.x;
    y += q.y;
  }
  return { x: x / points.length, y: y / points.length };
}

// Pipe lines reserve thin boxes along their length so labels avoid sitting on them.
function reserveSegment(placer: LabelPlacer, a: PagePoint, b: PagePoint): void {
  const steps = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / 12));
  for (let i = 0; i <= steps; i += 1) {
    const t = i / steps;
    placer.reserve(boxAround({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t }, 6, 6));
  }
}

/** A tag (piece mark box, flange hexagon, weld balloon) near a point with a short leader. */
function tagLabel(
  doc: PDFKit.PDFDocument,
  placer: LabelPlacer,
  at: PagePoint,
  text: string,
  size: number,
  style: 'rect' | 'hex' | 'balloon',
  preferred: PagePoint | null,
): void {
  doc.font('cond-bold').fontSize(size);
  const w = Math.max(doc.widthOfString(text) + 6, size + 6);
  const h = size + 5;
  const dirs: PagePoint[] = [];
  if (preferred) dirs.push(preferred, { x: -preferred.x, y: -preferred.y });
  for (let k = 0; k < 8; k += 1)
    dirs.push({ x: Math.cos((k * Math.PI) / 4 - Math.PI / 4), y: Math.sin((k * Math.PI) / 4 - Math.PI / 4) });
  const candidates: { c: PagePoint; box: Rect }[] = [];
  for (const dist of [16, 26, 38]) {
    for (const d of dirs) {
      const c = { x: at.x + d.x * (dist + w / 2), y: at.y + d.y * (dist + h / 2) };
      candidates.push({ c, box: boxAround(c, w + 3, h + 3) });
    }
  }
  const { c } = candidates[placer.place(candidates.map((k) => k.box))]!;
  doc.save();
  doc.lineWidth(0.5).strokeColor(INK.muted).moveTo(at.x, at.y).lineTo(c.x, c.y).stroke();
  if (style === 'rect') {
    doc
      .lineWidth(0.8)
      .rect(c.x - w / 2, c.y - h / 2, w, h)
      .fillAndStroke('#ffffff', INK.black);
  } else if (style === 'hex') {
    const hw = w / 2 + 2;
    const hh = h / 2;
    doc
      .lineWidth(0.9)
      .moveTo(c.x - hw, c.y)
      .lineTo(c.x - hw + 4, c.y - hh)
      .lineTo(c.x + hw - 4, c.y - hh)
      .lineTo(c.x + hw, c.y)
      .lineTo(c.x + hw - 4, c.y + hh)
      .lineTo(c.x - hw + 4, c.y + hh)
      .closePath()
      .fillAndStroke('#ffffff', INK.black);
  } else {
    doc
      .lineWidth(0.8)
      .roundedRect(c.x - w / 2, c.y - h / 2, w, h, h / 2)
      .fillAndStroke('#ffffff', INK.black);
  }
  doc.restore();
  drawText(doc, text, c.x - w / 2, c.y - size / 2 + 0.5, {
    font: 'cond-bold',
    size,
    width: w,
    align: 'center',
    color: INK.black,
  });
}

function drawNorthArrow(doc: PDFKit.PDFDocument, origin: PagePoint, sizes: TypeSizes): Rect {
  const len = 26;
  const axes: Array<[Vec3, string, boolean]> = [
    [AXES.y, 'N', true],
    [AXES.x, 'E', false],
    [AXES.z, 'UP', false],
  ];
  doc.save();
  for (const [axis, label, main] of axes) {
    const d = isoProjectDirection(axis);
    const l = Math.hypot(d.u, d.v);
    const tip = { x: origin.x + (d.u / l) * len, y: origin.y - (d.v / l) * len };
    doc
      .lineWidth(main ? 1.6 : 0.7)
      .strokeColor(INK.black)
      .moveTo(origin.x, origin.y)
      .lineTo(tip.x, tip.y)
      .stroke();
    const ux = (tip.x - origin.x) / len;
    const uy = (tip.y - origin.y) / len;
    const hw = main ? 3.2 : 2;
    doc
      .moveTo(tip.x + ux * 4, tip.y + uy * 4)
      .lineTo(tip.x - uy * hw, tip.y + ux * hw)
      .lineTo(tip.x + uy * hw, tip.y - ux * hw)
      .closePath()
      .fill(INK.black);
    drawText(doc, label, tip.x + ux * 10 - 8, tip.y + uy * 10 - sizes.small / 2, {
      font: main ? 'cond-bold' : 'cond-semibold',
      size: main ? sizes.heading : sizes.small,
      width: 16,
      align: 'center',
    });
  }
  doc.restore();
  return { x: origin.x - 34, y: origin.y - 40, w: 70, h: 60 };
}
