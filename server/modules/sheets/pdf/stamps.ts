import type { Rect } from './page-setup';
import { INK } from './sheet-style';
import { printable } from './text';

/** A mark that tells the bay a sheet must not be built from as it stands. */
export type SheetStamp = 'DRAFT' | 'SUPERSEDED' | 'NOT FOR FABRICATION';

/**
 * Draws a large diagonal stamp across an area: outlined letters with a pale fill, so the drawing
 * under it stays readable but no one can miss it or photocopy it away.
 */
export function drawDiagonalStamp(doc: PDFKit.PDFDocument, area: Rect, text: string): void {
  const cx = area.x + area.w / 2;
  const cy = area.y + area.h / 2;
  const angle = (-Math.atan2(area.h, area.w) * 180) / Math.PI;
  const diagonal = Math.hypot(area.w, area.h);
  doc.save();
  doc.font('cond-bold');
  text = printable(doc, text);
  // Size the letters to ~75% of the diagonal.
  let size = 200;
  doc.fontSize(size);
  const natural = doc.widthOfString(text);
  size = Math.min(size * ((diagonal * 0.75) / natural), area.h * 0.45);
  doc.fontSize(size);
  const w = doc.widthOfString(text);
  doc.rotate(angle, { origin: [cx, cy] });
  doc
    .fillOpacity(0.07)
    .strokeOpacity(0.4)
    .lineWidth(Math.max(0.8, size / 90));
  doc.fillColor(INK.warn).strokeColor(INK.warn);
  doc.text(text, cx - w / 2, cy - size * 0.6, { lineBreak: false, fill: true, stroke: true });
  doc.restore();
}

/** Draws a solid warning band with white text across the top of an area; returns its height. */
export function drawWarningBand(doc: PDFKit.PDFDocument, area: Rect, text: string, size: number): number {
  const h = size + 8;
  doc.save();
  doc.rect(area.x, area.y, area.w, h).fill(INK.warn);
  doc.font('cond-bold').fontSize(size).fillColor('#ffffff');
  doc.text(printable(doc, text), area.x + 6, area.y + 4.5, {
    width: area.w - 12,
    align: 'center',
    lineBreak: false,
  });
  doc.restore();
  return h;
}
