import { ApiError, toApiError } from './api-error';

/** Query-string values; undefined, null and '' are left out. */
type Query = object;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
  /** Leave 401 to the caller instead of sending the user to sign-in (used by /auth/me and sign-in itself). */
  allowUnauthenticated?: boolean;
}

type UnauthorizedHandler = () => void;
let onUnauthorized: UnauthorizedHandler = () => {};

/** Registers what happens when a request comes back 401 (the app redirects to sign-in). */
export function setUnauthorizedHandler(handler: UnauthorizedHandler): void {
  onUnauthorized = handler;
}

/** Builds `/api/<path>?<query>`, dropping empty values. */
export function apiUrl(path: string, query?: Query): string {
  const url = `/api${path.startsWith('/') ? path : `/${path}`}`;
  if (!query) return url;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query) as [string, unknown][]) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const qs = params.toString();
  return qs ? `${url}?${qs}` : url;
}

/**
 * The one way the client talks to the API: JSON in and out, same-origin cookies,
 * every failure an ApiError carrying the server's code, message and details.
 */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, query, signal, allowUnauthenticated = false } = options;
  let response: Response;
  try {
    response = await fetch(apiUrl(path, query), {
      method,
      credentials: 'same-origin',
      // Every write says JSON, even without a body: the server refuses writes that do not
      // (that is what tells them from a form or no-cors fetch of another page).
      headers: {
        Accept: 'application/json',
        ...(body !== undefined || method !== 'GET' ? { 'Content-Type': 'application/json' } : {}),
      },
      body: body !== undefined ? JSON.stringify(body) : undefined,
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(
      0,
      'network_error',
      'Cannot reach the Tackline server. Check the connection and try again.',
    );
  }

  if (response.status === 204) return undefined as T;

  const text = await response.text();
  let parsed: unknown = undefined;
  if (text) {
    try {
      parsed = JSON.parse(text);
    } catch {
      parsed = undefined;
    }
  }

  if (!response.ok) {
    const error = toApiError(response.status, parsed);
    if (response.status === 401 && !allowUnauthenticated) onUnauthorized();
    throw error;
  }
  return parsed as T;
}
