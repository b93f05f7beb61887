import type { ErrorCode } from '../../shared/schemas/error.schema';

/** An error the API answers with as is: HTTP status, stable code, plain message, optional details. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** 404 for a record that does not exist or belongs to another shop (the two look the same). */
export function notFound(what: string): AppError {
  return new AppError(404, 'not_found', `${what} not found`);
}

/** 403 for a signed-in user whose role may not do this. */
export function forbidden(message = 'Your role does not allow this', details?: unknown): AppError {
  return new AppError(403, 'forbidden', message, details);
}

/** 409 when the client's version is not the stored one; `current` is the stored record. */
export function staleVersion(current: unknown): AppError {
  return new AppError(
    409,
    'stale_version',
    'Someone else changed this record since you loaded it. Nothing was saved.',
    { current },
  );
}

/** 422 for a well-formed request the current state of the records does not allow. */
export function unprocessable(message: string, details?: unknown): AppError {
  return new AppError(422, 'unprocessable', message, details);
}
