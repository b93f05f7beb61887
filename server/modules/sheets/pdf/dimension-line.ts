import { INK } from './sheet-style';

export interface PagePoint {
  x: number;
  y: number;
}

export interface DimensionStyle {
  size: number;
  color?: string;
}

/**
 * Draws a dimension between two page points: extension lines out to the dimension line at
 * `offset` (a page vector), arrowheads, and the value centred along the line, turned to read
 * upright, on a white ground so crossing pipe lines don't hide a digit.
 * Returns the text's box centre and size for the label placer.
 */
export function drawDimension(
  doc: PDFKit.PDFDocument,
  a: PagePoint,
  b: PagePoint,
  offset: PagePoint,
  text: string,
  style: DimensionStyle,
): { centre: PagePoint; width: number; height: number } {
  return drawDimensionBetween(
    doc,
    a,
    b,
    { x: a.x + offset.x, y: a.y + offset.y },
    { x: b.x + offset.x, y: b.y + offset.y },
    text,
    style,
  );
}

/**
 * Like {@link drawDimension}, with the dimension line's ends given: for overall dimensions,
 * whose extension lines start at different distances from the line.
 */
export function drawDimensionBetween(
  doc: PDFKit.PDFDocument,
  a: PagePoint,
  b: PagePoint,
  a2: PagePoint,
  b2: PagePoint,
  text: string,
  style: DimensionStyle,
): { centre: PagePoint; width: number; height: number } {
  const color = style.color ?? INK.dim;
  const gap = 2.5; // extension lines start just off the object
  const over = 3; // and run past the dimension line
  const extension = (from: PagePoint, to: PagePoint) => {
    const l = Math.hypot(to.x - from.x, to.y - from.y);
    if (l < 1e-6) return;
    const u = { x: (to.x - from.x) / l, y: (to.y - from.y) / l };
    doc.moveTo(from.x + u.x * gap, from.y + u.y * gap).lineTo(to.x + u.x * over, to.y + u.y * over);
  };

  doc.save();
  doc.lineWidth(0.45).strokeColor(color);
  extension(a, a2);
  extension(b, b2);
  doc.stroke();
  doc.lineWidth(0.6).moveTo(a2.x, a2.y).lineTo(b2.x, b2.y).stroke();
  const len = Math.hypot(b2.x - a2.x, b2.y - a2.y);
  if (len > 1e-6) {
    const d = { x: (b2.x - a2.x) / len, y: (b2.y - a2.y) / len };
    arrowhead(doc, a2, d, color);
    arrowhead(doc, b2, { x: -d.x, y: -d.y }, color);
  }

  const mid = { x: (a2.x + b2.x) / 2, y: (a2.y + b2.y) / 2 };
  let angle = (Math.atan2(b2.y - a2.y, b2.x - a2.x) * 180) / Math.PI;
  if (angle > 90.5) angle -= 180;
  if (angle <= -90.5) angle += 180;
  doc.font('cond-bold').fontSize(style.size);
  const w = doc.widthOfString(text);
  const h = style.size;
  doc.rotate(angle, { origin: [mid.x, mid.y] });
  doc.rect(mid.x - w / 2 - 1.5, mid.y - h / 2 - 1, w + 3, h + 1.5).fill('#ffffff');
  doc.fillColor(color).text(text, mid.x - w / 2, mid.y - h / 2, { lineBreak: false });
  doc.restore();
  // Box of the rotated text, axis-aligned, for collision checks.
  const r = (angle * Math.PI) / 180;
  const bw = Math.abs(w * Math.cos(r)) + Math.abs(h * Math.sin(r));
  const bh = Math.abs(w * Math.sin(r)) + Math.abs(h * Math.cos(r));
  return { centre: mid, width: bw, height: bh };
}

function arrowhead(doc: PDFKit.PDFDocument, tip: PagePoint, dir: PagePoint, color: string): void {
  const l = 5;
  const w = 1.6;
  const bx = tip.x + dir.x * l;
  const by = tip.y + dir.y * l;
  doc
    .moveTo(tip.x, tip.y)
    .lineTo(bx - dir.y * w, by + dir.x * w)
    .lineTo(bx + dir.y * w, by - dir.x * w)
    .closePath()
    .fill(color);
}
