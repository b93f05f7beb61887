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
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false })
    .promise;
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
    pages.push({
      width: viewport.width,
      height: viewport.height,
      items,
      text: items.map((i) => i.str).join(' '),
    });
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

/** A greyscale raster of one page. */
export interface GreyImage {
  width: number;
  height: number;
  pixels: Uint8Array;
}

/** Renders one page (1-based) to a greyscale raster with pdftoppm. */
export function renderPageGrey(pdf: Buffer, page: number, dpi: number): GreyImage {
  const dir = mkdtempSync(join(tmpdir(), 'sheet-grey-'));
  try {
    const file = join(dir, 'in.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', [
      '-gray',
      '-r',
      String(dpi),
      '-f',
      String(page),
      '-l',
      String(page),
      file,
      join(dir, 'page'),
    ]);
    const out = readdirSync(dir).find((f) => f.endsWith('.pgm'));
    if (!out) throw new Error('pdftoppm wrote no page');
    return parsePgm(readFileSync(join(dir, out)));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function measurePgm(data: Buffer): PageInk {
  const { width, height, pixels } = parsePgm(data);
  let dark = 0;
  let inked = 0;
  for (const g of pixels) {
    if (g < 128) dark += 1;
    if (g < 250) inked += 1;
  }
  return { width, height, darkFraction: dark / (width * height), inkedFraction: inked / (width * height) };
}

// Binary PGM (P5): "P5 <w> <h> <max>" then one byte per pixel.
function parsePgm(data: Buffer): GreyImage {
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
  return { width, height, pixels: new Uint8Array(data.subarray(offset, offset + width * height)) };
}

/** Bounding box of one path the page paints, in the page's drawing units (PDF points). */
export interface PathBox {
  paint: 'fill' | 'stroke' | 'other';
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/**
 * Bounding boxes of every constructed path on a page, read from the PDF's own operators
 * (pdfjs operator list): lets a test measure what was drawn, in points, without trusting the renderer.
 */
export async function readPathBoxes(pdf: Buffer, pageNumber: number): Promise<PathBox[]> {
  const { OPS } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await getDocument({ data: new Uint8Array(pdf), isEvalSupported: false }).promise;
  try {
    const page = await doc.getPage(pageNumber);
    const list = await page.getOperatorList();
    const boxes: PathBox[] = [];
    list.fnArray.forEach((fn, i) => {
      if (fn !== OPS.constructPath) return;
      const [paintOp, , minMax] = list.argsArray[i] as [number, unknown, ArrayLike<number> | null];
      if (!minMax) return;
      const paint =
        paintOp === OPS.fill || paintOp === OPS.eoFill ? 'fill' : paintOp === OPS.stroke ? 'stroke' : 'other';
      boxes.push({ paint, minX: minMax[0]!, minY: minMax[1]!, maxX: minMax[2]!, maxY: minMax[3]! });
    });
    return boxes;
  } finally {
    await doc.destroy();
  }
}
