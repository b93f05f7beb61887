import { z } from 'zod';
import { textSchema } from './text.schema';

/** Largest page a list endpoint returns. */
export const MAX_PAGE_SIZE = 100;
/** Page size when the query names none. */
export const DEFAULT_PAGE_SIZE = 25;

/** Sort direction of a list. */
export const sortOrderSchema = z.enum(['asc', 'desc']);

/** Query-string boolean: only the literal strings `true` and `false`. */
export const queryBooleanSchema = z.enum(['true', 'false']).transform((v) => v === 'true');

/**
 * Builds the query schema shared by every list endpoint:
 * `?page=1&pageSize=25&sort=<field>&order=asc|desc&q=<text>`.
 * `sortFields` is the whitelist of sortable fields; the first is the default.
 * Unknown query parameters are refused (strict).
 */
export function listQuerySchema<const F extends readonly [string, ...string[]]>(
  sortFields: F,
  defaultOrder: z.infer<typeof sortOrderSchema> = 'asc',
) {
  return z
    .object({
      page: z.coerce.number().int().min(1).max(100_000).default(1),
      pageSize: z.coerce.number().int().min(1).max(MAX_PAGE_SIZE).default(DEFAULT_PAGE_SIZE),
      sort: z.enum(sortFields).default(sortFields[0] as F[number]),
      order: sortOrderSchema.default(defaultOrder),
      q: textSchema().trim().max(200).optional(),
    })
    .strict();
}

/** Builds the response schema of one page of a list: `{ items, total, page, pageSize }`. */
export function pageSchema<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int().min(0),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
  });
}

/** One page of a list. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
