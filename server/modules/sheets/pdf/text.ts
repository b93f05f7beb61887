import type { FontRole } from './fonts';
import { INK } from './sheet-style';

export interface TextStyle {
  font?: FontRole;
  size: number;
  color?: string;
  align?: 'left' | 'center' | 'right';
  /** Box width; text is kept on one line and ellipsised past it unless `wrap` is set. */
  width?: number;
  wrap?: boolean;
  lineGap?: number;
}

// Stand-ins for characters the sheet fonts lack (engine messages and user text may hold them):
// a missing glyph prints as an empty box, which on a cut sheet reads as a smudge.
const FALLBACKS: Record<string, string> = {
  '→': '->',
  '←': '<-',
  '↔': '<->',
  '≥': '>=',
  '≤': '<=',
  '≠': '!=',
  '±': '+/-',
  '✓': 'OK',
  '✔': 'OK',
  '✗': 'x',
  '⌀': 'dia. ',
  Ø: 'dia. ',
  '∠': 'angle ',
  Δ: 'delta ',
};

type GlyphFont = { font?: { hasGlyphForCodePoint?: (cp: number) => boolean } };

/** Replaces characters the current font cannot draw with plain stand-ins (or "?"). */
export function printable(doc: PDFKit.PDFDocument, value: string): string {
  const font = (doc as unknown as { _font?: GlyphFont })._font?.font;
  if (!font?.hasGlyphForCodePoint) return value;
  let out = '';
  for (const ch of value) {
    const cp = ch.codePointAt(0)!;
    if (cp < 0x80 || font.hasGlyphForCodePoint(cp)) out += ch;
    else out += FALLBACKS[ch] ?? '?';
  }
  return out;
}

/** Smallest type on a sheet, pt: every size asked for is raised to it (measuring and drawing alike). */
export const MIN_TEXT_PT = 7;
const pt = (size: number) => Math.max(MIN_TEXT_PT, size);

/** Writes text with its top at (x, y); returns the height used. One line unless `wrap`. */
export function drawText(
  doc: PDFKit.PDFDocument,
  value: string,
  x: number,
  y: number,
  style: TextStyle,
): number {
  doc
    .font(style.font ?? 'body')
    .fontSize(pt(style.size))
    .fillColor(style.color ?? INK.text);
  value = printable(doc, value);
  const options: PDFKit.Mixins.TextOptions = {
    width: style.width,
    align: style.align ?? 'left',
    lineGap: style.lineGap ?? 0,
    lineBreak: style.wrap ?? false,
  };
  if (!style.wrap && style.width !== undefined) options.ellipsis = true;
  if (!style.wrap && style.width !== undefined && doc.widthOfString(value) > style.width) {
    value = fitToWidth(doc, value, style.width);
  }
  const height =
    style.wrap && style.width !== undefined ? doc.heightOfString(value, options) : doc.currentLineHeight();
  doc.text(value, x, y, options);
  return height;
}

/** Height a wrapped paragraph will take at a width. */
export function measureWrapped(
  doc: PDFKit.PDFDocument,
  value: string,
  width: number,
  style: TextStyle,
): number {
  doc.font(style.font ?? 'body').fontSize(pt(style.size));
  return doc.heightOfString(printable(doc, value), { width, lineGap: style.lineGap ?? 0 });
}

/** Width of a one-line string in a style. */
export function measureWidth(
  doc: PDFKit.PDFDocument,
  value: string,
  style: Pick<TextStyle, 'font' | 'size'>,
): number {
  doc.font(style.font ?? 'body').fontSize(pt(style.size));
  return doc.widthOfString(value);
}

// Shortens a string with an ellipsis until it fits: a clipped value is visible as clipped,
// never silently overflowing into the next cell.
function fitToWidth(doc: PDFKit.PDFDocument, value: string, width: number): string {
  let cut = value;
  while (cut.length > 1 && doc.widthOfString(`${cut}…`) > width) cut = cut.slice(0, -1);
  return `${cut}…`;
}
