import PDFDocument from 'pdfkit';
import { registerSheetFonts } from './fonts';
import { contentArea, pageSetup, type PageSetup, type PaperSize, type Rect } from './page-setup';
import { drawDiagonalStamp, drawWarningBand } from './stamps';
import { typeSizes } from './sheet-style';
import { drawFrame, drawTitleBlock, type TitleBlockFields } from './title-block';

/** Marks printed over every page of a document that must not be built from as it stands. */
export interface DocumentMarks {
  /** Large diagonal word (DRAFT, SUPERSEDED, NOT FOR FABRICATION), or null. */
  diagonal: string | null;
  /** Red band lines across the top of each page's content area. */
  bands: string[];
}

/**
 * A multi-page sheet being drawn: pages are buffered so that, once the content is placed,
 * every page gets its title block with "sheet n of m" and the document's marks on top.
 */
export class SheetDocument {
  readonly doc: PDFKit.PDFDocument;
  readonly setup: PageSetup;
  private readonly pageTitles: string[] = [];

  constructor(paper: PaperSize, info: { title: string; subject: string }) {
    this.setup = pageSetup(paper);
    this.doc = new PDFDocument({
      size: [this.setup.width, this.setup.height],
      margin: 0,
      autoFirstPage: false,
      bufferPages: true,
      info: { Title: info.title, Subject: info.subject, Creator: 'Tackline', Producer: 'Tackline (pdfkit)' },
    });
    registerSheetFonts(this.doc);
  }

  /** Adds a page with its frame; returns the free content area above the title block. */
  addPage(title: string): Rect {
    this.doc.addPage({ size: [this.setup.width, this.setup.height], margin: 0 });
    this.pageTitles.push(title);
    drawFrame(this.doc, this.setup);
    return this.contentArea();
  }

  /** Content area of a page (above the title block, inside the frame). */
  contentArea(): Rect {
    return contentArea(this.setup);
  }

  /** Content area below the warning bands, for pages that start their content at the top. */
  bandHeight(marks: DocumentMarks): number {
    return marks.bands.length * (typeSizes(this.setup).heading + 8);
  }

  get pageCount(): number {
    return this.pageTitles.length;
  }

  /** Stamps every page, writes the title blocks and returns the finished PDF. */
  async finish(fields: Omit<TitleBlockFields, 'pageTitle'>, marks: DocumentMarks): Promise<Buffer> {
    const { doc, setup } = this;
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    const done = new Promise<Buffer>((resolve, reject) => {
      doc.on('end', () => resolve(Buffer.concat(chunks)));
      doc.on('error', reject);
    });
    const range = doc.bufferedPageRange();
    const sizes = typeSizes(setup);
    for (let i = 0; i < range.count; i += 1) {
      doc.switchToPage(range.start + i);
      const area = this.contentArea();
      if (marks.diagonal) drawDiagonalStamp(doc, area, marks.diagonal);
      let y = area.y;
      for (const band of marks.bands) y += drawWarningBand(doc, { ...area, y }, band, sizes.heading);
      drawTitleBlock(doc, setup, { ...fields, pageTitle: this.pageTitles[i] ?? '' }, i + 1, range.count);
    }
    doc.end();
    return done;
  }
}
