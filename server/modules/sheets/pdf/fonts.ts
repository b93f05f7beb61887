import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Font roles used on every sheet; each maps to one TTF shipped in fonts/ (OFL). */
export const FONT_FILES = {
  body: 'Barlow_400Regular.ttf',
  'body-medium': 'Barlow_500Medium.ttf',
  'body-semibold': 'Barlow_600SemiBold.ttf',
  'body-bold': 'Barlow_700Bold.ttf',
  'cond-semibold': 'BarlowCondensed_600SemiBold.ttf',
  'cond-bold': 'BarlowCondensed_700Bold.ttf',
  mono: 'JetBrainsMono_400Regular.ttf',
  'mono-bold': 'JetBrainsMono_700Bold.ttf',
} as const;

export type FontRole = keyof typeof FONT_FILES;

const FONTS_DIR = resolve(dirname(fileURLToPath(import.meta.url)), '../../../../fonts');

// Read once per process: a sheet render registers all eight, and disk reads would dominate small sheets.
let cache: Map<FontRole, Buffer> | null = null;

function fontBuffers(): Map<FontRole, Buffer> {
  if (!cache) {
    cache = new Map();
    for (const [role, file] of Object.entries(FONT_FILES) as [FontRole, string][]) {
      cache.set(role, readFileSync(resolve(FONTS_DIR, file)));
    }
  }
  return cache;
}

/** Registers every sheet font on a pdfkit document under its role name. */
export function registerSheetFonts(doc: PDFKit.PDFDocument): void {
  for (const [role, data] of fontBuffers()) doc.registerFont(role, data);
  doc.font('body');
}
