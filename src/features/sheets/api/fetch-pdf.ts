import { ApiError, toApiError } from '../../../lib/api-error';

/**
 * Fetches a PDF as a blob, so a refusal (404, 403, 422) shows as the server's message in
 * the page instead of a tab full of JSON.
 */
export async function fetchPdf(url: string, signal?: AbortSignal): Promise<Blob> {
  let response: Response;
  try {
    response = await fetch(url, {
      credentials: 'same-origin',
      headers: { Accept: 'application/pdf, application/json' },
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
  if (!response.ok) {
    let body: unknown;
    try {
      body = await response.json();
    } catch {
      body = undefined;
    }
    throw toApiError(response.status, body);
  }
  return response.blob();
}
