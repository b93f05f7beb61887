import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { mm, type Rect } from './page-setup';
import { drawScaleBar, type ScaleBarGeometry } from './scale-bar';
import type { SheetDocument } from './sheet-document';
import { SHORT_CAUTION } from './sheet-cautions';
import { INK, typeSizes } from './sheet-style';
import type { TemplateFigure, TemplatePoint } from './template-figures';
import { drawText, measureWidth, measureWrapped, MIN_TEXT_PT } from './text';

/** What the template pages drew: per page, its scale bars (for checking the print scale). */
export interface TemplatePagesReport {
  pages: {
    pageIndex: number;
    figure: string;
    tiles: string[];
    tileCount: number;
    scaleBars: ScaleBarGeometry[];
  }[];
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
  const labelH = sizes.small + 4;
  const gapMm = 6;
  for (const figure of figures) {
    const probe = sheet.contentArea();
    const stripH = headerStripHeight(sheet.doc, figure, probe.w, sizes.body, units);
    const usable: Rect = {
      x: probe.x + 4,
      y: probe.y + topInset + stripH,
      w: probe.w - 8,
      h: probe.h - topInset - stripH - 4,
    };
    const areaW = usable.w / mm(1);
    const areaH = (usable.h - labelH) / mm(1);
    const tiles = tileFigure(figure, areaW, areaH);
    const total = tiles.length;
    // Stack as many tiles on a page as fit one under the other: a long, shallow wrap template
    // becomes strips on one sheet instead of one strip per sheet.
    let index = 0;
    while (index < tiles.length) {
      const onPage: Tile[] = [];
      let used = 0;
      while (index < tiles.length) {
        const need = mm(tiles[index]!.h) + labelH + (onPage.length > 0 ? mm(gapMm) : 0);
        if (onPage.length > 0 && used + need > usable.h) break;
        onPage.push(tiles[index]!);
        used += need;
        index += 1;
      }
      const names = onPage.map((t) => t.name).join(', ');
      const area = sheet.addPage(
        `Template 1:1 · ${figure.kind} · tile${onPage.length > 1 ? 's' : ''} ${names} of ${total}`,
      );
      const doc = sheet.doc;
      const y = area.y + topInset + 4;
      drawText(doc, `${figure.title} — FULL SIZE 1:1`, area.x + 6, y, {
        font: 'cond-bold',
        size: sizes.heading * 1.2,
        width: area.w * 0.6,
      });
      drawText(
        doc,
        total > 1
          ? `${total} tiles, overlap ${formatLength(OVERLAP_MM, units)} at each join: cut each tile out, lay them edge over dashed line, tape.`
          : 'One piece: cut it out along its border.',
        area.x + 6,
        y + sizes.heading * 1.5,
        { font: 'body-semibold', size: sizes.body, width: area.w * 0.6 },
      );
      const text = [...figure.instructions, ...figure.facts, SHORT_CAUTION].join('  ');
      drawText(doc, text, area.x + 6, y + sizes.heading * 1.5 + sizes.body * 1.6, {
        size: sizes.small,
        width: area.w * 0.6 - 6,
        wrap: true,
        lineGap: 0.5,
      });
      const bar = drawScaleBar(doc, area.x + area.w * 0.62, y, sizes.body, units === 'ft-in');
      report.pages.push({
        pageIndex: sheet.pageCount - 1,
        figure: figure.title,
        tiles: onPage.map((t) => t.name),
        tileCount: total,
        scaleBars: bar.bars,
      });

      let ty = usable.y;
      for (const tile of onPage) {
        // One line above the tile says which it is and what laps onto its left and top edges
        // (kept out of the figure, where notes would print over ordinates).
        if (total > 1)
          drawText(doc, tileCaption(tile, total), usable.x, ty, {
            font: 'cond-bold',
            size: sizes.small,
            color: INK.black,
            width: usable.w,
          });
        const box: Rect = { x: usable.x, y: ty + labelH, w: mm(tile.w), h: mm(tile.h) };
        drawTile(doc, box, figure, tile.x, tile.y, units, sizes.small);
        drawJoinMarks(doc, box, tile, sizes.small);
        ty += labelH + mm(tile.h) + mm(gapMm);
      }
    }
  }
  return report;
}

/** One piece of a template as printed: its window on the figure, mm, and its neighbours. */
interface Tile {
  name: string;
  x: number;
  y: number;
  w: number;
  h: number;
  left: string | null;
  right: string | null;
  above: string | null;
  below: string | null;
}

/** Cuts a figure into windows no larger than the printable area, overlapping by 10 mm. */
export function tileFigure(
  figure: Pick<TemplateFigure, 'widthMm' | 'heightMm'>,
  areaW: number,
  areaH: number,
): Tile[] {
  const nx = figure.widthMm <= areaW ? 1 : Math.ceil((figure.widthMm - OVERLAP_MM) / (areaW - OVERLAP_MM));
  const ny = figure.heightMm <= areaH ? 1 : Math.ceil((figure.heightMm - OVERLAP_MM) / (areaH - OVERLAP_MM));
  const name = (r: number, c: number) => `${String.fromCharCode(65 + r)}${c + 1}`;
  const tiles: Tile[] = [];
  for (let r = 0; r < ny; r += 1) {
    for (let c = 0; c < nx; c += 1) {
      const x = c * (areaW - OVERLAP_MM);
      const y = r * (areaH - OVERLAP_MM);
      tiles.push({
        name: name(r, c),
        x,
        y,
        w: Math.min(areaW, figure.widthMm - x),
        h: Math.min(areaH, figure.heightMm - y),
        left: c > 0 ? name(r, c - 1) : null,
        right: c < nx - 1 ? name(r, c + 1) : null,
        above: r > 0 ? name(r - 1, c) : null,
        below: r < ny - 1 ? name(r + 1, c) : null,
      });
    }
  }
  return tiles;
}

/** "Tile B2 of 8 · joins B1 on the left · lay A2 over the top edge, up to the dashed line". */
function tileCaption(tile: Tile, total: number): string {
  const parts = [`Tile ${tile.name} of ${total}`];
  if (tile.left) parts.push(`joins ${tile.left} on the left`);
  if (tile.above) parts.push(`lay ${tile.above} over the top edge, up to the dashed line`);
  return parts.join(' · ');
}

function drawJoinMarks(doc: PDFKit.PDFDocument, box: Rect, tile: Tile, size: number): void {
  const ov = mm(OVERLAP_MM);
  doc.save().lineWidth(0.5).strokeColor(INK.muted).dash(4, { space: 3 });
  if (tile.left)
    doc
      .moveTo(box.x + ov, box.y)
      .lineTo(box.x + ov, box.y + box.h)
      .stroke();
  if (tile.right)
    doc
      .moveTo(box.x + box.w - ov, box.y)
      .lineTo(box.x + box.w - ov, box.y + box.h)
      .stroke();
  if (tile.above)
    doc
      .moveTo(box.x, box.y + ov)
      .lineTo(box.x + box.w, box.y + ov)
      .stroke();
  if (tile.below)
    doc
      .moveTo(box.x, box.y + box.h - ov)
      .lineTo(box.x + box.w, box.y + box.h - ov)
      .stroke();
  doc.undash().restore();
  const style = { font: 'cond-semibold' as const, size, color: INK.muted };
  const rightText = (t: string, yy: number) => {
    doc.font('cond-semibold').fontSize(size);
    drawText(doc, t, box.x + box.w - doc.widthOfString(t) - 3, yy, style);
  };
  if (tile.right) rightText(`Lay ${tile.right} over this end, up to the dashed line`, box.y + box.h + 2);
  doc.save().lineWidth(0.6).strokeColor(INK.rule).rect(box.x, box.y, box.w, box.h).stroke().restore();
}

function headerStripHeight(
  doc: PDFKit.PDFDocument,
  figure: TemplateFigure,
  width: number,
  size: number,
  units: LengthUnits,
): number {
  const text = [...figure.instructions, ...figure.facts, SHORT_CAUTION].join('  ');
  const textH = measureWrapped(doc, text, width * 0.6 - 6, { size: size * 0.88, lineGap: 0.5 });
  const barH = units === 'ft-in' ? mm(26) : mm(16);
  return Math.max(textH + size * 4.5, barH) + 8;
}

function drawTile(
  doc: PDFKit.PDFDocument,
  area: Rect,
  figure: TemplateFigure,
  ox: number,
  oy: number,
  units: LengthUnits,
  size: number,
): void {
  // Figure mm → page pt at exactly 1:1.
  const P = (p: TemplatePoint) => ({
    x: area.x + mm(figure.originMm.x + p.x - ox),
    y: area.y + mm(figure.originMm.y + p.y - oy),
  });
  // Text is drawn only where it fits whole inside the tile: the tile is clipped, and a figure
  // cut in half at a tile edge could be misread (the neighbouring tile, which overlaps this one,
  // carries it). Ordinates slide along their station line to stay inside.
  const fits = (x0: number, y0: number, w: number, h: number) =>
    x0 >= area.x + 1 && y0 >= area.y + 1 && x0 + w <= area.x + area.w - 1 && y0 + h <= area.y + area.h - 1;
  doc.save();
  doc.rect(area.x, area.y, area.w, area.h).clip();

  // Figure border (cut-out edge of the paper template).
  const tl = P({ x: -figure.originMm.x + 4, y: -figure.originMm.y + 4 });
  doc
    .lineWidth(0.4)
    .strokeColor(INK.faint)
    .rect(tl.x, tl.y, mm(figure.widthMm - 8), mm(figure.heightMm - 8))
    .stroke();

  for (const guide of figure.guides) {
    const a = P(guide.from);
    const b = P(guide.to);
    doc.lineWidth(0.8).strokeColor(INK.black).moveTo(a.x, a.y).lineTo(b.x, b.y).stroke();
    // Over a station row the label goes above the station numbers.
    const lift = figure.stations.length > 0 ? 2 * size + 5 : size + 2;
    const gx = Math.max(Math.min(a.x, b.x), area.x) + 4;
    const gy = Math.min(a.y, b.y) - lift;
    if (fits(gx, gy, measureWidth(doc, guide.label, { font: 'cond-semibold', size }), size * 1.2))
      drawText(doc, guide.label, gx, gy, {
        font: 'cond-semibold',
        size,
        color: INK.black,
      });
  }
  if (figure.wrapEndMm !== null) {
    const a = P({ x: figure.wrapEndMm, y: -6 });
    const b = P({ x: figure.wrapEndMm, y: figure.heightMm - figure.originMm.y - 6 });
    doc
      .lineWidth(0.8)
      .strokeColor(INK.black)
      .dash(2, { space: 2 })
      .moveTo(a.x, a.y)
      .lineTo(b.x, b.y)
      .stroke()
      .undash();
    const endStyle = { font: 'cond-semibold' as const, size, color: INK.muted, width: mm(18), wrap: true };
    const endText = 'END OF WRAP: tape tab under station 0';
    if (fits(a.x + 3, a.y + 2, mm(18), measureWrapped(doc, endText, mm(18), endStyle)))
      drawText(doc, endText, a.x + 3, a.y + 2, endStyle);
  }
  // Station lines and ordinates.
  for (const s of figure.stations) {
    const a = P({ x: s.x, y: 0 });
    const b = P({ x: s.x, y: s.y });
    doc.lineWidth(0.35).strokeColor(INK.muted).moveTo(a.x, a.y).lineTo(b.x, b.y).stroke();
    if (fits(a.x - 10, a.y - size - 1.5, 20, size * 1.2))
      drawText(doc, s.label, a.x - 10, a.y - size - 1.5, {
        font: 'cond-bold',
        size,
        width: 20,
        align: 'center',
      });
    // The ordinate reads down the station line from the cut (turned 90°), right of the line.
    const ordinate = formatLength(s.ordinateMm, units);
    const ordW = measureWidth(doc, ordinate, { font: 'cond-semibold', size: size * 0.95 });
    const ordH = Math.max(size * 0.95, MIN_TEXT_PT) * 1.2;
    let start = b.y + 3;
    if (start + ordW > area.y + area.h - 2) start = b.y - 3 - ordW; // past the tile's lower edge: read up to the cut
    if (fits(b.x + 1, start, ordH, ordW)) {
      doc.save();
      doc.rotate(90, { origin: [b.x, start - 3] });
      drawText(doc, ordinate, b.x + 3, start - 3 - size - 1, {
        font: 'cond-semibold',
        size: size * 0.95,
        color: INK.dim,
      });
      doc.restore();
    }
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
    // Above the cut, between two stations: the ordinates hang below it.
    const labelW = measureWidth(doc, 'CUT LINE', { font: 'cond-bold', size });
    const gaps = figure.stations.map((st) => P({ x: st.x, y: 0 }).x).sort((m, n) => m - n);
    for (const frac of [0.25, 0.4, 0.6, 0.75, 0.1, 0.9]) {
      const label = P(figure.outline[Math.floor((figure.outline.length - 1) * frac)]!);
      const lx = label.x + 4;
      const ly = label.y - size * 1.2 - 3;
      const clearOfStations = gaps.every((gx) => gx < lx - 2 || gx > lx + labelW + size + 2);
      if (clearOfStations && fits(lx, ly, labelW, size * 1.2)) {
        drawText(doc, 'CUT LINE', lx, ly, { font: 'cond-bold', size, color: INK.black });
        break;
      }
    }
  }
  doc.restore();
}
