import { shopMarks, withShopMarks } from '../../../server/modules/sheets/pdf/shop-marks';
import jsQR from 'jsqr';
import { describe, expect, it } from 'vitest';
import type { SpoolResult } from '../../../shared/engine/compute-result';
import { formatFtIn, formatMm, type LengthUnits } from '../../../shared/units/length-format';
import { pageSetup } from '../../../server/modules/sheets/pdf/page-setup';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { SHEET_CAUTIONS } from '../../../server/modules/sheets/pdf/sheet-cautions';
import { readPdfText, renderPageGrey, renderPageInk } from './helpers/pdf-reading';
import { computedSample, SAMPLE_FILES, testHeader } from './helpers/sheet-fixtures';

const fmt = (mm: number, units: LengthUnits) => (units === 'mm' ? formatMm(mm) : formatFtIn(mm));

// Length tokens as the sheet prints them: "1234.5 mm", or feet-inches to 1/16" ("3'-4 5/16"", "11 1/2"", "7/8"").
const MM_TOKEN = /-?\d+\.\d mm/g;
const FTIN_TOKEN = /(?:\d+'-(?:\d+ )?(?:\d+\/\d+|\d+)"|(?:\d+ )?\d+\/\d+"|\d+")/g;

/**
 * Every length the drawing may show, straight from the engine: run work-point distances, the plant-axis
 * legs of runs off the axes (offsets), centre-to-face, overall.
 */
function drawingLengths(result: SpoolResult): number[] {
  const values = result.runs.map((r) => r.workPointDistanceMm);
  for (const r of result.runs) {
    const legs = [r.end.x - r.start.x, r.end.y - r.start.y, r.end.z - r.start.z]
      .map(Math.abs)
      .filter((v) => v > 0.5);
    if (legs.length > 1) values.push(...legs);
  }
  for (const end of result.openEnds) if (end.centreToFaceMm !== null) values.push(end.centreToFaceMm);
  if (result.overall)
    values.push(
      result.overall.workPointBox.sizeMm.x,
      result.overall.workPointBox.sizeMm.y,
      result.overall.workPointBox.sizeMm.z,
    );
  return values;
}

describe.each(SAMPLE_FILES)('spool sheet of %s', (file) => {
  const { design, result } = computedSample(file);

  it.each(['mm', 'ft-in'] as const)(
    'prints every cut length and drawing dimension as the engine computed it (%s)',
    async (units) => {
      const out = await renderSpoolSheet({
        header: testHeader(design.mark ?? file),
        design,
        result,
        units,
        paper: 'A3',
      });
      const pages = await readPdfText(out.pdf);
      const all = pages.map((p) => p.text).join('\n');

      // Cut list: each piece's mark and cut length.
      expect(result.pieces.length).toBeGreaterThan(0);
      for (const piece of result.pieces) {
        expect(piece.cutLengthMm, `${piece.mark} has a cut length`).not.toBeNull();
        expect(all).toContain(fmt(piece.cutLengthMm!, units));
      }
      // Drawing (page 1, left of the tables): every run dimension and the overall sizes...
      const setup = pageSetup('A3');
      const drawingRight = setup.frame.x + setup.frame.w * 0.6;
      const drawingText = pages[0]!.items
        .filter((i) => i.x < drawingRight && i.y > setup.titleBlockHeight + setup.frame.y)
        .map((i) => i.str);
      const joined = drawingText.join('\n');
      for (const run of result.runs) {
        if (run.workPointDistanceMm > 0.05) expect(joined).toContain(fmt(run.workPointDistanceMm, units));
      }
      const box = result.overall!.workPointBox.sizeMm;
      for (const size of [box.x, box.y, box.z]) if (size > 1) expect(joined).toContain(fmt(size, units));
      // ...and nothing on the drawing that the engine did not compute.
      const allowed = new Set(drawingLengths(result).map((v) => fmt(v, units)));
      const tokens = joined.match(units === 'mm' ? MM_TOKEN : FTIN_TOKEN) ?? [];
      expect(tokens.length).toBeGreaterThanOrEqual(
        result.runs.filter((r) => r.workPointDistanceMm > 0.05).length,
      );
      for (const token of tokens) expect(allowed, `drawing shows ${token}`).toContain(token);
      // The renderer's own account agrees with the engine, value by value.
      for (const d of out.dimensions) {
        if (d.kind === 'run')
          expect(d.mm).toBe(result.runs.find((r) => r.runId === d.ref)!.workPointDistanceMm);
        if (d.kind === 'centre-to-face')
          expect(d.mm).toBe(result.openEnds.find((e) => e.nodeId === d.ref)!.centreToFaceMm);
        expect(d.text).toBe(fmt(d.mm, units));
      }
    },
  );

  it('prints each flange’s bolt circle and hole rotation, and the weights, as the engine computed them', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
    for (const f of result.flanges) {
      const ref = f.reference === 'plant-vertical' ? 'UP' : 'N';
      expect(text).toContain(`Hole 1: ${Number(f.rotationDeg.toFixed(1))}° CW from ${ref}`);
      expect(text).toContain(`BC ${formatMm(f.boltCircleMm!)}`);
      expect(text).toContain(f.straddles ? 'Straddles centrelines' : 'On');
    }
    expect(text).toContain(`${result.weights.emptyKg.toFixed(1)} kg`);
    expect(text).toContain(`${result.weights.waterFilledKg.toFixed(1)} kg`);
    for (const item of result.bom.items)
      if (item.category === 'pipe') expect(text).toContain(formatMm(item.totalCutMm!));
  });

  it('has a title block on every sheet, with n of m, and the cautions', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const pages = await readPdfText(out.pdf);
    expect(pages.length).toBe(out.pageCount);
    pages.forEach((p, i) => {
      expect(p.text).toContain('CW-201-S03');
      expect(p.text).toContain(`${i + 1} of ${pages.length}`);
      expect(p.text).toContain('Kestrel Pipe & Steel');
      expect(p.text).toContain('Harrow Fields Data Centre');
    });
    const all = pages.map((p) => p.text).join(' ');
    expect(all).toContain('Line CW-201');
    expect(all).toContain('ISSUED FOR FABRICATION');
    expect(all).toContain('Branch moved 50 mm'); // revision history note
    expect(all).toContain('First issue');
    // What each weld joins, with shop marks in place of node ids.
    const marks = shopMarks(result);
    for (const weld of result.welds) expect(all).toContain(withShopMarks(weld.joins, marks, result));
    // Cautions: pdfjs splits wrapped lines, so compare without whitespace.
    const squeezed = all.replace(/\s+/g, '');
    for (const caution of SHEET_CAUTIONS) expect(squeezed).toContain(caution.replace(/\s+/g, ''));
  });

  it('renders pages that carry ink (not blank) and lands on the paper asked for', async () => {
    for (const paper of ['A3', 'A4', 'Letter', 'Tabloid'] as const) {
      const out = await renderSpoolSheet({ header: testHeader('CW'), design, result, units: 'mm', paper });
      const setup = pageSetup(paper);
      const text = await readPdfText(out.pdf);
      for (const p of text) {
        expect(p.width).toBeCloseTo(setup.width, 1);
        expect(p.height).toBeCloseTo(setup.height, 1);
      }
      for (const ink of renderPageInk(out.pdf, 20)) {
        expect(ink.inkedFraction).toBeGreaterThan(0.02);
        expect(ink.darkFraction).toBeGreaterThan(0.003);
        expect(ink.inkedFraction).toBeLessThan(0.8);
      }
    }
  });
});

describe('spool sheet marks', () => {
  const { design, result } = computedSample(SAMPLE_FILES[0]);

  it('prints DRAFT on every page of a draft revision', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03', 'draft'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const pages = await readPdfText(out.pdf);
    expect(out.marks.diagonal).toBe('DRAFT');
    for (const p of pages) {
      expect(p.text).toContain('DRAFT — revision B is not issued');
      expect(p.text).toMatch(/\bDRAFT\b/);
    }
  });

  it('says SUPERSEDED, and by which revision, on a superseded one', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03', 'superseded'),
      design,
      result,
      units: 'mm',
      paper: 'A4',
    });
    const pages = await readPdfText(out.pdf);
    for (const p of pages) expect(p.text).toContain('SUPERSEDED by revision C');
  });

  it('prints a design with engine errors, listing them under NOT FOR FABRICATION', async () => {
    // Shorten the first run below its fittings' take-offs: impossible geometry.
    const broken = structuredClone(design);
    broken.runs[0]!.length = {
      mm: 10,
      kind: broken.runs[0]!.length.kind === 'cut' ? 'centre-to-centre' : broken.runs[0]!.length.kind,
    };
    const { computeSpool } = await import('../../../shared/engine/compute-spool');
    const bad = computeSpool(broken);
    const errors = bad.issues.filter((i) => i.severity === 'error');
    expect(errors.length).toBeGreaterThan(0);
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design: broken,
      result: bad,
      units: 'mm',
      paper: 'A3',
    });
    const pages = await readPdfText(out.pdf);
    expect(pages[0]!.text).toContain('NOT FOR FABRICATION');
    const squeezed = pages
      .map((p) => p.text)
      .join(' ')
      .replace(/\s+/g, '');
    for (const e of errors) expect(squeezed).toContain(e.message.replace(/\s+/g, ''));
    expect(renderPageInk(out.pdf, 20)[0]!.inkedFraction).toBeGreaterThan(0.02);
  });

  it.each(['A3', 'Letter'] as const)(
    'encodes the spool page URL in a QR code that a reader decodes (%s)',
    async (paper) => {
      const header = testHeader('CW-201-S03');
      const out = await renderSpoolSheet({ header, design, result, units: 'mm', paper });
      const grey = renderPageGrey(out.pdf, 1, 150);
      // Crop the title block's left end (the QR cell) to keep the decoder quick.
      const setup = pageSetup(paper);
      const px = (pt: number) => Math.round((pt / 72) * 150);
      const x0 = px(setup.frame.x);
      const y0 = px(setup.frame.y + setup.frame.h - setup.titleBlockHeight);
      const w = px(setup.titleBlockHeight) + 4;
      const h = px(setup.titleBlockHeight) + 4;
      const rgba = new Uint8ClampedArray(w * h * 4);
      for (let y = 0; y < h; y += 1) {
        for (let x = 0; x < w; x += 1) {
          const g = grey.pixels[(y0 + y) * grey.width + (x0 + x)] ?? 255;
          rgba.set([g, g, g, 255], (y * w + x) * 4);
        }
      }
      expect(jsQR(rgba, w, h)?.data).toBe(header.spoolUrl);
    },
  );
});
