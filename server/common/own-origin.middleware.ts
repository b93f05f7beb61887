import type { Request, RequestHandler } from 'express';
import { AppError } from './app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The media type of a Content-Type header, lower case, without parameters; '' when absent. */
function mediaType(req: Request): string {
  return (req.headers['content-type'] ?? '').split(';')[0]!.trim().toLowerCase();
}

/**
 * Refuses a state-changing request that does not prove it comes from Tackline's own pages.
 *
 * - The body is declared as JSON, even when empty (`Content-Length: 0`): another page can
 *   only send `application/json` after a CORS preflight, which this server never grants,
 *   while forms and `fetch(…, { mode: 'no-cors' })` send text/plain, form types or nothing.
 * - `Sec-Fetch-Site`, when the browser sends it, is `same-origin`: a page on another port of
 *   the same host is `same-site`, which SameSite=Lax cookies do not stop.
 * - `Origin`, when sent, is one of `allowedOrigins` (PUBLIC_URL, the dev server) or the
 *   origin the request itself was addressed to (scheme + Host; a browser cannot forge Host,
 *   and a page reached through another name carries no cookie of this one).
 *
 * A client with neither header (curl, scripts) is no browser acting on a user's cookie.
 */
export function requireOwnOrigin(allowedOrigins: readonly string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    if (mediaType(req) !== 'application/json') {
      return next(
        new AppError(
          400,
          'invalid_request',
          'Send the request body as JSON (Content-Type: application/json)',
          {
            reason: 'json_required',
          },
        ),
      );
    }
    const site = req.get('sec-fetch-site');
    if (site !== undefined && site !== 'same-origin') {
      return next(crossSite(`Sec-Fetch-Site: ${site}`));
    }
    const origin = req.get('origin');
    if (origin !== undefined) {
      const own = `${req.protocol}://${req.get('host') ?? ''}`;
      if (!allowed.has(origin) && origin !== own) return next(crossSite(`Origin: ${origin}`));
    }
    next();
  };
}

function crossSite(seen: string): AppError {
  return new AppError(
    403,
    'forbidden',
    'This request did not come from a Tackline page, so nothing was changed',
    {
      reason: 'cross_site_request',
      seen,
    },
  );
}
