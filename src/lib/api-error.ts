/** Stable error codes the API sends in `{ error: { code } }`; unknown codes pass through as strings. */
export type ApiErrorCode =
  | 'invalid_request'
  | 'unauthenticated'
  | 'forbidden'
  | 'reauthentication_failed'
  | 'not_found'
  | 'stale_version'
  | 'job_archived'
  | 'already_issued'
  | 'payload_too_large'
  | 'unprocessable'
  | 'too_many_attempts'
  | 'network_error'
  | 'server_error'
  | (string & {});

/** An API failure with the server's code, message and details (zod issues, the current record on 409…). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly details: unknown;

  constructor(status: number, code: ApiErrorCode, message: string, details?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }

  /** Someone saved first (409 stale_version); a 409 `duplicate` is a different problem. */
  get isStale(): boolean {
    return this.code === 'stale_version';
  }

  get isNotFound(): boolean {
    return this.status === 404;
  }
}

/** One zod issue as the API reports it in `details` of a 400. */
export interface ApiIssue {
  path: (string | number)[];
  message: string;
}

/** Field-level issues from a 400 `invalid_request` (`details.issues`, or a bare list), or an empty list. */
export function issuesOf(error: unknown): ApiIssue[] {
  if (!(error instanceof ApiError)) return [];
  const d = error.details;
  const list: unknown = Array.isArray(d)
    ? d
    : typeof d === 'object' && d !== null
      ? (d as { issues?: unknown }).issues
      : undefined;
  if (!Array.isArray(list)) return [];
  return list.filter(
    (d): d is ApiIssue =>
      typeof d === 'object' &&
      d !== null &&
      Array.isArray((d as ApiIssue).path) &&
      typeof (d as ApiIssue).message === 'string',
  );
}

const fallbackMessages: Record<number, string> = {
  400: 'The request was not valid.',
  401: 'Please sign in.',
  403: 'Your role does not allow this.',
  404: 'Not found.',
  409: 'Someone else changed this record.',
  413: 'That is too large to send.',
  422: 'That cannot be done in the current state.',
  429: 'Too many attempts. Wait a minute and try again.',
};

/** Turns a non-2xx response body (whatever its shape) into an ApiError. */
export function toApiError(status: number, body: unknown): ApiError {
  const err = typeof body === 'object' && body !== null ? (body as { error?: unknown }).error : undefined;
  if (typeof err === 'object' && err !== null) {
    const { code, message, details } = err as { code?: unknown; message?: unknown; details?: unknown };
    return new ApiError(
      status,
      typeof code === 'string' ? code : status >= 500 ? 'server_error' : `http_${status}`,
      typeof message === 'string' && message
        ? message
        : (fallbackMessages[status] ?? 'Something went wrong.'),
      details,
    );
  }
  return new ApiError(
    status,
    status >= 500 ? 'server_error' : `http_${status}`,
    fallbackMessages[status] ??
      (status >= 500 ? 'The server had a problem. Try again shortly.' : 'Something went wrong.'),
  );
}

/** A short message for any thrown value, for error states and toasts. */
export function messageOf(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}

/** A record that does not exist for this user: 404, or an id in the path the server refused as malformed. */
export function isMissing(error: unknown): boolean {
  if (!(error instanceof ApiError)) return false;
  if (error.status === 404) return true;
  const part =
    typeof error.details === 'object' && error.details !== null
      ? (error.details as { part?: unknown }).part
      : undefined;
  return error.status === 400 && part === 'params';
}
