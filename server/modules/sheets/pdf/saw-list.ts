import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { flowBlocks, type FlowBlock } from './flow-layout';
import type { PaperSize } from './page-setup';
import { paragraphBlock } from './paragraph-block';
import { sawListGroups, type SawListGroup, type SawListSpool } from './saw-list-groups';
import { SheetDocument, type DocumentMarks } from './sheet-document';
import { SHEET_CAUTIONS } from './sheet-cautions';
import { typeSizes } from './sheet-style';
import { tableBlock, type TableRow } from './table-block';
import { formatSheetDate } from './title-block';

export interface SawListInput {
  shopName: string;
  clientName: string;
  jobNumber: string;
  jobTitle: string;
  site: string;
  jobUrl: string;
  units: LengthUnits;
  paper: PaperSize;
  spools: SawListSpool[];
  /** Spool marks left out because they have no design yet. */
  skipped: string[];
  printedAt: Date;
}

/** Renders the job saw list. */
export async function renderSawList(
  input: SawListInput,
): Promise<{ pdf: Buffer; groups: SawListGroup[]; pageCount: number }> {
  const { units } = input;
  const sheet = new SheetDocument(input.paper, {
    title: `Saw list ${input.jobNumber}`,
    subject: input.jobTitle,
  });
  const { doc, setup } = sheet;
  const sizes = typeSizes(setup);
  const groups = sawListGroups(input.spools);
  const kerf = input.spools[0]?.result.spec.sawKerfMm ?? 0;

  const drafts = input.spools.filter((s) => s.revisionState !== 'issued');
  const withErrors = input.spools.filter((s) => !s.result.ok);
  const marks: DocumentMarks = { diagonal: null, bands: [] };
  if (drafts.length > 0) {
    marks.bands.push(
      `INCLUDES UNISSUED SPOOLS: ${drafts.map((s) => `${s.mark} rev ${s.revisionLetter} (${s.revisionState})`).join(', ')} — do not cut those pieces.`,
    );
    marks.diagonal = 'DRAFT';
  }
  if (withErrors.length > 0) {
    marks.bands.push(
      `NOT FOR FABRICATION: ${withErrors.map((s) => s.mark).join(', ')} ha${withErrors.length > 1 ? 've' : 's'} design errors.`,
    );
    marks.diagonal = 'NOT FOR FABRICATION';
  }
  const bandH = sheet.bandHeight(marks);
  const gap = setup.gutter;
  const columnsPerPage = input.paper === 'A3' || input.paper === 'Tabloid' ? 3 : 2;
  const columns = () => {
    const a = sheet.addPage('Saw list');
    const y = a.y + bandH + gap;
    const w = (a.w - gap * (columnsPerPage + 1)) / columnsPerPage;
    return Array.from({ length: columnsPerPage }, (_, i) => ({
      x: a.x + gap + i * (w + gap),
      y,
      w,
      h: a.y + a.h - y - gap,
    }));
  };

  const blocks: FlowBlock[] = [];
  blocks.push(
    paragraphBlock({
      title: 'How to use this list',
      size: sizes.body,
      list: 'bullet',
      paragraphs: [
        'Pieces are grouped by size, schedule and material. Saw order within each group: longest first, so the offcuts of long pieces can give the short ones.',
        `Cut length is the saw length of the piece. Stock includes one saw kerf (${formatLength(kerf, units)}) per cut. Tick each piece as it is cut and mark it with spool and piece mark.`,
        `Spools: ${input.spools.map((s) => `${s.mark} rev ${s.revisionLetter}`).join(', ') || 'none'}.`,
        ...(input.skipped.length > 0 ? [`Left out, no design yet: ${input.skipped.join(', ')}.`] : []),
      ],
    }),
  );
  let sequence = 0;
  for (const g of groups) {
    const rows: TableRow[] = g.pieces.map(({ spoolMark, revisionLetter, issued, piece }) => {
      const uncut = piece.cutLengthMm === null;
      if (!uncut) sequence += 1;
      return {
        cells: [
          uncut ? '—' : String(sequence),
          `${spoolMark} ${revisionLetter}${issued ? '' : ' NOT ISSUED'}`,
          piece.mark,
          uncut ? 'NOT COMPUTED' : formatLength(piece.cutLengthMm!, units),
          piece.stockLengthMm === null ? '—' : formatLength(piece.stockLengthMm, units),
          `${piece.ends[0].label} / ${piece.ends[1].label}`,
          piece.heat ?? '',
          '',
        ],
        emphasis: uncut || !issued ? 'warn' : undefined,
      };
    });
    rows.push({
      cells: [
        '',
        `Total: ${g.count} pcs`,
        '',
        formatLength(g.totalCutMm, units),
        formatLength(g.totalStockMm, units),
        g.uncomputed ? `${g.uncomputed} not computed` : '',
        '',
        '',
      ],
      emphasis: 'total',
    });
    blocks.push(
      tableBlock({
        title: `NPS ${g.nps} · ${g.schedule} · ${g.material}`,
        size: sizes.table,
        columns: [
          { header: '#', weight: 0.45 },
          { header: 'Spool', weight: 1.5, wrap: true },
          { header: 'Piece', weight: 0.6, font: 'body-bold' },
          { header: 'Cut length', weight: 1.35, align: 'right', font: 'body-bold' },
          { header: 'Stock', weight: 1.25, align: 'right' },
          { header: 'Ends', weight: 2.2, wrap: true },
          { header: 'Heat', weight: 0.8 },
          { header: 'Cut', weight: 0.4, align: 'center', checkbox: true },
        ],
        rows,
        footnote: `Longest first. ${g.count} pieces, ${formatLength(g.totalCutMm, units)} cut, ${formatLength(g.totalStockMm, units)} of stock including kerf.`,
      }),
    );
  }
  const totalCount = groups.reduce((s, g) => s + g.count, 0);
  const totalStock = groups.reduce((s, g) => s + g.totalStockMm, 0);
  blocks.push(
    tableBlock({
      title: 'Totals by group',
      size: sizes.table,
      columns: [
        { header: 'Size · schedule · material', weight: 3 },
        { header: 'Pieces', weight: 0.8, align: 'right' },
        { header: 'Cut', weight: 1.3, align: 'right' },
        { header: 'Stock incl. kerf', weight: 1.4, align: 'right', font: 'body-bold' },
      ],
      rows: [
        ...groups.map((g) => ({
          cells: [
            `NPS ${g.nps} · ${g.schedule} · ${g.material}`,
            String(g.count),
            formatLength(g.totalCutMm, units),
            formatLength(g.totalStockMm, units),
          ],
        })),
        {
          cells: [
            'All groups',
            String(totalCount),
            formatLength(
              groups.reduce((s, g) => s + g.totalCutMm, 0),
              units,
            ),
            formatLength(totalStock, units),
          ],
          emphasis: 'total' as const,
        },
      ],
      footnote: 'Stock assignment (nesting into stock lengths) is not part of this list yet.',
    }),
  );
  blocks.push(
    paragraphBlock({
      title: 'Cautions',
      paragraphs: [...SHEET_CAUTIONS],
      size: sizes.body,
      tone: 'caution',
      list: 'bullet',
    }),
  );

  flowBlocks(doc, blocks, { first: columns(), addPage: columns }, gap * 1.5);

  const pdf = await sheet.finish(
    {
      shopName: input.shopName,
      clientName: input.clientName,
      job: `${input.jobNumber} — ${input.jobTitle}`,
      site: input.site,
      markLabel: 'Saw list',
      mark: input.jobNumber,
      subMark: `${input.spools.length} spool${input.spools.length === 1 ? '' : 's'} · ${totalCount} pieces`,
      revisionLetter: null,
      revisionState: null,
      history: [],
      facts: [
        ['Printed', formatSheetDate(input.printedAt)],
        ['Units', units === 'mm' ? 'mm' : 'ft-in (1/16")'],
        ['Kerf', formatLength(kerf, units)],
        ['Cut by', null],
      ],
      qrUrl: input.jobUrl,
      qrCaption: 'Scan: job page',
    },
    marks,
  );
  return { pdf, groups, pageCount: sheet.pageCount };
}
