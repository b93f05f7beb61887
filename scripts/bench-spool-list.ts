/**
 * Spool list throughput against a bare Express route, same process, same run.
 * `TEST_DATABASE_ADMIN_URL=postgres://… npx tsx scripts/bench-spool-list.ts [seconds] [spools]`
 * Prints requests/s of GET /bare, GET /api/health and GET /api/jobs/:id/spools (25 a page).
 */
import express from 'express';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { createJob, createShop, createSpool, PASSWORD } from '../tests/server/helpers/fixtures';
import request from 'supertest';
import { testApp } from '../tests/server/helpers/test-app';
import { createTestDatabase } from '../tests/server/helpers/test-db';

const SECONDS = Number(process.argv[2] ?? 5);
const SPOOLS = Number(process.argv[3] ?? 60);
const CONCURRENCY = 20;

async function rate(port: number, path: string, cookie = ''): Promise<number> {
  const agent = new http.Agent({ keepAlive: true, maxSockets: CONCURRENCY });
  const until = Date.now() + SECONDS * 1000;
  let done = 0;
  const one = () =>
    new Promise<void>((resolve, reject) => {
      const req = http.get({ host: '127.0.0.1', port, path, agent, headers: { cookie } }, (res) => {
        if (res.statusCode !== 200) reject(new Error(`${path}: ${res.statusCode}`));
        res.resume().on('end', () => resolve());
      });
      req.on('error', reject);
    });
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (Date.now() < until) {
        await one();
        done++;
      }
    }),
  );
  agent.destroy();
  return done / SECONDS;
}

const db = await createTestDatabase();
try {
  const shop = await createShop(db.dataSource, 'Bench');
  const job = await createJob(db.dataSource, shop);
  for (let i = 0; i < SPOOLS; i++) await createSpool(db.dataSource, shop, job, { mark: `B-${i}` });
  const app = testApp(db.dataSource, db.url);
  const signIn = await request(app)
    .post('/api/auth/sign-in')
    .set('Content-Type', 'application/json')
    .send({ email: shop.email('viewer'), password: PASSWORD });
  const cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
  const outer = express();
  outer.get('/bare', (_req, res) => {
    res.json({ ok: true });
  });
  outer.use(app);
  const server = outer.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  const { port } = server.address() as AddressInfo;
  const bare = await rate(port, '/bare');
  const health = await rate(port, '/api/health');
  const list = await rate(port, `/api/jobs/${job.id}/spools`, cookie);
  console.log(`bare Express      ${bare.toFixed(0)} req/s`);
  console.log(`GET /api/health   ${health.toFixed(0)} req/s (${(health / bare).toFixed(2)}× bare)`);
  console.log(
    `GET job spools    ${list.toFixed(0)} req/s (${(list / bare).toFixed(2)}× bare; target ≥ 0.25×)`,
  );
  server.close();
} finally {
  await db.drop();
}
