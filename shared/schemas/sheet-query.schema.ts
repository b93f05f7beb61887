import { z } from 'zod';
import { idSchema } from './id.schema';

/** Paper sizes a sheet can be printed on; every sheet is laid out landscape. */
export const PAPER_SIZES = ['A3', 'A4', 'Letter', 'Tabloid'] as const;
/** One of {@link PAPER_SIZES}. */
export type PaperSize = (typeof PAPER_SIZES)[number];

/** Default paper: A3, what a bench sheet is usually printed on. */
export const DEFAULT_PAPER: PaperSize = 'A3';

/** Labels for a paper choice, with the sheet's size in its own units. */
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

/** `?paper=A3|A4|Letter|Tabloid`, default A3. */
export const paperSchema = z.enum(PAPER_SIZES).default(DEFAULT_PAPER);

/** `GET /api/spools/:id/sheet.pdf` query: which revision (default: latest issued, else the draft) and paper. */
export const spoolSheetQuerySchema = z
  .object({
    revision: idSchema.optional(),
    paper: paperSchema,
  })
  .strict();
/** Parsed spool sheet query. */
export type SpoolSheetQuery = z.infer<typeof spoolSheetQuerySchema>;

/** Most spools one saw list takes: a large job's day of cutting. */
export const MAX_SAW_LIST_SPOOLS = 200;

/** `GET /api/jobs/:id/saw-list.pdf` query: comma-separated spool ids (default: every open spool of the job) and paper. */
export const sawListQuerySchema = z
  .object({
    spools: z
      .string()
      .trim()
      .min(1)
      .transform((s) => [
        ...new Set(
          s
            .split(',')
            .map((p) => p.trim())
            .filter(Boolean),
        ),
      ])
      .pipe(z.array(idSchema).min(1).max(MAX_SAW_LIST_SPOOLS))
      .optional(),
    paper: paperSchema,
  })
  .strict();
/** Parsed saw list query. */
export type SawListQuery = z.infer<typeof sawListQuerySchema>;
