import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import { flangeDetailsBlock, flangePairsBlock } from './flange-details';
import { flowBlocks, type FlowBlock } from './flow-layout';
import { paragraphBlock } from './paragraph-block';
import type { PrintedDimension } from './iso-dimensions';
import { drawIsometric } from './iso-drawing';
import type { PaperSize, Rect } from './page-setup';
import type { SheetHeader } from './sheet-header';
import { SheetDocument, type DocumentMarks } from './sheet-document';
import { shopMarks } from './shop-marks';
import { INK, typeSizes } from './sheet-style';
import { bomBlock, cutListBlock, overallBlock, weldListBlock } from './tables';
import { templateFigures } from './template-figures';
import type { RevisionChanges } from './revision-changes';
import { drawTemplatePages, type TemplatePagesReport } from './templates-pages';
import { formatSheetDate, type TitleBlockFields } from './title-block';
import { cautionsBlock, issuesBlock, notesBlock, weightsBlock } from './weights-notes';

/** Everything a spool sheet is drawn from. */
export interface SpoolSheetInput {
  header: SheetHeader;
  design: SpoolDesign;
  result: SpoolResult;
  units: LengthUnits;
  paper: PaperSize;
  /** Differences from the previous issued revision, when there is one. */
  changes?: RevisionChanges | null;
}

/** The PDF and what it printed, so tests and callers can check it against the engine. */
export interface SpoolSheetOutput {
  pdf: Buffer;
  pageCount: number;
  dimensions: PrintedDimension[];
  templates: TemplatePagesReport;
  marks: DocumentMarks;
}

/** Marks a sheet carries: DRAFT / SUPERSEDED by revision state, NOT FOR FABRICATION on engine errors. */
export function sheetMarks(header: SheetHeader, result: SpoolResult): DocumentMarks {
  const errors = result.issues.filter((i) => i.severity === 'error').length;
  const bands: string[] = [];
  const state = header.revision.state;
  if (state === 'draft')
    bands.push(`DRAFT — revision ${header.revision.letter} is not issued. Do not fabricate from this sheet.`);
  if (state === 'superseded') {
    const newer = header.history.find((h) => h.state === 'issued');
    bands.push(
      `SUPERSEDED${newer ? ` by revision ${newer.letter}` : ''} — do not use. Get the current sheet.`,
    );
  }
  if (errors > 0)
    bands.push(
      `NOT FOR FABRICATION — the design has ${errors} error${errors > 1 ? 's' : ''} (listed on this sheet).`,
    );
  const diagonal =
    state === 'superseded'
      ? 'SUPERSEDED'
      : state === 'draft'
        ? errors > 0
          ? 'DRAFT · NOT FOR FABRICATION'
          : 'DRAFT'
        : errors > 0
          ? 'NOT FOR FABRICATION'
          : null;
  return { diagonal, bands };
}

function rootDatum(
  design: SpoolDesign,
  result: SpoolResult,
): { label: string; position: SpoolResult['workPoints'][number]['position'] } {
  const targets = new Set(design.runs.map((r) => r.to));
  const root = design.nodes.find((n) => !targets.has(n.id)) ?? design.nodes[0];
  if (!root) return { label: 'the design origin', position: design.origin };
  const position = result.workPoints.find((w) => w.nodeId === root.id)?.position ?? design.origin;
  const mark = shopMarks(result).get(root.id) ?? 'the first component';
  return { label: `the work point of ${root.label ? `${root.label} (${mark})` : mark}`, position };
}

function sheetNotes(input: SpoolSheetInput, templateProblems: string[]): string[] {
  const { result, units, header, design } = input;
  const spec = result.spec;
  const unitText = units === 'mm' ? 'millimetres' : 'feet and inches, to the nearest 1/16"';
  const notes = [
    `All dimensions in ${unitText}. Run dimensions are work point to work point (centre-to-centre; centre-to-face at flanged ends).`,
    `Root gap ${formatLength(spec.rootGapMm, units)} per butt weld, socket gap ${formatLength(spec.socketGapMm, units)}; take-offs from ASME B16.9 / B16.5 / B16.11 as listed in the bill of materials.`,
    `Pipe ${spec.material}, ${spec.schedule}; fittings ${spec.fittingMaterial}; flanges ${spec.flangeMaterial}, Class ${spec.flangeClass}.`,
    'Butt-weld ends bevelled 37.5° with a 1.6 mm land (ASME B16.25) unless listed otherwise.',
    `Flange bolt holes as shown in the bolt-hole views; tolerance ${formatLength(spec.boltHoleToleranceMm, units)} at the bolt circle. Check every flange before tacking.`,
    'Check overall and centre-to-face dimensions against this sheet before release; record results on the spool’s inspection record.',
  ];
  const raisedFace = result.flanges.find((f) => f.raisedFaceMm !== null)?.raisedFaceMm ?? null;
  if (raisedFace !== null)
    notes.push(
      `Flange take-offs include a ${formatLength(raisedFace, units)} raised face (ASME B16.5 metric tables); many inch-made flanges have 1.6 mm: measure before cutting.`,
    );
  if (design.description) notes.push(`Design: ${design.description}`);
  if (header.revision.note) notes.push(`Revision ${header.revision.letter}: ${header.revision.note}`);
  notes.push(...templateProblems);
  return notes;
}

// What each flange cell adds to its own line: the designer's label (where it goes) and a revision mark.
function flangeExtras(design: SpoolDesign, changes: RevisionChanges | null): Map<string, string> {
  const out = new Map<string, string>();
  for (const node of design.nodes) if (node.label) out.set(node.id, `“${node.label}”`);
  for (const id of changes?.changedFlanges ?? [])
    out.set(id, [out.get(id), `changed in rev ${changes!.markLetter}`].filter(Boolean).join(' · '));
  return out;
}

/** Renders a spool's fabrication sheet: drawing, tables, flange views, notes, cautions and 1:1 templates. */
export async function renderSpoolSheet(input: SpoolSheetInput): Promise<SpoolSheetOutput> {
  const { header, result, units, paper, design } = input;
  const sheet = new SheetDocument(paper, {
    title: `Spool ${header.spoolMark} rev ${header.revision.letter}`,
    subject: `${header.jobNumber} ${header.jobTitle}`,
  });
  const { doc, setup } = sheet;
  const sizes = typeSizes(setup);
  const marks = sheetMarks(header, result);
  const bandH = sheet.bandHeight(marks);
  // Flange tags F1, F2… are the flanges' shop marks (shop-marks.ts numbers them the same way).
  const flangeTags = new Map(result.flanges.map((f, i) => [f.nodeId, `F${i + 1}`]));

  // Page 1: drawing on the left, first columns of tables on the right.
  const area = sheet.addPage('Spool drawing');
  const top = area.y + bandH;
  const large = paper === 'A3' || paper === 'Tabloid';
  // A crowded spool gets the whole first sheet for its drawing; the lists start on sheet 2.
  const crowded = result.runs.length + result.welds.length > (large ? 36 : 24);
  const drawingW = crowded ? area.w : area.w * (large ? 0.6 : 0.56);
  const drawing: Rect = { x: area.x, y: top, w: drawingW, h: area.y + area.h - top };
  const changes = input.changes ?? null;
  const dimensions = drawIsometric(doc, drawing, {
    result,
    units,
    sizes,
    flangeTags,
    revisionMark: changes ? { letter: changes.markLetter, runs: changes.changedRuns } : null,
  });
  if (!crowded)
    doc
      .save()
      .lineWidth(0.6)
      .strokeColor(INK.rule)
      .moveTo(area.x + drawingW, top)
      .lineTo(area.x + drawingW, area.y + area.h)
      .stroke()
      .restore();

  const { figures, problems } = templateFigures(result, units);
  const gap = setup.gutter;
  const tableSize = sizes.table;
  const blocks: FlowBlock[] = [];
  const issues = issuesBlock(result, sizes.body);
  if (issues) blocks.push(issues);
  if (changes) {
    blocks.push(
      paragraphBlock({
        title: `Changed since revision ${changes.sinceLetter}`,
        paragraphs: [
          ...(changes.rework
            ? [
                `Rework: was ${changes.rework.fromStatus}, back to ${changes.rework.toStatus}. Redo the work these changes undo before the spool moves on.`,
              ]
            : []),
          ...(changes.lines.length > 0
            ? changes.lines
            : ['No change to any component, run, cut length, flange, weld or spec value.']),
        ],
        size: sizes.body,
        list: 'bullet',
      }),
    );
  }
  blocks.push(weightsBlock(result, units, rootDatum(design, result), tableSize));
  blocks.push(
    cutListBlock(
      result,
      units,
      tableSize,
      changes ? { letter: changes.markLetter, pieces: changes.changedPieces } : null,
    ),
  );
  blocks.push(weldListBlock(result, tableSize));
  if (result.flanges.length > 0)
    blocks.push(
      // Shop marks of every component: flange tags and the bends their angles refer to.
      flangeDetailsBlock(result.flanges, shopMarks(result), units, tableSize, flangeExtras(design, changes)),
    );
  const pairs = flangePairsBlock(result, flangeTags, units, tableSize);
  if (pairs) blocks.push(pairs);
  const overall = overallBlock(result, units, tableSize);
  if (overall) blocks.push(overall);
  blocks.push(bomBlock(result, units, tableSize));
  blocks.push(notesBlock(sheetNotes(input, problems), sizes.body));
  blocks.push(cautionsBlock(sizes.body));

  const rightX = area.x + drawingW + gap;
  const firstColumn: Rect = {
    x: rightX,
    y: top + gap,
    w: area.x + area.w - rightX - gap,
    h: area.y + area.h - top - 2 * gap,
  };
  const columnsPerPage = large ? 3 : 2;
  flowBlocks(
    doc,
    blocks,
    {
      first: crowded ? [] : [firstColumn],
      addPage: () => {
        const a = sheet.addPage('Lists, flanges and notes');
        const y = a.y + bandH + gap;
        const w = (a.w - gap * (columnsPerPage + 1)) / columnsPerPage;
        return Array.from({ length: columnsPerPage }, (_, i) => ({
          x: a.x + gap + i * (w + gap),
          y,
          w,
          h: a.y + a.h - y - gap,
        }));
      },
    },
    gap * 1.5,
  );

  const templates = drawTemplatePages(sheet, figures, units, bandH);
  const fields: Omit<TitleBlockFields, 'pageTitle'> = {
    shopName: header.shopName,
    clientName: header.clientName,
    job: `${header.jobNumber} — ${header.jobTitle}`,
    site: header.site,
    markLabel: 'Spool',
    mark: header.spoolMark,
    subMark: `Line ${header.lineNumber || '—'}`,
    revisionLetter: header.revision.letter,
    revisionState: header.revision.state,
    history: header.history,
    facts: [
      ['Status', header.spoolStatus],
      ['Drawn', header.drawnBy],
      ['Checked', header.checkedBy],
      [
        'Date',
        header.revision.issuedAt
          ? `${formatSheetDate(header.revision.issuedAt)} issued`
          : `${formatSheetDate(header.printedAt)} printed`,
      ],
      ['Units', units === 'mm' ? 'mm' : 'ft-in (1/16")'],
    ],
    qrUrl: header.spoolUrl,
  };
  const pdf = await sheet.finish(fields, marks);
  return { pdf, pageCount: sheet.pageCount, dimensions, templates, marks };
}
