import { describe, expect, it } from 'vitest';
import { formatFtIn, formatMm } from '../../../shared/units/length-format';
import { renderSawList } from '../../../server/modules/sheets/pdf/saw-list';
import { sawListGroups, type SawListSpool } from '../../../server/modules/sheets/pdf/saw-list-groups';
import { readPdfText, renderPageInk } from './helpers/pdf-reading';
import { computedSample, SAMPLE_FILES } from './helpers/sheet-fixtures';

function spools(): SawListSpool[] {
  return SAMPLE_FILES.map((file, i) => ({
    mark: `CW-S0${i + 1}`,
    revisionLetter: 'A',
    revisionState: 'issued' as const,
    result: computedSample(file).result,
  }));
}

const input = (list: SawListSpool[], units: 'mm' | 'ft-in' = 'mm') => ({
  shopName: 'Kestrel Pipe & Steel',
  clientName: 'Harrow Fields Data Centre',
  jobNumber: 'HF-B-001',
  jobTitle: 'Condenser water, Hall B',
  site: 'Hall B',
  jobUrl: 'http://127.0.0.1:4717/jobs/1',
  units,
  paper: 'A3' as const,
  spools: list,
  skipped: [],
  printedAt: new Date('2026-12-01T12:00:00Z'),
});

describe('sawListGroups', () => {
  it('groups every piece by size, schedule and material, longest first, with totals incl. kerf', () => {
    const list = spools();
    const groups = sawListGroups(list);
    const allPieces = list.flatMap((s) => s.result.pieces);
    expect(groups.reduce((n, g) => n + g.pieces.length, 0)).toBe(allPieces.length);
    for (const g of groups) {
      for (const { piece } of g.pieces) {
        expect([piece.nps, piece.schedule, piece.material]).toEqual([g.nps, g.schedule, g.material]);
      }
      const lengths = g.pieces.map((p) => p.piece.cutLengthMm!);
      expect(lengths).toEqual([...lengths].sort((a, b) => b - a));
      expect(g.count).toBe(g.pieces.length);
      expect(g.totalCutMm).toBeCloseTo(
        lengths.reduce((s, l) => s + l, 0),
        6,
      );
      expect(g.totalStockMm).toBeCloseTo(
        g.pieces.reduce((s, p) => s + p.piece.stockLengthMm!, 0),
        6,
      );
      // Stock = cut + one kerf per cut, each at its own spool's kerf (the engine's spec).
      for (const p of g.pieces) {
        const spool = list.find((s) => s.mark === p.spoolMark)!;
        expect(p.piece.stockLengthMm! - p.piece.cutLengthMm!).toBeCloseTo(spool.result.spec.sawKerfMm, 6);
      }
    }
    // Distinct groups: the three samples are 14", 10" and 6" (plus small-bore).
    expect(new Set(groups.map((g) => `${g.nps}|${g.schedule}|${g.material}`)).size).toBe(groups.length);
  });
});

describe('renderSawList', () => {
  it.each(['mm', 'ft-in'] as const)(
    'prints every piece in saw order with its cut length, and the group totals (%s)',
    async (units) => {
      const f = units === 'mm' ? formatMm : formatFtIn;
      const out = await renderSawList(input(spools(), units));
      const pages = await readPdfText(out.pdf);
      const text = pages.map((p) => p.text).join(' ');
      expect(text).toContain('longest first');
      for (const g of out.groups) {
        const title = `NPS ${g.nps} · ${g.schedule} · ${g.material}`.toUpperCase();
        expect(text).toContain(title);
        expect(text).toContain(f(g.totalStockMm));
        expect(text).toContain(f(g.totalCutMm));
        // Saw order as printed: the pieces' cut lengths appear in descending order.
        let cursor = text.indexOf(title);
        for (const { piece, spoolMark } of g.pieces) {
          const at = text.indexOf(`${spoolMark} A ${piece.mark} ${f(piece.cutLengthMm!)}`, cursor);
          expect(at, `${spoolMark} ${piece.mark}`).toBeGreaterThan(cursor);
          cursor = at;
        }
      }
      for (const ink of renderPageInk(out.pdf, 20)) expect(ink.inkedFraction).toBeGreaterThan(0.02);
    },
  );

  it('flags unissued spools so their pieces are not cut', async () => {
    const list = spools();
    list[1]!.revisionState = 'draft';
    const out = await renderSawList(input(list));
    const text = (await readPdfText(out.pdf)).map((p) => p.text).join(' ');
    expect(text).toContain('INCLUDES UNISSUED SPOOLS: CW-S02 rev A (draft)');
    // Each of its pieces is flagged in its row, not only in the band.
    const draftPieces = list[1]!.result.pieces;
    expect(draftPieces.length).toBeGreaterThan(0);
    for (const p of draftPieces) expect(text).toMatch(new RegExp(`CW-S02 A NOT ISSUED ${p.mark} `));
  });
});
