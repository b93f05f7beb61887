import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** One text run on a page as pdfjs reads it, with its position in PDF points (origin bottom-left). */
export interface PdfTextItem {
  str: string;
  x: number;
  y: number;
}

export interface PdfPageText {
  width: number;
  height: number;
  items: PdfTextItem[];
  /** All runs joined with single spaces, for substring checks. */
  text: string;
}

/** Reads every page's text back out of a PDF, the way a reader or search would see it. */
export async function readPdfText(pdf: Buffer | Uint8Array): Promise<PdfPageText[]> {
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: PdfPageText[] = [];
  for (let n = 1; n <= doc.numPages; n += 1) {
    const page = await doc.getPage(n);
    const viewport = page.getViewport({ scale: 1 });
    const content = await page.getTextContent();
    const items: PdfTextItem[] = [];
    for (const item of content.items) {
      if (!('str' in item) || item.str.trim() === '') continue;
      items.push({ str: item.str, x: item.transform[4] as number, y: item.transform[5] as number });
    }
    pages.push({ width: viewport.width, height: viewport.height, items, text: items.map((i) => i.str).join(' ') });
  }
  await doc.destroy();
  return pages;
}

/** Grey-level statistics of one rendered page. */
export interface PageInk {
  width: number;
  height: number;
  /** Fraction of pixels darker than mid-grey. */
  darkFraction: number;
  /** Fraction of pixels that are not white. */
  inkedFraction: number;
}

/** Renders each page with pdftoppm (greyscale PGM) and measures how much of it carries ink. */
export function renderPageInk(pdf: Buffer, dpi = 30): PageInk[] {
  const dir = mkdtempSync(join(tmpdir(), 'sheet-ink-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', ['-gray', '-r', String(dpi), file, join(dir, 'page')]);
    return readdirSync(dir)
      .filter((f) => f.endsWith('.pgm'))
      .sort()
      .map((f) => measurePgm(readFileSync(join(dir, f))));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

// Binary PGM (P5): "P5 <w> <h> <max>" then one byte per pixel.
function measurePgm(data: Buffer): PageInk {
  let offset = 0;
  const tokens: string[] = [];
  while (tokens.length < 4) {
    while (/\s/.test(String.fromCharCode(data[offset]!))) offset += 1;
    if (data[offset] === 0x23) {
      while (data[offset] !== 0x0a) offset += 1;
      continue;
    }
    let token = '';
    while (!/\s/.test(String.fromCharCode(data[offset]!))) token += String.fromCharCode(data[offset++]!);
    tokens.push(token);
  }
  offset += 1;
  if (tokens[0] !== 'P5') throw new Error(`Not a binary PGM: ${tokens[0]}`);
  const width = Number(tokens[1]);
  const height = Number(tokens[2]);
  let dark = 0;
  let inked = 0;
  for (let i = offset; i < offset + width * height; i += 1) {
    const g = data[i]!;
    if (g < 128) dark += 1;
    if (g < 250) inked += 1;
  }
  return { width, height, darkFraction: dark / (width * height), inkedFraction: inked / (width * height) };
}
