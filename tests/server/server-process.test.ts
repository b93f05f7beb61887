import { spawn } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db?.drop();
});

const root = path.resolve(import.meta.dirname, '../..');

describe('server/index.ts', () => {
  it('listens on loopback, answers health, and exits 0 on SIGTERM', async () => {
    const port = 40_000 + Math.floor(Math.random() * 10_000);
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      cwd: root,
      env: {
        ...process.env,
        NODE_ENV: 'test',
        DATABASE_URL: db.url,
        PORT: String(port),
        SESSION_SECRET: 'x'.repeat(32),
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    child.stdout.on('data', (d: Buffer) => (output += d.toString()));
    child.stderr.on('data', (d: Buffer) => (output += d.toString()));
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    try {
      const deadline = Date.now() + 60_000;
      while (!output.includes('listening on') && Date.now() < deadline) {
        if (child.exitCode !== null) break;
        await new Promise((r) => setTimeout(r, 100));
      }
      expect(output).toContain(`listening on http://127.0.0.1:${port}`);
      const res = await fetch(`http://127.0.0.1:${port}/api/health`);
      expect(res.status).toBe(200);
      expect(await res.json()).toEqual({ status: 'ok', database: 'up' });
      child.kill('SIGTERM');
      expect(await exited).toBe(0);
      expect(output).toContain('SIGTERM: stopping');
    } finally {
      if (child.exitCode === null) child.kill('SIGKILL');
    }
  }, 90_000);
});
