import { z } from 'zod';
import { idSchema } from '../../../shared/schemas/id.schema';
import { DEFAULT_PAPER, PAPER_SIZES } from './pdf/page-setup';

/** `?paper=A3|A4|Letter|Tabloid`, default A3 (landscape always). */
export const paperSchema = z.enum(PAPER_SIZES).default(DEFAULT_PAPER);

/** `GET /api/spools/:id/sheet.pdf` query: which revision (default: see the service) and paper. */
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
