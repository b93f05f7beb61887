import type { ErrorRequestHandler, RequestHandler } from 'express';
import { QueryFailedError } from 'typeorm';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import type { ErrorBody } from '../../shared/schemas/error.schema';
import { AppError } from './app-error';
import { summarise } from './validate.middleware';

/** Unique constraints and what to tell the user when one is hit. */
const DUPLICATE_MESSAGES: Record<string, string> = {
  app_user_org_email_key: 'A user with this e-mail already exists in your shop',
  job_org_number_key: 'A job with this number already exists in your shop',
  spool_job_mark_key: 'A spool with this mark already exists in this job',
};

interface BodyParserError {
  type?: string;
  status?: number;
  statusCode?: number;
  limit?: number;
}

/** Seconds a client is told to wait while the database comes back. */
export const DATABASE_RETRY_AFTER_SECONDS = 5;

// PostgreSQL SQLSTATEs of a server going away or not there yet: admin/crash shutdown,
// cannot connect now (starting up, shutting down), too many connections, connection exceptions.
const UNAVAILABLE_SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);
const UNAVAILABLE_NODE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'ENOTFOUND',
  'EAI_AGAIN',
]);
const UNAVAILABLE_MESSAGES =
  /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|Connection terminated unexpectedly/i;

/** True for an error that means the database cannot be reached right now (a restart, a network cut). */
export function isDatabaseUnavailable(err: unknown): boolean {
  const seen = new Set<unknown>();
  const check = (e: unknown): boolean => {
    if (!e || typeof e !== 'object' || seen.has(e)) return false;
    seen.add(e);
    const { code, message, driverError, errors, cause } = e as {
      code?: unknown;
      message?: unknown;
      driverError?: unknown;
      errors?: unknown;
      cause?: unknown;
    };
    if (
      typeof code === 'string' &&
      (UNAVAILABLE_SQLSTATES.has(code) || code.startsWith('08') || UNAVAILABLE_NODE_CODES.has(code))
    )
      return true;
    if (typeof message === 'string' && UNAVAILABLE_MESSAGES.test(message)) return true;
    if (check(driverError) || check(cause)) return true;
    return Array.isArray(errors) && errors.some(check);
  };
  return check(err);
}

/** Turns anything thrown into an AppError; unknown errors become a plain 500. */
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (isDatabaseUnavailable(err)) {
    return new AppError(
      503,
      'service_unavailable',
      'The database is not reachable right now (it may be restarting). Nothing was saved; try again in a few seconds.',
      { retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS },
    );
  }
  if (err instanceof ZodError) {
    return new AppError(400, 'invalid_request', `Invalid request: ${summarise(err)}`, { issues: err.issues });
  }
  const parser = err as BodyParserError;
  if (parser && typeof parser === 'object' && typeof parser.type === 'string') {
    if (parser.type === 'entity.too.large') {
      return new AppError(413, 'payload_too_large', 'The request body is too large', {
        limitBytes: parser.limit,
      });
    }
    if (parser.type === 'entity.parse.failed') {
      return new AppError(400, 'invalid_request', 'The request body is not valid JSON', {
        reason: 'malformed_json',
      });
    }
    if (parser.status === 413) {
      return new AppError(413, 'payload_too_large', 'The request body could not be read');
    }
  }
  // Anything else that already carries a 4xx (http-errors from the body reader, e.g. a
  // gzip body that is not gzip, an unknown Content-Encoding; the router's URIError) is the
  // client's mistake: say so, without echoing the low-level message.
  const status = parser && typeof parser === 'object' ? (parser.status ?? parser.statusCode) : undefined;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    if (status === 415) {
      return new AppError(
        415,
        'invalid_request',
        'The request body uses an encoding the server does not accept',
      );
    }
    return new AppError(400, 'invalid_request', 'The request could not be read');
  }
  if (err instanceof QueryFailedError) {
    const driver = err.driverError as { code?: string; constraint?: string };
    if (driver.code === '23505') {
      const message =
        (driver.constraint && DUPLICATE_MESSAGES[driver.constraint]) ?? 'This record already exists';
      return new AppError(409, 'duplicate', message);
    }
  }
  return new AppError(500, 'internal_error', 'Something went wrong on the server. Nothing was saved.');
}

/**
 * The one error middleware: every error leaves as `{ error: { code, message, details } }`.
 * A 5xx is logged through `logger`, whose `err` serializer keeps name, message, stack and
 * codes only (no SQL parameters, no request body); the URL is logged without its query.
 */
export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    const appError = toAppError(err);
    if (appError.status === 503) res.set('Retry-After', String(DATABASE_RETRY_AFTER_SECONDS));
    if (appError.status >= 500) {
      logger.error(
        { err, reqId: req.id, method: req.method, path: req.path, status: appError.status },
        `${req.method} ${req.path} failed`,
      );
    }
    const body: ErrorBody = { error: { code: appError.code, message: appError.message } };
    if (appError.details !== undefined) body.error.details = appError.details;
    res.status(appError.status).json(body);
  };
}

/** 404 in the error shape for an /api path no route answers. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route for ${req.method} ${req.path}`));
};
