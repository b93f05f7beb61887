import { mm } from './page-setup';
import { INK } from './sheet-style';
import { drawText, measureWidth, MIN_TEXT_PT } from './text';

/** Where a scale check bar was drawn, in PDF points (origin top-left): exposed so tests can measure it. */
export interface ScaleBarGeometry {
  x: number;
  y: number;
  width: number;
  height: number;
  /** What the bar stands for, in millimetres. */
  lengthMm: number;
}

/**
 * Draws a "this bar is 100 mm" check bar in 10 mm black/white segments, and for inch shops a
 * 4 inch bar under it. A template printed with "fit to page" is wrong by a few percent, which is a
 * bad cut: the bar is how the fitter checks the print before trusting it.
 */
export function drawScaleBar(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  size: number,
  withInches: boolean,
): { bars: ScaleBarGeometry[]; height: number } {
  const bars: ScaleBarGeometry[] = [];
  const barH = mm(3);
  let yy = y;
  drawText(
    doc,
    'THIS BAR IS 100 mm. Measure it before cutting: if it is not 100 mm, reprint at 100 % (actual size).',
    x,
    yy,
    {
      font: 'body-semibold',
      size,
      color: INK.black,
    },
  );
  yy += size * 1.4;
  bars.push(segmentedBar(doc, x, yy, 100, 10, barH, (i) => `${i * 10}`, size * 0.8));
  yy += barH + size + 2;
  if (withInches) {
    bars.push(segmentedBar(doc, x, yy, 101.6, 25.4, barH, (i) => `${i}"`, size * 0.8));
    const caption = 'This bar is 4 in.';
    const captionStyle = { size: size * 0.85, color: INK.muted };
    yy += barH + size + 2;
    // Beside the bar when the page has room, else under its ticks (never past the page edge).
    if (x + mm(104) + measureWidth(doc, caption, captionStyle) <= doc.page.width - mm(5)) {
      drawText(doc, caption, x + mm(104), yy - barH - size - 3, captionStyle);
    } else {
      drawText(doc, caption, x, yy, captionStyle);
      yy += Math.max(MIN_TEXT_PT, size * 0.85) * 1.2 + 2;
    }
  }
  return { bars, height: yy - y };
}

function segmentedBar(
  doc: PDFKit.PDFDocument,
  x: number,
  y: number,
  lengthMm: number,
  stepMm: number,
  barH: number,
  tick: (i: number) => string,
  labelSize: number,
): ScaleBarGeometry {
  const steps = Math.round(lengthMm / stepMm);
  doc.save();
  for (let i = 0; i < steps; i += 1) {
    if (i % 2 === 0) doc.rect(x + mm(i * stepMm), y, mm(stepMm), barH).fill(INK.black);
  }
  doc.lineWidth(0.5).strokeColor(INK.black).rect(x, y, mm(lengthMm), barH).stroke();
  for (let i = 0; i <= steps; i += 1) {
    drawText(doc, tick(i), x + mm(i * stepMm) - 10, y + barH + 1, {
      size: labelSize,
      width: 20,
      align: 'center',
      color: INK.muted,
    });
  }
  doc.restore();
  return { x, y, width: mm(lengthMm), height: barH, lengthMm };
}
