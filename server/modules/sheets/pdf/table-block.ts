import type { FontRole } from './fonts';
import type { FlowBlock, Placement } from './flow-layout';
import type { Rect } from './page-setup';
import { INK } from './sheet-style';
import { drawText, measureWidth, measureWrapped } from './text';

export interface TableColumn {
  header: string;
  /** Relative width; the table shares its area's width by these weights. */
  weight: number;
  align?: 'left' | 'center' | 'right';
  font?: FontRole;
  /** Let long values wrap onto more lines (descriptions) instead of being shortened. */
  wrap?: boolean;
  /** Draw an empty tick box in each body row (the cell text is ignored). */
  checkbox?: boolean;
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
      const footH = spec.footnote ? measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 }) + 3 : 0;
      const totalWeight = spec.columns.reduce((s, c) => s + c.weight, 0);
      const widths = spec.columns.map((c) => (c.weight / totalWeight) * area.w);
      const pad = 2.5;
      const lineH = size * 1.18;
      const headerH0 = rowH;
      // A cell wraps when its column says so or its text is wider than the cell: a value is
      // never shortened on a cut sheet (a clipped mark or length could be misread).
      const wraps = (c: TableColumn, i: number, value: string, font: FontRole): boolean =>
        (c.wrap ?? false) || measureWidth(doc, value, { size, font }) > widths[i]! - 2 * pad;
      const linesOf = (value: string, i: number, font: FontRole): number => {
        const h = measureWrapped(doc, value, widths[i]! - 2 * pad, { size, font });
        return Math.max(1, Math.round(h / doc.currentLineHeight()));
      };
      const cellFont = (c: TableColumn, row?: TableRow): FontRole => {
        const bold = row?.emphasis === 'total' || row?.emphasis === 'group';
        return bold ? (c.font === 'mono' ? 'mono-bold' : 'body-bold') : (c.font ?? 'body');
      };
      // Row heights: one line, or as many as the longest wrapped cell needs.
      const rowHeight = (row: TableRow): number => {
        let lines = 1;
        spec.columns.forEach((c, i) => {
          if (c.checkbox) return;
          const value = row.cells[i] ?? '';
          const font = cellFont(c, row);
          if (!wraps(c, i, value, font)) return;
          lines = Math.max(lines, linesOf(value, i, font));
        });
        return lines === 1 ? rowH : rowH + (lines - 1) * lineH;
      };
      const headerLines = Math.max(
        1,
        ...spec.columns.map((c, i) =>
          measureWidth(doc, c.header, { size, font: 'cond-semibold' }) > widths[i]! - 2 * pad
            ? linesOf(c.header, i, 'cond-semibold')
            : 1,
        ),
      );
      const headerH = headerLines === 1 ? headerH0 : headerH0 + (headerLines - 1) * lineH;
      const remainingRows = spec.rows.length - startRow;
      const available = area.h - titleH - headerH;
      let fit = 0;
      let rowsHeight = 0;
      for (let r = startRow; r < spec.rows.length; r += 1) {
        const h = rowHeight(spec.rows[r]!);
        if (rowsHeight + h > available) break;
        rowsHeight += h;
        fit += 1;
      }
      if (fit >= remainingRows && available - rowsHeight < footH) fit = remainingRows - 1; // keep the last row with its footnote
      if (!fresh && fit < remainingRows) {
        // Short tables move whole; long ones never leave one or two rows behind or ahead.
        if (remainingRows <= 6 || fit < 3) return { used: 0, rest: this };
        if (remainingRows - fit < 2) fit = remainingRows - 2;
      }
      fit = Math.max(fresh ? 1 : 0, Math.min(fit, remainingRows));
      if (remainingRows === 0) fit = 0;

      let y = area.y;
      const title = startRow > 0 ? `${spec.title} (continued)` : spec.title;
      drawText(doc, title.toUpperCase(), area.x, y, {
        font: 'cond-bold',
        size: size * 1.2,
        color: INK.black,
        width: area.w,
      });
      y += titleH;

      doc.save();
      doc.rect(area.x, y, area.w, headerH).fill(INK.header);
      let x = area.x;
      spec.columns.forEach((c, i) => {
        const wrapHeader =
          measureWidth(doc, c.header, { size, font: 'cond-semibold' }) > widths[i]! - 2 * pad;
        drawText(doc, c.header, x + pad, y + (headerH0 - size) / 2, {
          font: 'cond-semibold',
          size,
          color: INK.black,
          width: widths[i]! - 2 * pad,
          align: c.align ?? 'left',
          wrap: wrapHeader,
          lineGap: wrapHeader ? lineH - size * 1.2 : 0,
        });
        x += widths[i]!;
      });
      y += headerH;

      for (let r = startRow; r < startRow + fit; r += 1) {
        const row = spec.rows[r]!;
        const thisH = rowHeight(row);
        if (row.emphasis === 'warn') doc.rect(area.x, y, area.w, thisH).fill(INK.warnFill);
        else if (row.emphasis === 'group') doc.rect(area.x, y, area.w, thisH).fill(INK.fill);
        else if ((r - startRow) % 2 === 1) doc.rect(area.x, y, area.w, thisH).fill('#f7f7f7');
        x = area.x;
        spec.columns.forEach((c, i) => {
          const font = cellFont(c, row);
          if (c.checkbox) {
            if (!row.emphasis) {
              const b = size * 0.85;
              doc
                .lineWidth(0.7)
                .strokeColor(INK.black)
                .rect(x + (widths[i]! - b) / 2, y + (rowH - b) / 2, b, b)
                .stroke();
            }
            x += widths[i]!;
            return;
          }
          const value = row.cells[i] ?? '';
          const wrap = wraps(c, i, value, font);
          drawText(doc, value, x + pad, y + (rowH - size) / 2, {
            font,
            size,
            color: row.emphasis === 'warn' ? INK.warn : INK.text,
            width: widths[i]! - 2 * pad,
            align: c.align ?? 'left',
            wrap,
            lineGap: wrap ? lineH - size * 1.2 : 0,
          });
          x += widths[i]!;
        });
        if (row.emphasis === 'total') {
          doc
            .lineWidth(0.8)
            .strokeColor(INK.black)
            .moveTo(area.x, y)
            .lineTo(area.x + area.w, y)
            .stroke();
        }
        y += thisH;
      }
      doc
        .lineWidth(0.6)
        .strokeColor(INK.rule)
        .rect(area.x, area.y + titleH, area.w, y - area.y - titleH)
        .stroke();
      doc.restore();

      const done = startRow + fit >= spec.rows.length;
      if (spec.rows.length === 0) {
        drawText(doc, 'None.', area.x + pad, y + 2, { size, color: INK.muted });
        y += rowH;
      }
      if (done && spec.footnote) {
        y += 2;
        y += measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 });
        drawText(
          doc,
          spec.footnote,
          area.x,
          y - measureWrapped(doc, spec.footnote, area.w, { size: size * 0.85 }),
          {
            size: size * 0.85,
            color: INK.muted,
            width: area.w,
            wrap: true,
          },
        );
      }
      return { used: y - area.y, rest: done ? null : tableBlock(spec, startRow + fit) };
    },
  };
}
