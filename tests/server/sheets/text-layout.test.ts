import { describe, expect, it } from 'vitest';
import { renderSawList } from '../../../server/modules/sheets/pdf/saw-list';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { computedSample, SAMPLE_FILES, testHeader } from './helpers/sheet-fixtures';
import { textBoxes, type TextBox } from './helpers/text-boxes';

const PAPERS = ['A3', 'A4', 'Letter', 'Tabloid'] as const;
const UNITS = ['mm', 'ft-in'] as const;
// Overlap allowed between two text boxes, pt, in both directions at once: glyph boxes from the
// font size are a little generous, so two lines set close may touch without ink touching.
const TOLERANCE_PT = 0.5;
// The diagonal DRAFT / SUPERSEDED / NOT FOR FABRICATION mark prints across everything on purpose.
const isWatermark = (t: TextBox) => t.size > 30 && Math.abs(t.angle % 90) > 1;

const label = (t: TextBox) => `p${t.page} "${t.str.slice(0, 60)}"`;

/** Pairs of text runs on one page whose boxes overlap by more than the tolerance. */
function overlaps(boxes: TextBox[]): string[] {
  const out: string[] = [];
  const runs = boxes.filter((t) => !isWatermark(t));
  for (let i = 0; i < runs.length; i += 1)
    for (let j = i + 1; j < runs.length; j += 1) {
      const p = runs[i]!;
      const q = runs[j]!;
      if (p.page !== q.page) continue;
      const ox = Math.min(p.x1, q.x1) - Math.max(p.x0, q.x0);
      const oy = Math.min(p.y1, q.y1) - Math.max(p.y0, q.y0);
      if (ox <= TOLERANCE_PT || oy <= TOLERANCE_PT) continue;
      // pdfjs may split one drawn run into pieces on one baseline that abut by a kerning amount.
      const sameRun = Math.abs(p.angle - q.angle) < 0.5 && Math.abs(p.y0 - q.y0) < 0.2 && ox < 1;
      if (sameRun) continue;
      out.push(`${label(p)} × ${label(q)} (${ox.toFixed(1)} × ${oy.toFixed(1)} pt)`);
    }
  return out;
}

/** Runs shortened with an ellipsis, or reaching past the page edge. */
function truncations(boxes: TextBox[]): string[] {
  return boxes
    .filter(
      (t) =>
        t.str.includes('…') ||
        t.x0 < -TOLERANCE_PT ||
        t.y0 < -TOLERANCE_PT ||
        t.x1 > t.pageWidth + TOLERANCE_PT ||
        t.y1 > t.pageHeight + TOLERANCE_PT,
    )
    .map(label);
}

describe('sheet text layout', () => {
  it('finds an overlap and a truncation when there is one (the checks can fail)', () => {
    const box = (str: string, x0: number, y0: number): TextBox => ({
      page: 1,
      str,
      size: 7,
      angle: 0,
      x0,
      y0,
      x1: x0 + 40,
      y1: y0 + 7,
      pageWidth: 100,
      pageHeight: 100,
    });
    expect(overlaps([box('Tile A2 of 2', 10, 10), box('joins A1 on the left', 30, 12)])).toHaveLength(1);
    expect(overlaps([box('one line', 10, 10), box('next line', 10, 17.2)])).toEqual([]);
    expect(truncations([box('Shipping envelope (outside of pi…', 10, 10), box('edge', 70, 10)])).toHaveLength(
      2,
    );
  });

  for (const paper of PAPERS)
    for (const units of UNITS)
      it.each(SAMPLE_FILES)(`no text overlaps or is cut off on ${paper} in ${units}: %s`, async (file) => {
        const { design, result } = computedSample(file);
        const out = await renderSpoolSheet({
          header: testHeader('CW-1', 'draft'),
          design,
          result,
          units,
          paper,
        });
        const boxes = await textBoxes(out.pdf);
        expect(boxes.length).toBeGreaterThan(50);
        expect({ overlaps: overlaps(boxes), truncations: truncations(boxes) }).toEqual({
          overlaps: [],
          truncations: [],
        });
      });

  it.each(PAPERS)('no text overlaps or is cut off on the job saw list on %s', async (paper) => {
    const out = await renderSawList({
      shopName: 'Kestrel Pipe & Steel',
      clientName: 'Harrow Fields Data Centre',
      jobNumber: 'HF-B-001',
      jobTitle: 'Condenser water, Hall B',
      site: 'Hall B',
      jobUrl: 'http://127.0.0.1:4717/jobs/1',
      units: 'ft-in',
      paper,
      spools: SAMPLE_FILES.map((file, i) => ({
        mark: `CW-S0${i + 1}`,
        revisionLetter: 'A',
        revisionState: 'issued' as const,
        result: computedSample(file).result,
      })),
      skipped: [],
      printedAt: new Date('2026-12-01T12:00:00Z'),
    });
    const boxes = await textBoxes(out.pdf);
    expect(boxes.length).toBeGreaterThan(50);
    expect({ overlaps: overlaps(boxes), truncations: truncations(boxes) }).toEqual({
      overlaps: [],
      truncations: [],
    });
  });
});
