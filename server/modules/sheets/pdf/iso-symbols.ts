import type { ComponentResult } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import type { IsoViewport } from './iso-projection';
import { INK } from './sheet-style';
import { add, arcPoints, normalise, perpendicularAxis, scale, sub } from './vec3-math';

/** Line weights of the single-line isometric, points. */
export const PIPE_WIDTH = 2.6;
export const SMALL_BORE_WIDTH = 1.5;

/** Draws a polyline through projected plant points. */
export function strokePolyline(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  points: Vec3[],
  width: number,
  color: string = INK.pipe,
): void {
  if (points.length < 2) return;
  const first = view.project(points[0]!);
  doc.save().lineWidth(width).lineCap('round').lineJoin('round').strokeColor(color);
  doc.moveTo(first.x, first.y);
  for (const p of points.slice(1)) {
    const q = view.project(p);
    doc.lineTo(q.x, q.y);
  }
  doc.stroke().restore();
}

/** A bar across the pipe at a point, drawn along an iso axis perpendicular to the pipe. */
export function strokeBar(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  at: Vec3,
  along: Vec3,
  halfLengthPt: number,
  width: number,
): void {
  const axis = perpendicularAxis(along);
  const c = view.project(at);
  const tip = view.project(add(at, axis));
  const len = Math.hypot(tip.x - c.x, tip.y - c.y) || 1;
  const ux = (tip.x - c.x) / len;
  const uy = (tip.y - c.y) / len;
  doc
    .save()
    .lineWidth(width)
    .lineCap('butt')
    .strokeColor(INK.pipe)
    .moveTo(c.x - ux * halfLengthPt, c.y - uy * halfLengthPt)
    .lineTo(c.x + ux * halfLengthPt, c.y + uy * halfLengthPt)
    .stroke()
    .restore();
}

/** Draws one component's body in single-line isometric. */
export function drawComponentSymbol(
  doc: PDFKit.PDFDocument,
  view: IsoViewport,
  component: ComponentResult,
): void {
  const shape = component.shape;
  const width = isSmallBore(component) ? SMALL_BORE_WIDTH : PIPE_WIDTH;
  const ends = component.ends;
  switch (shape.type) {
    case 'elbow': {
      if (ends.length < 2) return;
      // A mitred bend is pipe: the engine lists its segments as pieces (drawn with the pipe) and
      // its joints as welds, so there is no fitting body to draw.
      if (shape.construction === 'mitre') return;
      strokePolyline(
        doc,
        view,
        arcPoints(shape.arcCentre, ends[0]!.point, ends[1]!.point, shape.planeNormal, 18),
        width,
      );
      return;
    }
    case 'return': {
      if (ends.length >= 2) {
        const apex = add(shape.arcCentre, scale(normalise(ends[0]!.outward), -shape.bendRadiusMm));
        strokePolyline(
          doc,
          view,
          arcPoints(shape.arcCentre, ends[0]!.point, ends[1]!.point, shape.planeNormal, 24, apex),
          width,
        );
      }
      return;
    }
    case 'tee':
    case 'set-on-branch':
    case 'branch-connection':
    case 'socket-fitting':
      for (const end of ends) strokePolyline(doc, view, [component.position, end.point], width);
      if (shape.type === 'branch-connection') {
        // Half coupling / outlet: a short block across the branch.
        const tip = ends.find((e) => e.runId === null) ?? ends[ends.length - 1];
        if (tip) strokeBar(doc, view, tip.point, tip.outward, 4, 2.2);
        strokeBar(doc, view, add(component.position, scale(shape.branchAxis, 1)), shape.branchAxis, 3, 2.2);
      }
      return;
    case 'reducer': {
      strokePolyline(doc, view, [shape.largeEnd, shape.smallEnd], width);
      const a = view.project(shape.largeEnd);
      const b = view.project(shape.smallEnd);
      const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
      const nx = -(b.y - a.y) / len;
      const ny = (b.x - a.x) / len;
      const big = 6;
      const small = 3;
      doc
        .save()
        .lineWidth(0.9)
        .strokeColor(INK.pipe)
        .moveTo(a.x + nx * big, a.y + ny * big)
        .lineTo(b.x + nx * small, b.y + ny * small)
        .lineTo(b.x - nx * small, b.y - ny * small)
        .lineTo(a.x - nx * big, a.y - ny * big)
        .closePath()
        .stroke()
        .restore();
      return;
    }
    case 'flange': {
      const weldEnd = ends.find((e) => e.runId !== null) ?? ends[0];
      if (weldEnd) strokePolyline(doc, view, [weldEnd.point, shape.faceCentre], width);
      const half = Math.max(6, Math.min(16, ((shape.odMm ?? 200) / 2) * view.scale));
      strokeBar(doc, view, shape.faceCentre, shape.outward, half, 2.4);
      if (weldEnd)
        strokeBar(
          doc,
          view,
          lerpTowards(shape.faceCentre, weldEnd.point, 0.35),
          shape.outward,
          half * 0.55,
          1.2,
        );
      if (shape.blind)
        strokeBar(
          doc,
          view,
          add(shape.faceCentre, scale(shape.outward, 6 / Math.max(view.scale, 1e-6))),
          shape.outward,
          half,
          3,
        );
      return;
    }
    case 'cap':
      for (const end of ends) strokePolyline(doc, view, [end.point, component.position], width);
      strokeBar(doc, view, component.position, shape.axis, 5, 2.4);
      return;
    case 'open-end':
      return;
  }
}

function lerpTowards(a: Vec3, b: Vec3, t: number): Vec3 {
  return add(a, scale(sub(b, a), t));
}

function isSmallBore(component: ComponentResult): boolean {
  const nps = component.nps;
  return nps === '1/2' || nps === '3/4' || nps === '1' || nps === '1-1/4' || nps === '1-1/2';
}
