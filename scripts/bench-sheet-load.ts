/**
 * Benchmark (not a test): how sheet rendering scales with design size, and whether a stream of
 * sheet requests starves everything else.
 *
 * 1. Sheet time at 500 / 2,000 / 5,000 nodes (a zig-zag chain of elbows): validation, engine
 *    and PDF, called directly (the API refuses designs over MAX_DESIGN_NODES).
 * 2. Load: the real app on a throwaway database and a loopback port; BENCH_CLIENTS clients
 *    (default 50) ask for the sheet of a MAX_DESIGN_NODES-node draft back to back for
 *    BENCH_SECONDS (default 30) while one probe reads /api/health and the job list every
 *    100 ms; prints the probes' p50 / p95 / max and what the sheet requests got.
 *
 * Run: TEST_DATABASE_ADMIN_URL=postgres://postgres@127.0.0.1:54800/postgres npx tsx scripts/bench-sheet-load.ts
 * (part 2 is skipped without TEST_DATABASE_ADMIN_URL; BENCH_SIZES=500,2000 picks the sizes).
 */
import { randomBytes } from 'node:crypto';
import { spawn, type ChildProcess } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { createServer as createNetServer, type AddressInfo } from 'node:net';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { createDataSource } from '../server/db/data-source';
import { runSheetRenderJob } from '../server/modules/sheets/render/sheet-render-job';
import { MAX_DESIGN_NODES } from '../shared/schemas/spool-design.schema';
import { elbowChainDesign } from '../tests/server/sheets/helpers/elbow-chain';
import { createJob, createShop, createSpool, PASSWORD } from '../tests/server/helpers/fixtures';
import { testHeader } from '../tests/server/sheets/helpers/sheet-fixtures';
import { SpoolRevisionEntity } from '../server/modules/revisions/spool-revision.entity';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const s = [...values].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)]!;
}
const ms = (v: number) => `${v.toFixed(0)} ms`;

async function sizes(): Promise<void> {
  const list = (process.env.BENCH_SIZES ?? '500,2000,5000').split(',').map(Number);
  console.log(`1. Sheet time by design size (A3, mm, one process, Node ${process.version})`);
  // Warm-up: fonts and JIT are a one-off per thread.
  await runSheetRenderJob(sheetJob(20));
  for (const n of list) {
    const t0 = performance.now();
    const out = await runSheetRenderJob(sheetJob(n));
    const t = performance.now() - t0;
    if (!out.ok) throw new Error(out.message);
    const heap = process.memoryUsage();
    console.log(
      `   ${String(n).padStart(5)} nodes: ${ms(t).padStart(8)}  ${out.pageCount} pages, ${(out.pdf.length / 1024).toFixed(0)} kB, rss ${(heap.rss / 2 ** 20).toFixed(0)} MiB`,
    );
  }
}

function sheetJob(n: number) {
  return {
    kind: 'spool-sheet' as const,
    header: testHeader(`CHAIN-${n}`, 'draft'),
    design: elbowChainDesign(n),
    previous: null,
    jobSpec: {},
    units: 'mm' as const,
    paper: 'A3' as const,
  };
}

// The probe loop runs on a thread of its own, so the 50 clients' work in this process does not
// delay its own readings. Plain JavaScript: it is evaluated, not loaded through tsx.
const PROBE_THREAD = `
const { parentPort, workerData } = require('node:worker_threads');
const { performance } = require('node:perf_hooks');
(async () => {
  const { base, cookie, paths, until } = workerData;
  const out = Object.fromEntries(paths.map((p) => [p, { times: [], failed: 0 }]));
  while (Date.now() < until) {
    for (const p of paths) {
      const t0 = performance.now();
      try {
        const res = await fetch(base + p, { headers: { cookie } });
        await res.arrayBuffer();
        if (res.status !== 200) out[p].failed += 1;
      } catch { out[p].failed += 1; }
      out[p].times.push(performance.now() - t0);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  parentPort.postMessage(out);
})();
`;

async function freePort(): Promise<number> {
  return new Promise<number>((resolve) => {
    const s = createNetServer().listen(0, '127.0.0.1', () => {
      const p = (s.address() as AddressInfo).port;
      s.close(() => resolve(p));
    });
  });
}

async function load(adminUrl: string): Promise<void> {
  const clients = Number(process.env.BENCH_CLIENTS ?? 50);
  const seconds = Number(process.env.BENCH_SECONDS ?? 30);
  const name = `tackline_bench_${randomBytes(5).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const ds = createDataSource(url.toString(), { poolSize: 2 });
  let server: ChildProcess | null = null;
  try {
    await ds.initialize();
    await ds.runMigrations({ transaction: 'each' });
    const shop = await createShop(ds, 'Bench');
    const job = await createJob(ds, shop);
    const { spool, draft } = await createSpool(ds, shop, job);
    await ds
      .getRepository(SpoolRevisionEntity)
      .update({ id: draft.id }, { design: elbowChainDesign(MAX_DESIGN_NODES) as never });

    // The server as `npm start` runs it (scripts/start.sh): its own process, tsx as a loader.
    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    server = spawn(
      process.execPath,
      [
        ...(process.env.BENCH_SERVER_ARGS ?? '').split(' ').filter(Boolean),
        '--import',
        'tsx',
        'server/index.ts',
      ],
      {
        cwd: ROOT,
        stdio: ['ignore', 'ignore', 'inherit'],
        env: {
          ...process.env,
          NODE_ENV: 'production',
          DATABASE_URL: url.toString(),
          PORT: String(port),
          HOST: '127.0.0.1',
          PUBLIC_URL: base,
          SESSION_SECRET: 'bench-secret-0123456789',
          SIGN_IN_MAX_ATTEMPTS: '1000',
        },
      },
    );
    for (let i = 0; ; i += 1) {
      if (i > 240) throw new Error('the server did not come up in 2 minutes');
      const up = await fetch(`${base}/api/health`).then(
        (r) => r.ok,
        () => false,
      );
      if (up) break;
      await new Promise((r) => setTimeout(r, 500));
    }
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: base, 'sec-fetch-site': 'same-origin' },
      body: JSON.stringify({ email: shop.email('viewer'), password: PASSWORD }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in: ${signIn.status} ${await signIn.text()}`);
    const cookie = signIn.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
    const auth = { cookie };

    console.log(
      `\n2. Load: ${clients} clients on sheet.pdf of a ${MAX_DESIGN_NODES}-node draft for ${seconds} s; probes every 100 ms`,
    );
    console.log(
      `   server: node --import tsx server/index.ts, render limits from the environment (${
        Object.entries(process.env)
          .filter(([k]) => k.startsWith('SHEET_RENDER_'))
          .map(([k, v]) => `${k}=${v}`)
          .join(' ') || 'defaults'
      })`,
    );
    const until = performance.now() + seconds * 1000;
    const paths = ['/api/health', `/api/jobs/${job.id}/spools`];
    const probes = new Promise<Record<string, { times: number[]; failed: number }>>((resolve, reject) => {
      const w = new Worker(PROBE_THREAD, {
        eval: true,
        workerData: { base, cookie, paths, until: Date.now() + seconds * 1000 },
      });
      w.once('message', resolve);
      w.once('error', reject);
    });
    const statuses = new Map<number, number>();
    const sheetTimes: number[] = [];
    const hammer = async () => {
      while (performance.now() < until) {
        const t0 = performance.now();
        try {
          const res = await fetch(`${base}/api/spools/${spool.id}/sheet.pdf`, { headers: auth });
          await res.arrayBuffer();
          statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
          if (res.status === 200) sheetTimes.push(performance.now() - t0);
          // A refused client comes back after a second (Retry-After asks for more).
          if (res.status === 503) await new Promise((r) => setTimeout(r, 1000));
        } catch {
          statuses.set(0, (statuses.get(0) ?? 0) + 1);
        }
      }
    };
    const [probed] = await Promise.all([probes, ...Array.from({ length: clients }, hammer)]);
    const show = (label: string, r: { times: number[]; failed: number }) =>
      console.log(
        `   ${label}: n=${r.times.length}, p50 ${ms(percentile(r.times, 50))}, p95 ${ms(percentile(r.times, 95))}, max ${ms(Math.max(...r.times))}, failed ${r.failed}`,
      );
    show('/api/health          ', probed[paths[0]!]!);
    show('GET job spools (list)', probed[paths[1]!]!);
    console.log(
      `   sheet.pdf answers: ${[...statuses].map(([s, n]) => `${s || 'network error'}×${n}`).join(', ')}; 200s p50 ${ms(percentile(sheetTimes, 50))}, p95 ${ms(percentile(sheetTimes, 95))}`,
    );
    console.log(
      `   load average after: ${loadavg()
        .map((l) => l.toFixed(1))
        .join(' ')} (${cpus().length} cores)`,
    );
  } finally {
    if (server && server.exitCode === null) {
      const exited = new Promise((r) => server!.once('exit', r));
      server.kill('SIGTERM');
      await exited;
    }
    if (ds.isInitialized) await ds.destroy();
    await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    await admin.end();
  }
}

async function main(): Promise<void> {
  if (process.env.BENCH_SIZES !== '') await sizes();
  const adminUrl = process.env.TEST_DATABASE_ADMIN_URL;
  if (adminUrl) await load(adminUrl);
  else console.log('\n2. Load: skipped (set TEST_DATABASE_ADMIN_URL to an admin URL of a throwaway cluster)');
}

void main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err);
    process.exit(1);
  },
);
