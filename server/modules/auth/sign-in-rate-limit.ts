import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from '../../common/app-error';

/** Sign-in attempt limits: per address + e-mail, and a looser one per address alone. */
export interface SignInLimits {
  maxAttemptsPerAccount: number;
  maxAttemptsPerIp: number;
  windowMs: number;
}

function tooMany(windowMs: number): AppError {
  const minutes = Math.ceil(windowMs / 60_000);
  return new AppError(
    429,
    'too_many_attempts',
    `Too many sign-in attempts. Try again in ${minutes} minutes.`,
  );
}

/**
 * Rate limiters for POST /api/auth/sign-in, one memory store per app. Successful
 * sign-ins are not counted, so only failures (and refused requests) use up attempts.
 */
export function signInRateLimits(limits: SignInLimits): RequestHandler[] {
  const common = {
    windowMs: limits.windowMs,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    // "trust proxy" is set on purpose from config; X-Forwarded-For without it is simply ignored.
    validate: { xForwardedForHeader: false },
    handler: ((_req, _res, next) => next(tooMany(limits.windowMs))) as RequestHandler,
  };
  const ip = (req: Parameters<RequestHandler>[0]) => ipKeyGenerator(req.ip ?? 'unknown');
  return [
    rateLimit({ ...common, limit: limits.maxAttemptsPerIp, keyGenerator: (req) => `ip:${ip(req)}` }),
    rateLimit({
      ...common,
      limit: limits.maxAttemptsPerAccount,
      keyGenerator: (req) => {
        const body = req.body as { email?: unknown } | undefined;
        const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
        return `account:${ip(req)}:${email}`;
      },
    }),
  ];
}
