import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { mm, type Rect } from './page-setup';
import { drawScaleBar, type ScaleBarGeometry } from './scale-bar';
import type { SheetDocument } from './sheet-document';
import { SHORT_CAUTION } from './sheet-cautions';
import { INK, typeSizes } from './sheet-style';
import type { TemplateFigure, TemplatePoint } from './template-figures';
import { drawText, measureWrapped } from './text';

/** What the template pages drew: per page, its scale bars (for checking the print scale). */
export interface TemplatePagesReport {
  pages: { pageIndex: number; figure: string; tile: string; scaleBars: ScaleBarGeometry[] }[];
}

const OVERLAP_MM = 10;

/**
 * Prints each template at full size (1 mm on the template = 1 mm on paper), tiled across as
 * many pages as it needs with a 10 mm overlap and join marks, each page carrying its scale bar.
 */
export function drawTemplatePages(
  sheet: SheetDocument,
  figures: TemplateFigure[],
  units: LengthUnits,
  topInset: number,
): TemplatePagesReport {
  const report: TemplatePagesReport = { pages: [] };
  const sizes = typeSizes(sheet.setup);
  for (const figure of figures) {
    const probe = sheet.contentArea();
    const stripH = headerStripHeight(sheet.doc, figure, probe.w, sizes.body, units);
    const figArea: Rect = { x: probe.x + 4, y: probe.y + topInset + stripH, w: probe.w - 8, h: probe.h - topInset - stripH - 4 };
    const tileW = figArea.w / mm(1);
    const tileH = figArea.h / mm(1);
    const nx = Math.max(1, Math.ceil((figure.widthMm - OVERLAP_MM) / (tileW - OVERLAP_MM)));
    const ny = Math.max(1, Math.ceil((figure.heightMm - OVERLAP_MM) / (tileH - OVERLAP_MM)));
    for (let row = 0; row < ny; row += 1) {
      for (let col = 0; col < nx; col += 1) {
        const tileName = `${String.fromCharCode(65 + row)}${col + 1}`;
        const area = sheet.addPage(`Template 1:1 · ${figure.kind} · tile ${tileName} of ${nx * ny}`);
        const doc = sheet.doc;
        // Header strip: title, tile, instructions, scale bar.
        let y = area.y + topInset + 4;
        drawText(doc, `${figure.title} — FULL SIZE 1:1`, area.x + 6, y, { font: 'cond-bold', size: sizes.heading * 1.2, width: area.w * 0.6 });
        drawText(doc, `Tile ${tileName} of ${nx * ny} (${ny} row${ny > 1 ? 's' : ''} × ${nx} column${nx > 1 ? 's' : ''}) · overlap ${formatLength(OVERLAP_MM, units)} at joins`, area.x + 6, y + sizes.heading * 1.5, {
          font: 'body-semibold',
          size: sizes.body,
          width: area.w * 0.6,
        });
        const instrY = y + sizes.heading * 1.5 + sizes.body * 1.6;
        const text = [...figure.instructions, ...figure.facts, SHORT_CAUTION].join('  ');
        drawText(doc, text, area.x + 6, instrY, { size: sizes.small, width: area.w * 0.6 - 6, wrap: true, lineGap: 0.5 });
        const bar = drawScaleBar(doc, area.x + area.w * 0.62, y, sizes.body, units === 'ft-in');
        report.pages.push({ pageIndex: sheet.pageCount - 1, figure: figure.title, tile: tileName, scaleBars: bar.bars });
        y = figArea.y;

        // The tile: figure space [ox, ox + tileW] × [oy, oy + tileH] mm.
        const ox = col * (tileW - OVERLAP_MM);
        const oy = row * (tileH - OVERLAP_MM);
        drawTile(doc, figArea, figure, ox, oy, units, sizes.small);
        // Join marks in the overlap zones.
        doc.save().lineWidth(0.5).strokeColor(INK.muted).dash(4, { space: 3 });
        if (col > 0) doc.moveTo(figArea.x + mm(OVERLAP_MM), figArea.y).lineTo(figArea.x + mm(OVERLAP_MM), figArea.y + figArea.h).stroke();
        if (col < nx - 1) doc.moveTo(figArea.x + figArea.w - mm(OVERLAP_MM), figArea.y).lineTo(figArea.x + figArea.w - mm(OVERLAP_MM), figArea.y + figArea.h).stroke();
        if (row > 0) doc.moveTo(figArea.x, figArea.y + mm(OVERLAP_MM)).lineTo(figArea.x + figArea.w, figArea.y + mm(OVERLAP_MM)).stroke();
        if (row < ny - 1) doc.moveTo(figArea.x, figArea.y + figArea.h - mm(OVERLAP_MM)).lineTo(figArea.x + figArea.w, figArea.y + figArea.h - mm(OVERLAP_MM)).stroke();
        doc.undash().restore();
        const joinStyle = { font: 'cond-semibold' as const, size: sizes.small, color: INK.muted };
        if (col > 0) drawText(doc, `◄ lay over tile ${String.fromCharCode(65 + row)}${col} to this dashed line`, figArea.x + mm(OVERLAP_MM) + 3, figArea.y + 3, joinStyle);
        if (col < nx - 1) {
          const label = `tile ${String.fromCharCode(65 + row)}${col + 2} overlaps from here ►`;
          doc.font('cond-semibold').fontSize(sizes.small);
          drawText(doc, label, figArea.x + figArea.w - mm(OVERLAP_MM) - doc.widthOfString(label) - 3, figArea.y + figArea.h - sizes.small - 3, joinStyle);
        }
        if (row > 0) drawText(doc, `▲ lay over tile ${String.fromCharCode(64 + row)}${col + 1} to this dashed line`, figArea.x + 3, figArea.y + mm(OVERLAP_MM) + 3, joinStyle);
        doc.save().lineWidth(0.6).strokeColor(INK.rule).rect(figArea.x, figArea.y, figArea.w, figArea.h).stroke().restore();
      }
    }
  }
  return report;
}

function headerStripHeight(doc: PDFKit.PDFDocument, figure: TemplateFigure, width: number, size: number, units: LengthUnits): number {
  const text = [...figure.instructions, ...figure.facts, SHORT_CAUTION].join('  ');
  const textH = measureWrapped(doc, text, width * 0.6 - 6, { size: size * 0.88, lineGap: 0.5 });
  const barH = units === 'ft-in' ? mm(26) : mm(16);
  return Math.max(textH + size * 4.5, barH) + 8;
}

function drawTile(doc: PDFKit.PDFDocument, area: Rect, figure: TemplateFigure, ox: number, oy: number, units: LengthUnits, size: number): void {
  // Figure mm → page pt at exactly 1:1.
  const P = (p: TemplatePoint) => ({
    x: area.x + mm(figure.originMm.x + p.x - ox),
    y: area.y + mm(figure.originMm.y + p.y - oy),
  });
  doc.save();
  doc.rect(area.x, area.y, area.w, area.h).clip();

  // Figure border (cut-out edge of the paper template).
  const tl = P({ x: -figure.originMm.x + 4, y: -figure.originMm.y + 4 });
  doc.lineWidth(0.4).strokeColor(INK.faint).rect(tl.x, tl.y, mm(figure.widthMm - 8), mm(figure.heightMm - 8)).stroke();

  for (const guide of figure.guides) {
    const a = P(guide.from);
    const b = P(guide.to);
    doc.lineWidth(0.8).strokeColor(INK.black).moveTo(a.x, a.y).lineTo(b.x, b.y).stroke();
    drawText(doc, guide.label, Math.min(a.x, b.x) + 4, Math.min(a.y, b.y) - size - 2, { font: 'cond-semibold', size, color: INK.black });
  }
  if (figure.wrapEndMm !== null) {
    const a = P({ x: figure.wrapEndMm, y: -6 });
    const b = P({ x: figure.wrapEndMm, y: figure.heightMm - figure.originMm.y - 6 });
    doc.lineWidth(0.8).strokeColor(INK.black).dash(2, { space: 2 }).moveTo(a.x, a.y).lineTo(b.x, b.y).stroke().undash();
    drawText(doc, 'END OF WRAP: tape tab under station 0', a.x + 3, a.y + 2, { font: 'cond-semibold', size, color: INK.muted, width: mm(18), wrap: true });
  }
  // Station lines and ordinates.
  for (const s of figure.stations) {
    const a = P({ x: s.x, y: 0 });
    const b = P({ x: s.x, y: s.y });
    doc.lineWidth(0.35).strokeColor(INK.muted).moveTo(a.x, a.y).lineTo(b.x, b.y).stroke();
    drawText(doc, s.label, a.x - 10, a.y - size - 1.5, { font: 'cond-bold', size, width: 20, align: 'center' });
    doc.save();
    doc.rotate(90, { origin: [b.x, b.y] });
    drawText(doc, formatLength(s.ordinateMm, units), b.x + 3, b.y - size - 1, { font: 'cond-semibold', size: size * 0.95, color: INK.dim });
    doc.restore();
  }
  // The cut line.
  if (figure.outline.length > 1) {
    const first = P(figure.outline[0]!);
    doc.lineWidth(1.4).strokeColor(INK.black).lineJoin('round').moveTo(first.x, first.y);
    for (const p of figure.outline.slice(1)) {
      const q = P(p);
      doc.lineTo(q.x, q.y);
    }
    if (figure.closed) doc.closePath();
    doc.stroke();
    const label = P(figure.outline[Math.floor(figure.outline.length / 4)]!);
    drawText(doc, 'CUT LINE', label.x + 4, label.y + 3, { font: 'cond-bold', size, color: INK.black });
  }
  doc.restore();
}
