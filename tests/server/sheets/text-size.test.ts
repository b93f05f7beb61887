import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { computedSample, SAMPLE_FILES, testHeader } from './helpers/sheet-fixtures';

const PAPERS = ['A3', 'A4', 'Letter', 'Tabloid'] as const;
// 7 pt: the smallest text the sheet prints (common practice for shop drawings read at arm's
// length, no source).
const MIN_PT = 7;

/** Font size of every text run (pt), from its text matrix as pdfjs reads it. */
async function textSizes(pdf: Buffer): Promise<{ str: string; size: number }[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false })
    .promise;
  const out: { str: string; size: number }[] = [];
  for (let n = 1; n <= doc.numPages; n += 1) {
    const content = await (await doc.getPage(n)).getTextContent();
    for (const item of content.items) {
      if (!('str' in item) || item.str.trim() === '') continue;
      const [, , c, d] = item.transform as number[];
      out.push({ str: item.str, size: Math.hypot(c!, d!) });
    }
  }
  await doc.destroy();
  return out;
}

describe('sheet text size', () => {
  for (const paper of PAPERS)
    it.each(SAMPLE_FILES)(`prints no text under ${MIN_PT} pt on ${paper}: %s`, async (file) => {
      const { design, result } = computedSample(file);
      const out = await renderSpoolSheet({
        header: testHeader('CW-1', 'draft'),
        design,
        result,
        units: 'mm',
        paper,
      });
      const small = (await textSizes(out.pdf)).filter((t) => t.size < MIN_PT - 0.01);
      expect(small.map((t) => `${t.str} (${t.size.toFixed(2)} pt)`)).toEqual([]);
    });
});
