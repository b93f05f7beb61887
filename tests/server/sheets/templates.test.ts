import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { contentArea, mm, pageSetup, PT_PER_MM } from '../../../server/modules/sheets/pdf/page-setup';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { templateFigures } from '../../../server/modules/sheets/pdf/template-figures';
import { readPathBoxes, readPdfText, renderPageInk } from './helpers/pdf-reading';
import { computedSample, loadSample, testHeader } from './helpers/sheet-fixtures';

const near = (a: number, b: number, tol = 0.05) => Math.abs(a - b) <= tol;

describe('1:1 templates', () => {
  const { design, result } = computedSample('cw-201-s03-return-14in.json');

  it('prints a saddle and a header-hole template for the set-on branch, each page with a 100 mm bar measured in the PDF itself', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const kinds = new Set(
      out.templates.pages.map((p) => p.figure.split(' ')[0] + ' ' + p.figure.split(' ')[1]),
    );
    expect(kinds).toEqual(new Set(['Branch saddle', 'Header hole']));
    for (const page of out.templates.pages) {
      const bar = page.scaleBars[0]!;
      expect(bar.lengthMm).toBe(100);
      expect(bar.width).toBeCloseTo(283.4646, 3); // 100 mm × 72 / 25.4
      // From the PDF's operators: a stroked outline 100 mm wide and 3 mm tall, and five 10 mm black segments.
      const boxes = await readPathBoxes(out.pdf, page.pageIndex + 1);
      expect(
        boxes.some(
          (b) =>
            b.paint === 'stroke' && near(b.maxX - b.minX, 283.4646) && near(b.maxY - b.minY, 3 * PT_PER_MM),
        ),
      ).toBe(true);
      const segments = boxes.filter(
        (b) => b.paint === 'fill' && near(b.maxX - b.minX, 28.3465) && near(b.maxY - b.minY, 3 * PT_PER_MM),
      );
      expect(segments.length).toBeGreaterThanOrEqual(5);
    }
    const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
    expect(text).toContain('THIS BAR IS 100 mm');
    expect(text).toContain('FULL SIZE 1:1');
    for (const ink of renderPageInk(out.pdf, 20)) expect(ink.inkedFraction).toBeGreaterThan(0.02);
  });

  it('draws the saddle cut line at full size: wrap π × branch OD, depth R − √(R² − r²) for a square branch', async () => {
    // Reference: intersection of two cylinders (square set-on branch), deepest cut-back at the flanks.
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const saddlePage = out.templates.pages.find((p) => p.figure.startsWith('Branch saddle'))!;
    const branch = result.components.find((c) => c.shape.type === 'set-on-branch')!;
    const header = branch.ends.find((e) => e.nps !== (branch.shape as { branchNps: string }).branchNps)!;
    const branchEnd = branch.ends.find((e) => e.nps === (branch.shape as { branchNps: string }).branchNps)!;
    const R = header.odMm! / 2;
    const r = branchEnd.odMm! / 2;
    const depth = R - Math.sqrt(R * R - r * r);
    const wrap = Math.PI * 2 * r;
    const boxes = await readPathBoxes(out.pdf, saddlePage.pageIndex + 1);
    const cut = boxes.find(
      (b) =>
        b.paint === 'stroke' && near(b.maxX - b.minX, mm(wrap), 0.2) && near(b.maxY - b.minY, mm(depth), 0.2),
    );
    expect(cut, `a ${wrap.toFixed(1)} × ${depth.toFixed(1)} mm cut line`).toBeDefined();
  });

  it('tiles a template wider than the printable width, with overlap, every tile printed once', async () => {
    for (const paper of ['A3', 'A4'] as const) {
      const out = await renderSpoolSheet({ header: testHeader('CW'), design, result, units: 'mm', paper });
      const saddle = templateFigures(result, 'mm').figures.find((f) => f.kind === 'branch-saddle')!;
      const pages = out.templates.pages.filter((p) => p.figure === saddle.title);
      const printed = pages.flatMap((p) => p.tiles);
      const usableMm = (contentArea(pageSetup(paper)).w - 8) / PT_PER_MM;
      // Wrap π × 168.3 mm plus tab and margins is wider than A3 and A4 landscape.
      expect(saddle.widthMm).toBeGreaterThan(usableMm);
      expect(printed.length).toBe(Math.ceil((saddle.widthMm - 10) / (usableMm - 10)));
      expect(new Set(printed).size).toBe(printed.length);
      expect(pages.every((p) => p.tileCount === printed.length)).toBe(true);
    }
  });

  it('adds a 4 in check bar (288 pt) on feet-inch jobs', async () => {
    const out = await renderSpoolSheet({
      header: testHeader('CW'),
      design,
      result,
      units: 'ft-in',
      paper: 'Letter',
    });
    for (const page of out.templates.pages) {
      expect(page.scaleBars.map((b) => b.lengthMm)).toEqual([100, 101.6]);
      const boxes = await readPathBoxes(out.pdf, page.pageIndex + 1);
      expect(boxes.some((b) => b.paint === 'stroke' && near(b.maxX - b.minX, 288))).toBe(true);
    }
  });

  it('prints a mitre template whose long-to-short difference is OD × tan(deflection per weld / 2)', async () => {
    const source = loadSample('cw-305-s01-rolling-offset-10in.json');
    const mitred = structuredClone(source);
    const elbow = mitred.nodes.find((n) => n.kind === 'elbow');
    expect(elbow).toBeDefined();
    if (elbow?.kind === 'elbow') Object.assign(elbow, { construction: 'mitre', mitreWelds: 2 });
    const res = computeSpool(mitred);
    const comp = res.components.find((c) => c.nodeId === elbow!.id)!;
    expect(comp.shape.type).toBe('elbow');
    const shape = comp.shape as { angleDeg: number; construction: string };
    expect(shape.construction).toBe('mitre');
    const out = await renderSpoolSheet({
      header: testHeader('CW-305-S01'),
      design: mitred,
      result: res,
      units: 'mm',
      paper: 'A3',
    });
    const page = out.templates.pages.find((p) => p.figure.startsWith('Mitre cut'));
    expect(page).toBeDefined();
    const od = comp.ends[0]!.odMm!;
    // Handbook mitre rule: each cut face is half the deflection at its weld from square.
    const diff = od * Math.tan(((shape.angleDeg / 2 / 2) * Math.PI) / 180);
    const boxes = await readPathBoxes(out.pdf, page!.pageIndex + 1);
    expect(
      boxes.some(
        (b) =>
          b.paint === 'stroke' &&
          near(b.maxX - b.minX, mm(Math.PI * od), 0.2) &&
          near(b.maxY - b.minY, mm(diff), 0.2),
      ),
    ).toBe(true);
  });
});
