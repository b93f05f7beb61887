import type { RequestHandler } from 'express';
import { AppError } from './app-error';

/**
 * Refuses a URL whose path or query string is not valid percent-encoded UTF-8 (`%zz`,
 * a cut-off `%E0%A4%A`, a bare `%`, `%ff`, or the encoded halves of a surrogate), before
 * any router or parser decodes it. Runs first, so the answer is the same signed in or out.
 */
export const rejectBadUrlEncoding: RequestHandler = (req, _res, next) => {
  const url = req.originalUrl ?? req.url;
  const q = url.indexOf('?');
  const path = q === -1 ? url : url.slice(0, q);
  const query = q === -1 ? '' : url.slice(q + 1);
  if (!decodes(path)) {
    return next(new AppError(400, 'invalid_request', 'The URL path is not valid percent-encoded UTF-8'));
  }
  // '+' means a space in a query string; it never makes the encoding invalid.
  if (query && !query.split('&').every((part) => decodes(part.replaceAll('+', ' ')))) {
    return next(new AppError(400, 'invalid_request', 'The query string is not valid percent-encoded UTF-8'));
  }
  next();
};

function decodes(text: string): boolean {
  if (!text.includes('%')) return true;
  try {
    decodeURIComponent(text);
    return true;
  } catch {
    return false;
  }
}
