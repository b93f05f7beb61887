import type { FontRole } from './fonts';
import type { FlowBlock, Placement } from './flow-layout';
import type { Rect } from './page-setup';
import { INK } from './sheet-style';
import { drawText, measureWrapped } from './text';

export interface TableColumn {
  header: string;
  /** Relative width; the table shares its area's width by these weights. */
  weight: number;
  align?: 'left' | 'center' | 'right';
  font?: FontRole;
}

export interface TableRow {
  cells: string[];
  emphasis?: 'total' | 'warn' | 'group';
}

export interface TableSpec {
  title: string;
  columns: TableColumn[];
  rows: TableRow[];
  /** Printed under the last row: what the numbers include, sort order, units. */
  footnote?: string;
  size: number;
}

/** A titled table that splits across columns and pages, repeating its header row. */
export function tableBlock(spec: TableSpec, startRow = 0): FlowBlock {
  return {
    place(doc: PDFKit.PDFDocument, area: Rect, fresh: boolean): Placement {
      const size = spec.size;
      const titleH = size * 1.25 + 3;
      const rowH = size * 1.5;
      const headerH = rowH;
      const footH = spec.footnote ? measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 }) + 3 : 0;
      const remainingRows = spec.rows.length - startRow;
      const available = area.h - titleH - headerH;
      let fit = Math.floor(available / rowH);
      if (fit >= remainingRows && available - remainingRows * rowH < footH) {
        // Rows fit but the footnote would not: keep the last row with its footnote.
        fit = remainingRows - 1;
      }
      if (fit < Math.min(2, remainingRows) && !fresh) return { used: 0, rest: this };
      fit = Math.max(fresh ? 1 : 0, Math.min(fit, remainingRows));
      if (remainingRows === 0) fit = 0;

      const totalWeight = spec.columns.reduce((s, c) => s + c.weight, 0);
      const widths = spec.columns.map((c) => (c.weight / totalWeight) * area.w);
      const pad = 2.5;

      let y = area.y;
      const title = startRow > 0 ? `${spec.title} (continued)` : spec.title;
      drawText(doc, title.toUpperCase(), area.x, y, { font: 'cond-bold', size: size * 1.2, color: INK.black, width: area.w });
      y += titleH;

      doc.save();
      doc.rect(area.x, y, area.w, headerH).fill(INK.header);
      let x = area.x;
      spec.columns.forEach((c, i) => {
        drawText(doc, c.header, x + pad, y + (headerH - size) / 2, {
          font: 'cond-semibold',
          size,
          color: INK.black,
          width: widths[i]! - 2 * pad,
          align: c.align ?? 'left',
        });
        x += widths[i]!;
      });
      y += headerH;

      for (let r = startRow; r < startRow + fit; r += 1) {
        const row = spec.rows[r]!;
        if (row.emphasis === 'warn') doc.rect(area.x, y, area.w, rowH).fill(INK.warnFill);
        else if (row.emphasis === 'group') doc.rect(area.x, y, area.w, rowH).fill(INK.fill);
        else if ((r - startRow) % 2 === 1) doc.rect(area.x, y, area.w, rowH).fill('#f7f7f7');
        x = area.x;
        spec.columns.forEach((c, i) => {
          const bold = row.emphasis === 'total' || row.emphasis === 'group';
          const font: FontRole = bold ? (c.font === 'mono' ? 'mono-bold' : 'body-bold') : (c.font ?? 'body');
          drawText(doc, row.cells[i] ?? '', x + pad, y + (rowH - size) / 2, {
            font,
            size,
            color: row.emphasis === 'warn' ? INK.warn : INK.text,
            width: widths[i]! - 2 * pad,
            align: c.align ?? 'left',
          });
          x += widths[i]!;
        });
        if (row.emphasis === 'total') {
          doc.lineWidth(0.8).strokeColor(INK.black).moveTo(area.x, y).lineTo(area.x + area.w, y).stroke();
        }
        y += rowH;
      }
      doc.lineWidth(0.6).strokeColor(INK.rule).rect(area.x, area.y + titleH, area.w, y - area.y - titleH).stroke();
      doc.restore();

      const done = startRow + fit >= spec.rows.length;
      if (spec.rows.length === 0) {
        drawText(doc, 'None.', area.x + pad, y + 2, { size, color: INK.muted });
        y += rowH;
      }
      if (done && spec.footnote) {
        y += 2;
        y += measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 });
        drawText(doc, spec.footnote, area.x, y - measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 }), {
          size: size * 0.85,
          color: INK.muted,
          width: area.w,
          wrap: true,
        });
      }
      return { used: y - area.y, rest: done ? null : tableBlock(spec, startRow + fit) };
    },
  };
}
