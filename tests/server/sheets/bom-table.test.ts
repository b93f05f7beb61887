import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { readPdfText } from './helpers/pdf-reading';
import { loadSample, testHeader } from './helpers/sheet-fixtures';

/** The sheet text of a sample, flattened (PDF text runs joined by spaces). */
async function sheetText(file: string, edit?: (d: ReturnType<typeof loadSample>) => void): Promise<string> {
  const design = loadSample(file);
  edit?.(design);
  const result = computeSpool(design);
  const out = await renderSpoolSheet({
    header: testHeader(design.mark ?? file),
    design,
    result,
    units: 'mm',
    paper: 'A3',
  });
  return (await readPdfText(out.pdf))
    .map((p) => p.text)
    .join(' ')
    .replace(/\s+/g, ' ');
}

describe('the sheet BOM table', () => {
  it('prints each line with its size: NPS 10 and NPS 6 pipe and the 10 × 6 reducer read apart', async () => {
    const text = await sheetText('cw-118-s02-reducer-drop-10x6.json');
    expect(text).toContain('NPS 10 × 6');
    expect(text).toMatch(/NPS 10 Pipe STD|NPS 10 .{0,40}Pipe STD/);
    expect(text).toMatch(/NPS 6 .{0,40}Pipe STD/);
    expect(text).toContain('Sch / class');
    expect(text).toContain('RF × BW');
  });

  it('lists the loose kit: studs with nuts per ASME B16.5 and gaskets per ASME B16.20, marked LOOSE', async () => {
    const text = await sheetText('cw-201-s03-return-14in.json');
    // ASME B16.5-2009 Table 7: NPS 14 Class 150 = 12 studs 1 in × 135 mm per joint, two joints.
    expect(text).toContain('Stud bolts 1 in × 135 mm');
    expect(text).toContain('24 studs, 48 nuts (2 × 12)');
    expect(text).toContain('ASME B16.20');
    expect(text).toContain('LOOSE');
  });

  it('names the standard and table only: no source-document names, secondary values flagged plainly', async () => {
    const text = await sheetText('cw-201-s03-return-14in.json', (d) => {
      d.spec = { ...d.spec, flangeClass: 600 };
    });
    expect(text).not.toMatch(/scribd|pdfcoffee|pdfslide|zaffertec|wermac|vaibhav/i);
    expect(text).toMatch(
      /stud dimension taken from a secondary source, not yet confirmed against the standard: check before ordering/,
    );
    expect(text).toContain('Class 600');
  });
});
