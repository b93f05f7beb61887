import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { apiRequest, apiUrl, setUnauthorizedHandler } from '../../../src/lib/api-client';
import { ApiError } from '../../../src/lib/api-error';

function jsonResponse(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

describe('apiUrl', () => {
  it('prefixes /api and drops empty query values', () => {
    expect(apiUrl('/jobs', { page: 2, q: '', sort: 'number', status: undefined, order: null })).toBe('/api/jobs?page=2&sort=number');
  });

  it('leaves a path without query alone', () => {
    expect(apiUrl('jobs')).toBe('/api/jobs');
  });
});

describe('apiRequest', () => {
  const fetchMock = vi.fn<typeof fetch>();
  const onUnauthorized = vi.fn();

  beforeEach(() => {
    vi.stubGlobal('fetch', fetchMock);
    setUnauthorizedHandler(onUnauthorized);
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    fetchMock.mockReset();
    onUnauthorized.mockReset();
  });

  it('sends JSON with same-origin credentials and returns the parsed body', async () => {
    fetchMock.mockResolvedValue(jsonResponse(201, { id: 'j1' }));
    const result = await apiRequest<{ id: string }>('/jobs', { method: 'POST', body: { number: 'KPS-1' } });
    expect(result).toEqual({ id: 'j1' });
    const [url, init] = fetchMock.mock.calls[0]!;
    expect(url).toBe('/api/jobs');
    expect(init?.credentials).toBe('same-origin');
    expect(init?.method).toBe('POST');
    expect(init?.body).toBe('{"number":"KPS-1"}');
    expect((init?.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('returns undefined for 204', async () => {
    fetchMock.mockResolvedValue(new Response(null, { status: 204 }));
    await expect(apiRequest('/auth/sign-out', { method: 'POST' })).resolves.toBeUndefined();
  });

  it('turns the error shape into an ApiError with code, message and details', async () => {
    const current = { id: 's1', version: 4 };
    fetchMock.mockResolvedValue(
      jsonResponse(409, { error: { code: 'stale_version', message: 'Changed by someone else', details: { current } } }),
    );
    const error = await apiRequest('/spools/s1', { method: 'PATCH', body: {} }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(409);
    expect(apiError.code).toBe('stale_version');
    expect(apiError.message).toBe('Changed by someone else');
    expect(apiError.details).toEqual({ current });
    expect(apiError.isStale).toBe(true);
  });

  it('gives a plain message when the body is not the error shape (e.g. a proxy page)', async () => {
    fetchMock.mockResolvedValue(new Response('<html>Bad gateway</html>', { status: 502 }));
    const error = (await apiRequest('/jobs').catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe('server_error');
    expect(error.message).toMatch(/server/i);
  });

  it('calls the unauthorized handler on 401 unless the caller handles it', async () => {
    fetchMock.mockResolvedValue(jsonResponse(401, { error: { code: 'unauthenticated', message: 'Please sign in' } }));
    await expect(apiRequest('/jobs')).rejects.toBeInstanceOf(ApiError);
    expect(onUnauthorized).toHaveBeenCalledTimes(1);

    fetchMock.mockResolvedValue(jsonResponse(401, { error: { code: 'unauthenticated', message: 'Please sign in' } }));
    await expect(apiRequest('/auth/me', { allowUnauthenticated: true })).rejects.toBeInstanceOf(ApiError);
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('reports an unreachable server as a network error', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    const error = (await apiRequest('/jobs').catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe('network_error');
    expect(error.status).toBe(0);
  });
});
