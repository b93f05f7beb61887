import pino, { type DestinationStream, type Logger } from 'pino';

/** What replaces a secret in a log line. */
export const REDACTED = '[REDACTED]';

/**
 * Paths pino blanks out wherever they appear in a log object. A `*` matches one level only,
 * so each key is listed at the depths our log objects have (request, body, user, error).
 */
const SECRET_KEYS = ['password', 'passwordHash', 'password_hash', 'currentPassword', 'newPassword', 'token'];
export const REDACT_PATHS = [
  'req.headers.authorization',
  'req.headers.cookie',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'headers.cookie',
  'headers.authorization',
  'sessionID',
  'sid',
  ...SECRET_KEYS.flatMap((k) => [k, `*.${k}`, `*.*.${k}`, `*.*.*.${k}`]),
];

/** Error fields that are safe to log: never SQL parameters, driver details or request bodies. */
const SAFE_ERROR_FIELDS = [
  'code',
  'constraint',
  'table',
  'column',
  'routine',
  'status',
  'statusCode',
  'type',
];

/**
 * An error as a log object: name, message, stack and a few diagnostic codes. TypeORM's
 * QueryFailedError carries `parameters` (e.g. a password hash being inserted) and the pg
 * error's `detail` echoes stored values; both are left out, as is anything not listed.
 */
export function safeError(err: unknown, depth = 0): Record<string, unknown> {
  if (!(err instanceof Error)) return { message: typeof err === 'string' ? err : 'non-error thrown' };
  const out: Record<string, unknown> = { type: err.name, message: err.message, stack: err.stack };
  const fields = err as unknown as Record<string, unknown>;
  for (const key of SAFE_ERROR_FIELDS) {
    const value = fields[key];
    if (typeof value === 'string' || typeof value === 'number') out[key] = value;
  }
  if (typeof fields.query === 'string') out.sql = fields.query; // placeholders only ($1…), no values
  const driver = fields.driverError;
  if (driver instanceof Error && depth < 3) out.driverError = safeError(driver, depth + 1);
  if (err.cause !== undefined && depth < 3) out.cause = safeError(err.cause, depth + 1);
  return out;
}

/** Log level names pino accepts, plus `silent`. */
export const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'] as const;
export type LogLevel = (typeof LOG_LEVELS)[number];

/**
 * The server's structured logger: one JSON line per event on `destination` (stdout by default),
 * secrets redacted, errors through {@link safeError}.
 */
export function createLogger(level: LogLevel = 'info', destination?: DestinationStream): Logger {
  const options: pino.LoggerOptions = {
    level,
    base: { app: 'tackline' },
    redact: { paths: REDACT_PATHS, censor: REDACTED },
    serializers: { err: safeError, error: safeError },
  };
  return destination ? pino(options, destination) : pino(options);
}
