import { spawnSync } from 'node:child_process';
import { chmodSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';

/** The bash helpers behind npm start / dev / test, run one at a time in a scratch folder. */

const SCRIPTS = path.resolve(import.meta.dirname, '../../scripts');
const IS_ROOT = process.getuid?.() === 0;
const scratch: string[] = [];

function tempDir(mode = 0o755): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tackline-scripts-'));
  chmodSync(dir, mode);
  scratch.push(dir);
  return dir;
}

afterEach(() => {
  for (const dir of scratch.splice(0)) rmSync(dir, { recursive: true, force: true });
});

/** Runs `body` in bash after sourcing the given scripts, in `cwd`, with only `env` added. */
function bash(
  cwd: string,
  body: string,
  env: Record<string, string> = {},
  sources = ['pg.sh', 'deps.sh', 'app-env.sh'],
) {
  const prelude = sources.map((s) => `source ${JSON.stringify(path.join(SCRIPTS, s))}`).join('\n');
  const r = spawnSync('bash', ['-c', `set -euo pipefail\n${prelude}\n${body}`], {
    cwd,
    env: { PATH: process.env.PATH, HOME: process.env.HOME, ...env },
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('node_modules_complete (deps.sh)', { timeout: 120_000 }, () => {
  /** A project whose lockfile holds one runtime, one dev and one optional (other-platform) package. */
  function project(installed: Record<string, string>): string {
    const dir = tempDir();
    const locked = {
      '': { name: 'x' },
      'node_modules/runtime-pkg': { version: '1.0.0' },
      'node_modules/build-tool': { version: '2.0.0', dev: true },
      'node_modules/other-platform-binary': { version: '3.0.0', optional: true },
    };
    writeFileSync(
      path.join(dir, 'package-lock.json'),
      JSON.stringify({ lockfileVersion: 3, packages: locked }),
    );
    const record: Record<string, { version: string }> = {};
    for (const [name, version] of Object.entries(installed)) {
      mkdirSync(path.join(dir, 'node_modules', name), { recursive: true });
      writeFileSync(path.join(dir, 'node_modules', name, 'package.json'), JSON.stringify({ name, version }));
      record[`node_modules/${name}`] = { version };
    }
    if (Object.keys(installed).length) {
      writeFileSync(
        path.join(dir, 'node_modules/.package-lock.json'),
        JSON.stringify({ lockfileVersion: 3, packages: record }),
      );
    }
    return dir;
  }
  const check = (dir: string) => bash(dir, 'node_modules_complete', {}, ['deps.sh']);

  it('accepts every locked package at its version, optional ones may be missing', () => {
    expect(check(project({ 'runtime-pkg': '1.0.0', 'build-tool': '2.0.0' })).code).toBe(0);
  });

  it('refuses an install without devDependencies (npm ci under NODE_ENV=production)', () => {
    const r = check(project({ 'runtime-pkg': '1.0.0' }));
    expect(r.code).not.toBe(0);
    expect(r.err).toContain('build-tool@2.0.0');
  });

  it('refuses a package at another version than the lockfile, and no node_modules at all', () => {
    expect(check(project({ 'runtime-pkg': '1.0.0', 'build-tool': '1.9.0' })).code).not.toBe(0);
    expect(check(project({})).code).not.toBe(0);
  });

  it('refuses a package folder deleted after the install', () => {
    const dir = project({ 'runtime-pkg': '1.0.0', 'build-tool': '2.0.0' });
    rmSync(path.join(dir, 'node_modules/build-tool'), { recursive: true });
    expect(check(dir).code).not.toBe(0);
  });
});

describe('public_url_hint (app-env.sh)', { timeout: 120_000 }, () => {
  const hint = (env: Record<string, string>) =>
    bash(tempDir(), 'public_url_hint', { TACKLINE_PORT: '4717', ...env }, ['pg.sh', 'app-env.sh']).err;

  it('says how to set a LAN address while the QR-code address is loopback', () => {
    for (const env of [{}, { PUBLIC_URL: 'http://localhost:4717' }, { PUBLIC_URL: 'http://[::1]:4717' }]) {
      const text = hint(env);
      expect(text).toContain('which a phone in the bay cannot open');
      expect(text).toMatch(/PUBLIC_URL=http:\/\/\S+:4717 HOST=/);
    }
  });

  it('stays quiet when PUBLIC_URL or HOST already is an address phones can reach', () => {
    expect(hint({ PUBLIC_URL: 'http://192.168.1.20:4717' })).toBe('');
    expect(hint({ PUBLIC_URL: 'https://tackline.shop.example' })).toBe('');
    expect(hint({ HOST: '10.0.0.5' })).toBe('');
  });
});

describe.skipIf(!IS_ROOT)('resolve_pg_base (app-env.sh), as root', { timeout: 120_000 }, () => {
  const resolve = (cwd: string, outside: string) =>
    bash(cwd, 'resolve_pg_base; printf %s "$PG_BASE"', { TACKLINE_PG_OUTSIDE_ROOT: outside });

  it('keeps the cluster in .data/postgres when postgres can enter the checkout', () => {
    const checkout = tempDir(0o755);
    const r = resolve(checkout, path.join(tempDir(0o755), 'outside'));
    expect(r.code).toBe(0);
    expect(r.out).toBe(path.join(checkout, '.data/postgres'));
  });

  it('puts it in a postgres-owned folder outside a mode-700 checkout, and finds it again', () => {
    const parent = tempDir(0o700);
    const checkout = path.join(parent, 'p');
    mkdirSync(checkout);
    const outside = path.join(tempDir(0o755), 'outside');
    const first = resolve(checkout, outside);
    expect(first.code).toBe(0);
    expect(path.dirname(first.out)).toBe(outside);
    expect(readFileSync(path.join(checkout, '.data/postgres-location'), 'utf8').trim()).toBe(first.out);
    expect(readFileSync(path.join(first.out, 'checkout'), 'utf8').trim()).toBe(checkout);
    const postgresUid = Number(spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).stdout.trim());
    expect(statSync(first.out).uid).toBe(postgresUid);
    // The next start finds the same folder.
    expect(resolve(checkout, outside).out).toBe(first.out);
  });
});
