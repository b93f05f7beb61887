import type { RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { AppError } from './app-error';

/** Zod schemas for the parts of a request a route reads. */
export interface RequestSchemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

/** The parsed parts of a request, typed from its schemas. */
export type RequestInput<S extends RequestSchemas> = {
  [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never;
};

const PARTS = ['params', 'query', 'body'] as const;

/**
 * Validates params, query and body with zod and keeps the parsed values on
 * `res.locals.input` (Express 5's req.query is a getter: never reassign it).
 * A missing body counts as `{}`, so strict body schemas refuse stray fields.
 */
export function validate<S extends RequestSchemas>(schemas: S): RequestHandler {
  return (req, res, next) => {
    const input: Record<string, unknown> = {};
    for (const part of PARTS) {
      const schema = schemas[part];
      if (!schema) continue;
      const raw: unknown = part === 'body' ? (req.body ?? {}) : req[part];
      const result = schema.safeParse(raw);
      if (!result.success) {
        const where = part === 'params' ? 'path' : part === 'query' ? 'query string' : 'request body';
        return next(
          new AppError(400, 'invalid_request', `Invalid ${where}: ${summarise(result.error)}`, {
            part,
            issues: result.error.issues,
          }),
        );
      }
      input[part] = result.data;
    }
    res.locals.input = input;
    next();
  };
}

/** The values `validate(schemas)` parsed for this request. */
export function inputOf<S extends RequestSchemas>(res: Response, _schemas: S): RequestInput<S> {
  return res.locals.input as RequestInput<S>;
}

/** First issue in words, e.g. `spec.rootGapMm: Too big`. */
export function summarise(error: z.ZodError): string {
  const first = error.issues[0];
  if (!first) return 'invalid value';
  const path = first.path.join('.');
  const more = error.issues.length > 1 ? ` (and ${error.issues.length - 1} more)` : '';
  return `${path ? `${path}: ` : ''}${first.message}${more}`;
}
