import type { PageSetup } from './page-setup';
import { mm } from './page-setup';
import { drawQrCode } from './qr-code';
import type { RevisionHistoryEntry, RevisionState } from './sheet-header';
import { INK, typeSizes } from './sheet-style';
import { drawText, measureWidth, measureWrapped } from './text';

/** What the title block strip prints; built by each sheet kind (spool sheet, saw list). */
export interface TitleBlockFields {
  shopName: string;
  clientName: string;
  job: string;
  site: string;
  /** Big label over the mark, e.g. "Spool" or "Saw list". */
  markLabel: string;
  mark: string;
  subMark: string;
  revisionLetter: string | null;
  revisionState: RevisionState | null;
  history: RevisionHistoryEntry[];
  /** Label/value pairs: status, drawn, checked, date, units. A null value prints a line to sign on. */
  facts: Array<[string, string | null]>;
  qrUrl: string | null;
  /** Words under the QR code, e.g. "Scan: spool page". */
  qrCaption?: string;
  /** What this page holds, e.g. "Spool drawing", "Cut lists", "Template 1:1". */
  pageTitle: string;
}

const STATE_LABEL: Record<RevisionState, string> = {
  draft: 'DRAFT — NOT ISSUED',
  issued: 'ISSUED FOR FABRICATION',
  superseded: 'SUPERSEDED — DO NOT USE',
};

/** Short date (yyyy-mm-dd, UTC): unambiguous across the shop's and the client's locales. */
export function formatSheetDate(iso: string | Date | null): string {
  if (!iso) return '—';
  const d = typeof iso === 'string' ? new Date(iso) : iso;
  return Number.isNaN(d.getTime()) ? '—' : d.toISOString().slice(0, 10);
}

/** Draws the title block strip along the bottom of the frame, with "sheet n of m". */
export function drawTitleBlock(
  doc: PDFKit.PDFDocument,
  setup: PageSetup,
  fields: TitleBlockFields,
  sheetNumber: number,
  sheetCount: number,
): void {
  const t = typeSizes(setup);
  const { frame, titleBlockHeight: h } = setup;
  const y = frame.y + frame.h - h;
  const pad = mm(1.6);

  doc.save();
  doc.lineWidth(1.2).strokeColor(INK.black).rect(frame.x, y, frame.w, h).stroke();

  // Column widths: QR square first, the rest in proportion to what they hold.
  const qrSide = fields.qrUrl ? h : 0;
  const rest = frame.w - qrSide;
  const fractions = [0.25, 0.2, 0.27, 0.17, 0.11];
  const widths = fractions.map((f) => f * rest);
  const xs: number[] = [];
  let cursor = frame.x + qrSide;
  for (const w of widths) {
    xs.push(cursor);
    cursor += w;
  }
  doc.lineWidth(0.6);
  for (const x of xs)
    doc
      .moveTo(x, y)
      .lineTo(x, y + h)
      .stroke();

  if (fields.qrUrl) {
    const qrSize = h - 2 * pad - t.tiny - 1;
    drawQrCode(doc, fields.qrUrl, frame.x + (h - qrSize) / 2, y + pad, qrSize);
    drawText(doc, fields.qrCaption ?? 'Scan: spool page', frame.x, y + h - pad - t.tiny, {
      size: t.tiny,
      color: INK.muted,
      width: h,
      align: 'center',
    });
  }

  const label = (value: string, x: number, yy: number, w: number) =>
    drawText(doc, value.toUpperCase(), x, yy, {
      font: 'cond-semibold',
      size: t.tiny,
      color: INK.muted,
      width: w,
    });

  // 1: shop, client, job, site.
  {
    const x = xs[0]! + pad;
    const w = widths[0]! - 2 * pad;
    let yy = y + pad;
    yy += drawText(doc, fields.shopName, x, yy, { font: 'body-bold', size: t.heading, width: w }) + 2;
    for (const [k, v] of [
      ['Client', fields.clientName],
      ['Job', fields.job],
      ['Site', fields.site],
    ] as const) {
      label(k, x, yy, w);
      yy += t.tiny + 0.5;
      yy += drawText(doc, v || '—', x, yy, { font: 'body-medium', size: t.small, width: w }) + 1.5;
    }
  }

  // 2: the mark, large: what the fitter looks for first.
  {
    const x = xs[1]! + pad;
    const w = widths[1]! - 2 * pad;
    label(fields.markLabel, x, y + pad, w);
    drawText(doc, fields.mark, x, y + pad + t.tiny + 2, { font: 'cond-bold', size: t.title, width: w });
    drawText(doc, fields.subMark, x, y + pad + t.tiny + 4 + t.title * 1.15, {
      font: 'body-medium',
      size: t.small,
      width: w,
      wrap: false,
    });
    drawText(doc, fields.pageTitle, x, y + h - pad - t.small, {
      font: 'cond-semibold',
      size: t.small,
      color: INK.muted,
      width: w,
    });
  }

  // 3: revision letter and history.
  {
    const x = xs[2]! + pad;
    const w = widths[2]! - 2 * pad;
    const letterW = fields.revisionLetter ? t.title * 1.6 : 0;
    if (fields.revisionLetter) {
      label('Rev', x, y + pad, letterW);
      drawText(doc, fields.revisionLetter, x, y + pad + t.tiny + 2, {
        font: 'cond-bold',
        size: t.title,
        width: letterW,
      });
    }
    if (fields.revisionState) {
      const stateText = STATE_LABEL[fields.revisionState];
      const warn = fields.revisionState !== 'issued';
      const bx = x + letterW;
      const bw = w - letterW;
      const bh = t.small + 4;
      doc.rect(bx, y + pad, bw, bh).fill(warn ? INK.warn : INK.black);
      drawText(doc, stateText, bx + 3, y + pad + 2, {
        font: 'cond-bold',
        size: t.small,
        color: '#ffffff',
        width: bw - 6,
      });
    }
    // History rows, newest first, as many as fit.
    if (!fields.revisionLetter && fields.history.length === 0) {
      label('Revision', x, y + pad, w);
      drawText(
        doc,
        'Not revisioned: printed from the current revision of each spool (listed on the sheet).',
        x,
        y + pad + t.tiny + 3,
        {
          size: t.small,
          width: w,
          wrap: true,
        },
      );
    } else {
      const rowH = t.tiny + 2.5;
      let yy = y + pad + t.small + 8;
      const hx = x + letterW;
      const hw = w - letterW;
      // Columns as wide as their longest value (state words and dates are never shortened);
      // the note takes the rest and wraps.
      const tinyBold = { size: t.tiny, font: 'body-bold' as const };
      const fitW = (values: string[], head: string): number =>
        Math.max(
          measureWidth(doc, head, { size: t.tiny, font: 'cond-semibold' }),
          ...values.map((v) => measureWidth(doc, v, tinyBold)),
        ) + 3;
      const colW = [
        fitW(
          fields.history.map((e) => e.letter),
          'Rev',
        ),
        fitW(
          fields.history.map((e) => e.state),
          'State',
        ),
        fitW(
          fields.history.map((e) => formatSheetDate(e.issuedAt)),
          'Date',
        ),
      ];
      const noteW = Math.max(hw - colW[0]! - colW[1]! - colW[2]!, hw * 0.25);
      const cols = [hx, hx + colW[0]!, hx + colW[0]! + colW[1]!, hx + colW[0]! + colW[1]! + colW[2]!];
      label('Rev', cols[0]!, yy, colW[0]!);
      label('State', cols[1]!, yy, colW[1]!);
      label('Date', cols[2]!, yy, colW[2]!);
      label('Note', cols[3]!, yy, noteW);
      yy += rowH;
      const bottom = y + h - pad;
      const rows: RevisionHistoryEntry[] = [];
      for (const entry of fields.history) {
        const style = {
          size: t.tiny,
          font: entry.letter === fields.revisionLetter ? ('body-bold' as const) : ('body' as const),
        };
        const noteH = Math.max(rowH, measureWrapped(doc, entry.note || '—', noteW, style) + 2.5);
        // Leave room for the "+N older" line when entries remain.
        const reserve = fields.history.length > rows.length + 1 ? rowH : 0;
        if (yy + noteH > bottom - reserve) break;
        rows.push(entry);
        drawText(doc, entry.letter, cols[0]!, yy, { ...style, width: colW[0]! });
        drawText(doc, entry.state, cols[1]!, yy, { ...style, width: colW[1]! });
        drawText(doc, formatSheetDate(entry.issuedAt), cols[2]!, yy, { ...style, width: colW[2]! });
        drawText(doc, entry.note || '—', cols[3]!, yy, { ...style, width: noteW, wrap: true });
        yy += noteH;
      }
      if (fields.history.length > rows.length) {
        drawText(doc, `+${fields.history.length - rows.length} older`, cols[3]!, y + h - pad - t.tiny, {
          size: t.tiny,
          color: INK.muted,
        });
      }
    }
  }

  // 4: status, people, dates, units.
  {
    const x = xs[3]! + pad;
    const w = widths[3]! - 2 * pad;
    const rowH = (h - 2 * pad) / Math.max(1, fields.facts.length);
    fields.facts.forEach(([k, v], i) => {
      const yy = y + pad + i * rowH;
      const labelW = w * 0.38;
      label(k, x, yy + 1, labelW);
      if (v === null) {
        doc
          .lineWidth(0.4)
          .strokeColor(INK.rule)
          .moveTo(x + labelW, yy + t.small)
          .lineTo(x + w, yy + t.small)
          .stroke();
      } else {
        drawText(doc, v, x + labelW, yy, { font: 'body-semibold', size: t.small, width: w - labelW });
      }
    });
  }

  // 5: sheet n of m.
  {
    const x = xs[4]! + pad;
    const w = widths[4]! - 2 * pad;
    label('Sheet', x, y + pad, w);
    drawText(doc, `${sheetNumber} of ${sheetCount}`, x, y + pad + t.tiny + 2, {
      font: 'cond-bold',
      size: t.heading * 1.3,
      width: w,
    });
    label('Paper', x, y + h / 2 + 2, w);
    drawText(doc, `${setup.paper} landscape`, x, y + h / 2 + t.tiny + 3, { size: t.small, width: w });
  }
  doc.restore();
}

/** Draws the outer border of a page. */
export function drawFrame(doc: PDFKit.PDFDocument, setup: PageSetup): void {
  const { frame } = setup;
  doc
    .save()
    .lineWidth(1.2)
    .strokeColor(INK.black)
    .rect(frame.x, frame.y, frame.w, frame.h)
    .stroke()
    .restore();
}
