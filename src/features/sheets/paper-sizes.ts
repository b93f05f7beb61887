/** Paper sizes the server prints sheets on (always landscape). Mirrors server/modules/sheets/pdf/page-setup.ts. */
export const PAPER_SIZES = ['A3', 'A4', 'Letter', 'Tabloid'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/** Default paper: A3, what a bench sheet is usually printed on. */
export const DEFAULT_PAPER: PaperSize = 'A3';

export const PAPER_LABELS: Record<PaperSize, string> = {
  A3: 'A3 (420 × 297 mm)',
  A4: 'A4 (297 × 210 mm)',
  Letter: 'Letter (11 × 8½ in)',
  Tabloid: 'Tabloid (17 × 11 in)',
};

/** True when `value` is a paper size the server accepts. */
export function isPaperSize(value: unknown): value is PaperSize {
  return typeof value === 'string' && (PAPER_SIZES as readonly string[]).includes(value);
}
