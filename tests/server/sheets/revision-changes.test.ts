import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { formatFtIn, formatMm } from '../../../shared/units/length-format';
import { revisionChanges } from '../../../server/modules/sheets/pdf/revision-changes';
import { renderSpoolSheet } from '../../../server/modules/sheets/pdf/spool-sheet';
import { readPdfText } from './helpers/pdf-reading';
import { loadSample, testHeader } from './helpers/sheet-fixtures';

describe('revisionChanges', () => {
  const designA = loadSample('cw-201-s03-return-14in.json');
  const designB = structuredClone(designA);
  // The branch moves 50 mm east: R2 (branch to elbow) shortens, R1 (flange to branch) grows.
  designB.runs.find((r) => r.id === 'R1')!.length.mm += 50;
  designB.runs.find((r) => r.id === 'R2')!.length.mm -= 50;
  const a = computeSpool(designA);
  const b = computeSpool(designB);

  it('names the runs whose dimensions changed, with old and new engine values, and nothing else', () => {
    const changes = revisionChanges({ design: designA, result: a }, { design: designB, result: b }, 'mm', 'A', 'B');
    expect([...changes.changedRuns].sort()).toEqual(['R1', 'R2']);
    for (const id of ['R1', 'R2']) {
      const before = a.runs.find((r) => r.runId === id)!.workPointDistanceMm;
      const after = b.runs.find((r) => r.runId === id)!.workPointDistanceMm;
      // Runs are named by their piece and end marks, never by the design's run ids.
      expect(
        changes.lines.some((l) => l.includes(`work-point length was ${formatMm(before)}, now ${formatMm(after)}`)),
      ).toBe(true);
      expect(changes.lines.some((l) => l.includes(id))).toBe(false);
    }
    // The header pipe runs through the branch unbroken: its cut length is unchanged, so no piece is flagged.
    for (const p of b.pieces) {
      const old = a.pieces.find((q) => q.mark === p.mark)!;
      expect(changes.changedPieces.has(p.mark)).toBe(Math.abs(old.cutLengthMm! - p.cutLengthMm!) > 0.05);
    }
  });

  it('flags a piece whose cut length changes, in feet-inches too', () => {
    const longer = structuredClone(designA);
    longer.runs.find((r) => r.id === 'R4')!.length.mm += 100;
    const c = computeSpool(longer);
    const changes = revisionChanges({ design: designA, result: a }, { design: longer, result: c }, 'ft-in', 'A', 'B');
    const piece = c.pieces.find(
      (p) => p.cutLengthMm !== a.pieces.find((q) => q.mark === p.mark)!.cutLengthMm,
    )!;
    expect(changes.changedPieces).toEqual(new Set([piece.mark]));
    const old = a.pieces.find((q) => q.mark === piece.mark)!.cutLengthMm!;
    expect(changes.lines).toContain(
      `${piece.mark}: cut length was ${formatFtIn(old)}, now ${formatFtIn(piece.cutLengthMm!)}.`,
    );
  });

  it('says so when nothing the bay works to has changed', async () => {
    const changes = revisionChanges({ design: designA, result: a }, { design: designA, result: computeSpool(designA) }, 'mm', 'A', 'B');
    expect(changes.lines).toEqual([]);
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design: designA,
      result: a,
      units: 'mm',
      paper: 'A3',
      changes,
    });
    const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
    expect(text).toContain('CHANGED SINCE REVISION A');
    expect(text).toContain('No change to any component, run, cut length, flange, weld or spec value.');
  });

  it('prints the changes on the sheet', async () => {
    const changes = revisionChanges({ design: designA, result: a }, { design: designB, result: b }, 'mm', 'A', 'B');
    const out = await renderSpoolSheet({
      header: testHeader('CW-201-S03'),
      design: designB,
      result: b,
      units: 'mm',
      paper: 'A3',
      changes,
    });
    const text = (await readPdfText(out.pdf))
      .map((p) => p.text)
      .join(' ')
      .replace(/\s+/g, '');
    for (const line of changes.lines) expect(text).toContain(line.replace(/\s+/g, ''));
  });
});
