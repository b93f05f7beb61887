import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import {
  AXIS_NAME,
  drawOffsetLegs,
  drawOverallDimensions,
  placeDimension,
  revisionTriangle,
  type PrintedDimension,
} from './iso-dimensions';
import { drawNorthArrow, normalTo, pageCentroid, reserveSegment, tagLabel } from './iso-labels';
import { fitIsoViewport } from './iso-projection';
import { drawComponentSymbol, PIPE_WIDTH, SMALL_BORE_WIDTH, strokePolyline } from './iso-symbols';
import { LabelPlacer } from './label-placer';
import { outletAngleText, shopMarks } from './shop-marks';
import type { Rect } from './page-setup';
import { SHORT_CAUTION } from './sheet-cautions';
import { INK, type TypeSizes } from './sheet-style';
import { drawText, measureWrapped } from './text';
import { distance } from './vec3-math';

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
  // The footer (cautions, scale note, overall sizes) owns the bottom of the area: the spool
  // and its dimension rings are fitted above it, so no extension line crosses a footnote.
  const cautionH = measureWrapped(doc, SHORT_CAUTION, area.w - 8, { size: sizes.small });
  const footerH = cautionH + 3 + 2 * (sizes.small + 3) + 4;
  const drawingArea = { ...area, h: Math.max(area.h / 2, area.h - footerH) };
  const view = fitIsoViewport(points, drawingArea, ring + sizes.dimension * 2 + 10);
  const placer = new LabelPlacer(area);
  const marks = shopMarks(result);
  const centroid = pageCentroid(view, points);

  doc.save();
  doc.rect(area.x, area.y, area.w, area.h).clip();

  // North arrow and axes, top-left, reserved first so nothing lands on it.
  const arrowBox = drawNorthArrow(doc, { x: area.x + 56, y: area.y + 44 }, sizes);
  placer.reserve(arrowBox);
  // Footer lines under the drawing (bottom up): cautions, scale note, overall sizes.
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
    printed.push(...drawOverallDimensions(doc, view, placer, points, box, area, units, dimSize, ring));
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
    // Shop mark, size, and the angle with its reference (top of pipe, or plant north).
    const text = `${marks.get(c.nodeId) ?? '?'} NPS ${c.shape.branchNps}${angle === null ? '' : ` at ${outletAngleText(angle, c.shape.headerAxis)}`}`;
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
    const near = spots.length;
    // On a straight run the CoG lies on the pipe, and every spot beside the mark is on the
    // pipe's line too: further spots, joined to the mark by a leader.
    for (const reach of [22, 40]) {
      for (let k = 0; k < 8; k += 1) {
        const a = (k * Math.PI) / 4 + Math.PI / 8;
        const cx = p.x + Math.cos(a) * reach;
        const cy = p.y + Math.sin(a) * reach;
        spots.push({ x: cx < p.x ? cx - labelW : cx, y: cy - (sizes.small + 2) / 2 });
      }
    }
    // The placer keeps labels off labels; the pipe lines themselves are checked here.
    const lines = result.runs.map((r) => [view.project(r.start), view.project(r.end)] as const);
    const boxes = spots.map((q) => ({ x: q.x, y: q.y, w: labelW, h: sizes.small + 2 }));
    const clear = boxes
      .map((b, i) => ({ b, i }))
      .filter(({ b }) => !lines.some(([a, c]) => segmentMeetsRect(a, c, b, 4)));
    const pool = clear.length > 0 ? clear : boxes.map((b, i) => ({ b, i }));
    const index = pool[placer.place(pool.map(({ b }) => b))]!.i;
    const chosen = spots[index]!;
    const lx = chosen.x;
    const ly = chosen.y;
    if (index >= near) {
      const end = { x: lx < p.x ? lx + labelW : lx, y: ly + (sizes.small + 2) / 2 };
      doc.save().lineWidth(0.5).strokeColor(INK.warn).moveTo(p.x, p.y).lineTo(end.x, end.y).stroke().restore();
    }
    drawText(doc, cogText, lx, ly, { font: 'cond-bold', size: sizes.small, color: INK.warn, width: labelW });
  }
  doc.restore();
  return printed;
}

/** Whether segment a–b passes within `pad` of rectangle `r` (page coordinates). */
export function segmentMeetsRect(
  a: { x: number; y: number },
  b: { x: number; y: number },
  r: { x: number; y: number; w: number; h: number },
  pad: number,
): boolean {
  const x0 = r.x - pad;
  const y0 = r.y - pad;
  const x1 = r.x + r.w + pad;
  const y1 = r.y + r.h + pad;
  // Liang–Barsky clipping: the segment meets the box if some part of it survives the clip.
  let t0 = 0;
  let t1 = 1;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const edges: Array<[number, number]> = [
    [-dx, a.x - x0],
    [dx, x1 - a.x],
    [-dy, a.y - y0],
    [dy, y1 - a.y],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) {
      if (t > t1) return false;
      if (t > t0) t0 = t;
    } else {
      if (t < t0) return false;
      if (t < t1) t1 = t;
    }
  }
  return t0 <= t1;
}
