import { describe, expect, it } from 'vitest';
import { ApiError, isMissing, issuesOf, toApiError } from '../../../src/lib/api-error';

describe('toApiError', () => {
  it('keeps the server code and message', () => {
    const e = toApiError(403, { error: { code: 'forbidden', message: 'Detailers only' } });
    expect([e.status, e.code, e.message]).toEqual([403, 'forbidden', 'Detailers only']);
  });

  it('falls back to a status message when the body has none', () => {
    expect(toApiError(429, undefined).message).toMatch(/too many attempts/i);
  });
});

describe('issuesOf', () => {
  it('returns the zod issues of a 400 and ignores anything else', () => {
    const e = new ApiError(400, 'invalid_request', 'Bad', [{ path: ['spec', 'rootGapMm'], message: 'Too big' }, { nope: 1 }]);
    expect(issuesOf(e)).toEqual([{ path: ['spec', 'rootGapMm'], message: 'Too big' }]);
    expect(issuesOf(new Error('x'))).toEqual([]);
    const wrapped = new ApiError(400, 'invalid_request', 'Bad', { part: 'body', issues: [{ path: ['mark'], message: 'Required' }] });
    expect(issuesOf(wrapped)).toEqual([{ path: ['mark'], message: 'Required' }]);
    expect(issuesOf(new ApiError(409, 'stale_version', 'x', { current: {} }))).toEqual([]);
  });
});

describe('isMissing', () => {
  it('treats 404 and a refused id as missing, but not other failures', () => {
    expect(isMissing(new ApiError(404, 'not_found', 'x'))).toBe(true);
    expect(isMissing(new ApiError(400, 'invalid_request', 'x', { part: 'params', issues: [] }))).toBe(true);
    expect(isMissing(new ApiError(400, 'invalid_request', 'x', { part: 'body', issues: [] }))).toBe(false);
    expect(isMissing(new ApiError(403, 'forbidden', 'x'))).toBe(false);
    expect(isMissing(new ApiError(500, 'internal_error', 'x'))).toBe(false);
  });
});
