import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import type { PagePoint } from './dimension-line';
import { isoProjectDirection, PLANT_AXES as AXES, type IsoViewport } from './iso-projection';
import type { LabelPlacer } from './label-placer';
import type { Rect } from './page-setup';
import { INK, type TypeSizes } from './sheet-style';
import { drawText } from './text';

/** An axis-aligned box centred on a point. */
export function boxAround(c: PagePoint, w: number, h: number): Rect {
  return { x: c.x - w / 2, y: c.y - h / 2, w, h };
}

/** Unit normal of the page segment a→b. */
export function normalTo(a: PagePoint, b: PagePoint): PagePoint {
  const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  return { x: -(b.y - a.y) / l, y: (b.x - a.x) / l };
}

/** Mean page position of projected points. */
export function pageCentroid(view: IsoViewport, points: Vec3[]): PagePoint {
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
export function reserveSegment(placer: LabelPlacer, a: PagePoint, b: PagePoint): void {
  const steps = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / 12));
  for (let i = 0; i <= steps; i += 1) {
    const t = i / steps;
    placer.reserve(boxAround({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t }, 6, 6));
  }
}

/** A tag (piece mark box, flange hexagon, weld balloon) near a point with a short leader. */
export function tagLabel(
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

/** North arrow with E and UP axes; returns the box it covers. */
export function drawNorthArrow(doc: PDFKit.PDFDocument, origin: PagePoint, sizes: TypeSizes): Rect {
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
