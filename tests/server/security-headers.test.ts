import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db?.drop();
});

/** The CSP header as a map of directive → sources. */
function directives(header: string | undefined): Map<string, string[]> {
  expect(header).toBeTypeOf('string');
  return new Map(
    header!
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...sources]) => [name!, sources]),
  );
}

describe('security headers', () => {
  it('sends a CSP without inline script, no framing, COOP, and no HSTS over http', async () => {
    const app = testApp(db.dataSource, db.url, { env: { PUBLIC_URL: 'http://127.0.0.1:4717' } });
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    const csp = directives(res.headers['content-security-policy']);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('style-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    // three.js loaders start workers from blob: URLs (measured in a built client, see stack notes).
    expect(csp.get('worker-src')).toEqual(["'self'", 'blob:']);
    const all = [...csp.values()].flat();
    expect(all).not.toContain("'unsafe-inline'");
    expect(all).not.toContain("'unsafe-eval'");
    // Over plain http an upgrade or HSTS would lock a LAN client out.
    expect(csp.has('upgrade-insecure-requests')).toBe(false);
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
    expect(res.headers['x-frame-options']).toBe('DENY');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('same-origin');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('adds HSTS and upgrade-insecure-requests when PUBLIC_URL is https', async () => {
    const app = testApp(db.dataSource, db.url, { env: { PUBLIC_URL: 'https://shop.example' } });
    const res = await request(app).get('/api/health');
    expect(res.headers['strict-transport-security']).toMatch(/^max-age=\d{7,}$/);
    const csp = directives(res.headers['content-security-policy']);
    expect(csp.has('upgrade-insecure-requests')).toBe(true);
  });

  it('sends the same headers on a 404 and on an error', async () => {
    const app = testApp(db.dataSource, db.url);
    const res = await request(app).get('/api/no-such-route');
    expect(res.status).toBe(404);
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
  });
});
