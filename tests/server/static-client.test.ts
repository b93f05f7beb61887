import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

let db: TestDatabase;
let clientDir: string;

beforeAll(async () => {
  db = await createTestDatabase();
  clientDir = mkdtempSync(path.join(tmpdir(), 'tackline-client-'));
  mkdirSync(path.join(clientDir, 'assets'));
  writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Tackline test shell</title>');
  writeFileSync(path.join(clientDir, 'assets', 'app.js'), 'console.log("app")');
});
afterAll(async () => {
  await db?.drop();
  rmSync(clientDir, { recursive: true, force: true });
});

describe('serving the built client', () => {
  it('serves files, and index.html for any other page path (client-side routes)', async () => {
    const app = testApp(db.dataSource, db.url, { clientDir });
    const asset = await request(app).get('/assets/app.js');
    expect(asset.status).toBe(200);
    expect(asset.text).toContain('console.log');
    for (const page of ['/', '/jobs/3f1c2b9a-0d4e-4c1b-9a7e-2b6c8d0e1f23', '/users']) {
      const res = await request(app).get(page);
      expect(res.status, page).toBe(200);
      expect(res.text).toContain('Tackline test shell');
    }
  });

  it('a missing asset or file is a 404, not the page', async () => {
    const app = testApp(db.dataSource, db.url, { clientDir });
    for (const missing of [
      '/assets/x.js',
      '/assets/index-deadbeef.css',
      '/favicon-missing.png',
      '/assets/deep/none',
    ]) {
      const res = await request(app).get(missing);
      expect(res.status, missing).toBe(404);
      expect(res.text).not.toContain('Tackline test shell');
    }
  });

  it('never answers an /api path with the page: unknown API routes stay JSON 404s', async () => {
    const app = testApp(db.dataSource, db.url, { clientDir });
    const res = await request(app).get('/api/not-a-route');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('not_found');
  });

  it('without a built client, serves the API only', async () => {
    const app = testApp(db.dataSource, db.url, { clientDir: path.join(clientDir, 'missing') });
    await request(app).get('/jobs').expect(404);
    await request(app).get('/api/health').expect(200);
  });
});
