import type { RequestHandler } from 'express';
import type {} from 'express-session';

declare module 'express-session' {
  interface SessionData {
    /** When the user signed in (ms since the epoch); the session's absolute lifetime counts from here. */
    signedInAt?: number;
  }
}

/**
 * Ends a signed-in session `lifetimeMs` after its sign-in, however active it has been
 * (the cookie's 12 h idle time rolls with every request; this does not). A session without
 * a sign-in time (made before it was recorded) counts as expired. The session is replaced by
 * an empty one and its row removed, so the request goes on signed out: routes that need a
 * user answer 401 and the user signs in again. Runs before passport reads the session.
 */
export function endExpiredSessions(lifetimeMs: number, now: () => number = Date.now): RequestHandler {
  return (req, _res, next) => {
    const signedIn = (req.session as { passport?: { user?: unknown } } | undefined)?.passport?.user;
    if (signedIn === undefined) return next();
    const at = req.session.signedInAt;
    if (typeof at === 'number' && now() - at < lifetimeMs) return next();
    req.session.regenerate((err) => next(err));
  };
}
