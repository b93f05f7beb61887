import { describe, expect, it } from 'vitest';
import { safeNext, signInUrl } from '../../../src/app/safe-next';

describe('safeNext', () => {
  it('keeps a same-site path with its query', () => {
    expect(safeNext('/jobs/abc?page=2')).toBe('/jobs/abc?page=2');
  });

  it('refuses other hosts and protocol-relative paths', () => {
    expect(safeNext('https://evil.example/')).toBe('/');
    expect(safeNext('//evil.example/')).toBe('/');
    expect(safeNext('/\\evil.example')).toBe('/');
    expect(safeNext(null)).toBe('/');
  });

  it('never returns to the sign-in page itself', () => {
    expect(safeNext('/sign-in?next=/x')).toBe('/');
  });
});

describe('signInUrl', () => {
  it('carries the path to come back to, encoded', () => {
    expect(signInUrl('/spools/1?tab=a')).toBe('/sign-in?next=%2Fspools%2F1%3Ftab%3Da');
    expect(signInUrl('/')).toBe('/sign-in');
  });
});
