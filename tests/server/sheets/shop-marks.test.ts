import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { SpoolDesign } from '../../../shared/schemas/spool-design.schema';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { shopMarks } from '../../../server/modules/sheets/pdf/shop-marks';
import { readPdfText } from './helpers/pdf-reading';
import { loadSample, SAMPLE_FILES, testHeader } from './helpers/sheet-fixtures';

/** The sample with every node and run id replaced by editor-style ids (n1…, r1…). */
function withInternalIds(design: SpoolDesign): { design: SpoolDesign; ids: string[] } {
  const map = new Map<string, string>();
  design.nodes.forEach((n, i) => map.set(n.id, `n${i + 1}`));
  design.runs.forEach((r, i) => map.set(r.id, `r${i + 1}`));
  const json = JSON.stringify(design).replace(
    /"(id|from|to)":"([^"]+)"/g,
    (_m, k: string, v: string) => `"${k}":"${map.get(v) ?? v}"`,
  );
  return { design: JSON.parse(json) as SpoolDesign, ids: [...map.values()] };
}

// Rules of our own (no external source): users see shop marks, never internal node ids.
describe('shop marks on the sheet', () => {
  it('numbers components by kind in the engine order, flanges as the flange views', () => {
    const result = computeSpool(loadSample('cw-201-s03-return-14in.json'));
    const marks = shopMarks(result);
    result.flanges.forEach((f, i) => expect(marks.get(f.nodeId)).toBe(`F${i + 1}`));
    const elbows = result.components.filter((c) => c.kind === 'elbow').map((c) => marks.get(c.nodeId));
    expect(elbows).toEqual(elbows.map((_, i) => `E${i + 1}`));
    const outlets = result.components
      .filter((c) => c.kind === 'set-on-branch')
      .map((c) => marks.get(c.nodeId));
    expect(outlets).toEqual(outlets.map((_, i) => `O${i + 1}`));
  });

  it.each(SAMPLE_FILES)('prints no internal node or run id on the sheet of %s', async (file) => {
    const { design, ids } = withInternalIds(loadSample(file));
    const result = computeSpool(design);
    const out = await renderSpoolSheet({
      header: testHeader('CW-1'),
      design,
      result,
      units: 'mm',
      paper: 'A3',
    });
    const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
    const leaked = ids.filter((id) => new RegExp(`(^|[^A-Za-z0-9_.:-])${id}($|[^A-Za-z0-9_.:-])`).test(text));
    expect(leaked).toEqual([]);
    expect(text).not.toMatch(/\bnode [A-Za-z]/);
  });

  it('states the reference direction of every outlet angle', async () => {
    for (const file of SAMPLE_FILES) {
      const design = loadSample(file);
      const result = computeSpool(design);
      const out = await renderSpoolSheet({
        header: testHeader('CW-1'),
        design,
        result,
        units: 'mm',
        paper: 'A3',
      });
      const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
      const tags = text.match(/\bO\d+ NPS [0-9/-]+ at [^ ]+°[^.]*/g) ?? [];
      for (const t of tags) expect(t, file).toMatch(/° from (top of pipe|plant N)/);
      // Only bare "at N°" tags would be missing a reference.
      expect(text, file).not.toMatch(/\bO\d+ NPS [0-9/-]+ at [0-9.]+°(?! from)/);
    }
  });
});
