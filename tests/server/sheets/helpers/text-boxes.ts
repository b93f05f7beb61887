import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** One text run as pdfjs reads it, as an axis-aligned box in page points (origin bottom-left). */
export interface TextBox {
  page: number;
  str: string;
  /** Font size, pt (length of the text matrix's y column). */
  size: number;
  /** Run direction in degrees (0 = left to right). */
  angle: number;
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  pageWidth: number;
  pageHeight: number;
}

/**
 * Every non-blank text run of a PDF with its box: the run's width along its baseline and its
 * font size across it, from the baseline origin, rotated by the text matrix, then bounded.
 * The box spans the font size from the baseline up (descenders left out, so two lines set
 * solid do not count as touching).
 */
export async function textBoxes(pdf: Buffer): Promise<TextBox[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false })
    .promise;
  const out: TextBox[] = [];
  for (let n = 1; n <= doc.numPages; n += 1) {
    const page = await doc.getPage(n);
    const [, , pageWidth, pageHeight] = page.view as number[];
    const content = await page.getTextContent();
    for (const item of content.items) {
      if (!('str' in item) || item.str.trim() === '') continue;
      const [a, b, c, d, e, f] = item.transform as number[];
      const size = Math.hypot(c!, d!);
      const len = Math.hypot(a!, b!);
      // Unit vectors along and across the baseline.
      const ux = a! / len;
      const uy = b! / len;
      const vx = c! / size;
      const vy = d! / size;
      const w = item.width;
      const corners = [
        [e!, f!],
        [e! + ux * w, f! + uy * w],
        [e! + vx * size, f! + vy * size],
        [e! + ux * w + vx * size, f! + uy * w + vy * size],
      ];
      const xs = corners.map((p) => p[0]!);
      const ys = corners.map((p) => p[1]!);
      out.push({
        page: n,
        str: item.str,
        size,
        angle: (Math.atan2(b!, a!) * 180) / Math.PI,
        x0: Math.min(...xs),
        y0: Math.min(...ys),
        x1: Math.max(...xs),
        y1: Math.max(...ys),
        pageWidth: pageWidth!,
        pageHeight: pageHeight!,
      });
    }
    page.cleanup();
  }
  await doc.destroy();
  return out;
}
