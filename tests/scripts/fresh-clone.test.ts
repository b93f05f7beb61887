import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, readlinkSync, statSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from '../e2e/helpers/browser';
import { DEMO_USERS, signInAs } from '../e2e/helpers/sign-in';

/**
 * The README's `npm start` on a fresh clone of the committed HEAD, in a new mode-700 folder
 * (as a clone under /root or in `mktemp -d` is), with no node_modules and a minimal
 * environment (CI=true, no stdin), as a new user or CI would run it.
 */

const ROOT = path.resolve(import.meta.dirname, '../..');
const IS_ROOT = process.getuid?.() === 0;

/** Two free loopback ports, found by letting the kernel pick and then releasing them. */
async function freePorts(count: number): Promise<number[]> {
  const servers = await Promise.all(
    Array.from(
      { length: count },
      () =>
        new Promise<net.Server>((resolve, reject) => {
          const s = net.createServer();
          s.once('error', reject);
          s.listen(0, '127.0.0.1', () => resolve(s));
        }),
    ),
  );
  const ports = servers.map((s) => (s.address() as net.AddressInfo).port);
  await Promise.all(servers.map((s) => new Promise((r) => s.close(r))));
  return ports;
}

/** True when something accepts TCP connections on 127.0.0.1:port. */
function portOpen(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

/** True while any process of the process group `pgid` is alive. */
function groupAlive(pgid: number): boolean {
  try {
    process.kill(-pgid, 0);
    return true;
  } catch {
    return false;
  }
}

/** True while `pid` runs (a zombie waiting for its parent to reap it counts as ended). */
function pidAlive(pid: number): boolean {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) !== 'Z';
  } catch {
    return false;
  }
}

/** Pids of the Tackline server processes (`node … server/index.ts`) running in `cwd`. */
function serverPids(cwd: string): number[] {
  const found: number[] = [];
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const cmdline = readFileSync(`/proc/${entry}/cmdline`, 'utf8').split('\0');
      if (!cmdline.includes('server/index.ts') || readlinkSync(`/proc/${entry}/cwd`) !== cwd) continue;
      found.push(Number(entry));
    } catch {
      // The process ended while we looked, or is not ours to inspect.
    }
  }
  return found;
}

async function waitFor<T>(
  what: string,
  probe: () => Promise<T | undefined> | T | undefined,
  ms: number,
  run?: StartRun,
) {
  const deadline = Date.now() + ms;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (run?.exitCode !== undefined)
      throw new Error(`npm start exited (${run.exitCode}) before ${what}:\n${run.tail()}`);
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}:\n${run?.tail() ?? ''}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** One `npm start` in its own process group, so it can be signalled like a terminal's Ctrl-C. */
class StartRun {
  readonly child: ChildProcess;
  output = '';
  exitCode: number | string | undefined;
  readonly exited: Promise<number | string>;

  constructor(cwd: string, env: NodeJS.ProcessEnv) {
    this.child = spawn('npm', ['start'], { cwd, env, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
    const collect = (d: Buffer) => (this.output += d.toString());
    this.child.stdout!.on('data', collect);
    this.child.stderr!.on('data', collect);
    this.exited = new Promise((resolve) =>
      this.child.on('exit', (code, signal) => {
        this.exitCode = code ?? signal ?? 'unknown';
        resolve(this.exitCode);
      }),
    );
  }

  get pgid(): number {
    return this.child.pid!;
  }

  tail(): string {
    return this.output.split('\n').slice(-40).join('\n');
  }

  /** Waits until the npm process has exited and no process of its group is left. */
  async stopped(): Promise<number | string> {
    const code = await this.exited;
    await waitFor('the process group to end', () => (groupAlive(this.pgid) ? undefined : true), 30_000);
    return code;
  }

  killAll(): void {
    if (groupAlive(this.pgid)) process.kill(-this.pgid, 'SIGKILL');
  }
}

describe('npm start on a fresh clone in a mode-700 folder', () => {
  let tmp: string;
  let checkout: string;
  let appPort: number;
  let pgPort: number;
  const runs: StartRun[] = [];

  /** Where the clone's cluster lives: outside it when recorded, else .data/postgres. */
  const clusterBase = () => {
    const record = path.join(checkout, '.data/postgres-location');
    return existsSync(record) ? readFileSync(record, 'utf8').trim() : path.join(checkout, '.data/postgres');
  };
  const postmasterPid = (): number | undefined => {
    const file = path.join(clusterBase(), 'data/postmaster.pid');
    return existsSync(file) ? Number(readFileSync(file, 'utf8').split('\n')[0]) : undefined;
  };
  const health = async (): Promise<true | undefined> => {
    try {
      const res = await fetch(`http://127.0.0.1:${appPort}/api/health`);
      return res.ok ? true : undefined;
    } catch {
      return undefined;
    }
  };
  const start = () => {
    const env: NodeJS.ProcessEnv = {
      PATH: process.env.PATH,
      HOME: process.env.HOME ?? os.homedir(),
      LANG: 'C.UTF-8',
      CI: 'true',
      TACKLINE_PORT: String(appPort),
      TACKLINE_PG_PORT: String(pgPort),
    };
    // npm's download cache only: every package is still installed afresh into the clone.
    if (process.env.npm_config_cache) env.npm_config_cache = process.env.npm_config_cache;
    const run = new StartRun(checkout, env);
    runs.push(run);
    return run;
  };

  beforeAll(async () => {
    [appPort, pgPort] = await freePorts(2);
    tmp = await mkdtemp(path.join(os.tmpdir(), 'tackline-fresh-'));
    checkout = path.join(tmp, 'p');
    const head = execFileSync('git', ['rev-parse', 'HEAD'], { cwd: ROOT, encoding: 'utf8' }).trim();
    execFileSync('git', ['clone', '-q', '--no-checkout', ROOT, checkout]);
    execFileSync('git', ['-c', 'advice.detachedHead=false', 'checkout', '-q', head], { cwd: checkout });
  }, 120_000);

  afterAll(async () => {
    for (const run of runs) run.killAll();
    if (!checkout) return;
    const base = clusterBase();
    const leftover = postmasterPid();
    // Only after a failure: the cluster's postmaster, stopped at once (immediate shutdown).
    if (leftover && pidAlive(leftover)) {
      process.kill(leftover, 'SIGQUIT');
      await waitFor(
        'the left-over PostgreSQL to stop',
        () => (pidAlive(leftover) ? undefined : true),
        30_000,
      );
    }
    if (!base.startsWith(tmp)) await rm(base, { recursive: true, force: true });
    await rm(tmp, { recursive: true, force: true });
  }, 120_000);

  it('installs, serves, signs in, survives a kill -9 of the server and stops cleanly, twice', async () => {
    expect(statSync(tmp).mode & 0o777).toBe(0o700);
    expect(existsSync(path.join(checkout, 'node_modules'))).toBe(false);

    // First start: npm ci (devDependencies included), a new cluster, the client build.
    const first = start();
    await waitFor('/api/health', health, 400_000, first);
    // The script announces the address (and the hint) just after the first health answer.
    const announced = () => (first.output.includes('QR codes on the sheets') ? true : undefined);
    await waitFor('the start announcement', announced, 60_000, first);
    expect(first.output).toContain('installing npm dependencies');
    expect(first.output).toContain('creating database cluster');
    // The loopback QR-code address comes with the way to set the LAN one.
    expect(first.output).toMatch(new RegExp(`PUBLIC_URL=http://\\S+:${appPort} HOST=`));
    if (IS_ROOT) {
      // postgres cannot enter the mode-700 folder: the data lives outside, recorded in the clone.
      expect(clusterBase().startsWith(tmp)).toBe(false);
      expect(readFileSync(path.join(clusterBase(), 'checkout'), 'utf8').trim()).toBe(checkout);
    }

    const browser = await launchBrowser();
    try {
      const page = await browser.freshPage();
      await page.goto(`http://127.0.0.1:${appPort}/`);
      await signInAs(page, DEMO_USERS.detailer);
    } finally {
      await browser.close();
    }

    // kill -9 of the server: it comes back, the database stays up meanwhile.
    const pgBefore = postmasterPid();
    expect(pgBefore).toBeDefined();
    const [serverPid, ...others] = serverPids(checkout);
    expect(serverPid).toBeDefined();
    expect(others).toEqual([]);
    process.kill(serverPid!, 'SIGKILL');
    await waitFor(
      'the restart notice',
      () => (first.output.includes('restarting in') ? true : undefined),
      30_000,
      first,
    );
    await waitFor('the server to answer again', health, 120_000, first);
    const [restartedPid] = serverPids(checkout);
    expect(restartedPid).toBeDefined();
    expect(restartedPid).not.toBe(serverPid);
    expect(postmasterPid()).toBe(pgBefore);

    // SIGTERM to npm, as a service manager stops it: server, then database, then nothing left.
    process.kill(first.child.pid!, 'SIGTERM');
    expect(await first.stopped()).toBe(0);
    expect(first.output).toContain('stopping PostgreSQL');
    expect(postmasterPid()).toBeUndefined();
    // pg_ctl stop returns once the pid file is gone; the postmaster exits right after.
    await waitFor('the postmaster to exit', () => (pidAlive(pgBefore!) ? undefined : true), 30_000);
    expect(await portOpen(pgPort)).toBe(false);
    expect(await portOpen(appPort)).toBe(false);

    // Second start finds the same data and node_modules; Ctrl-C (SIGINT to the group) stops it.
    const second = start();
    await waitFor('/api/health after a restart', health, 300_000, second);
    expect(second.output).not.toContain('installing npm dependencies');
    expect(second.output).not.toContain('creating database cluster');
    process.kill(-second.pgid, 'SIGINT');
    await second.stopped();
    expect(second.output).toContain('stopping PostgreSQL');
    expect(postmasterPid()).toBeUndefined();
    expect(await portOpen(pgPort)).toBe(false);
  }, 900_000);
});
