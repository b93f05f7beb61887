import { createServer, Socket as NetSocket, type Server, type Socket } from 'node:net';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { createShop, PASSWORD, type Shop } from './helpers/fixtures';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { signedIn, testApp } from './helpers/test-app';

/**
 * A TCP relay in front of PostgreSQL that can be cut and restored, which is what a
 * database restart looks like to the app: open connections drop, new ones are refused.
 */
function relay(target: { host: string; port: number }) {
  const sockets = new Set<Socket>();
  let server: Server | undefined;
  let port = 0;
  const up = () =>
    new Promise<void>((resolve) => {
      server = createServer((client) => {
        const pg = new NetSocket();
        sockets.add(client).add(pg);
        pg.connect(target.port, target.host);
        client.pipe(pg).pipe(client);
        const close = () => {
          client.destroy();
          pg.destroy();
        };
        client.on('error', close).on('close', close);
        pg.on('error', close).on('close', close);
      });
      server.listen(port, '127.0.0.1', () => {
        port = (server!.address() as AddressInfo).port;
        resolve();
      });
    });
  const down = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      sockets.clear();
      server?.close(() => resolve());
    });
  return { up, down, port: () => port };
}

let db: TestDatabase;
let ds: DataSource;
let app: Express;
let shop: Shop;
let link: ReturnType<typeof relay>;

beforeAll(async () => {
  db = await createTestDatabase();
  shop = await createShop(db.dataSource, 'Restart');
  const target = new URL(db.url);
  link = relay({ host: target.hostname, port: Number(target.port) });
  await link.up();
  const via = new URL(db.url);
  via.port = String(link.port());
  ds = createDataSource(via.toString(), { poolSize: 3 });
  await ds.initialize();
  app = testApp(ds, via.toString());
});
afterAll(async () => {
  await link?.down().catch(() => undefined);
  await ds?.destroy().catch(() => undefined);
  await db?.drop();
});

describe('while the database restarts', () => {
  it('answers 503 with Retry-After (never 500), and serves again once it is back', async () => {
    const admin = await signedIn(app, shop.email('admin'), PASSWORD);
    expect((await admin.get('/api/jobs')).status).toBe(200);

    await link.down();
    const answers = [];
    for (const send of [
      () => admin.get('/api/jobs'),
      () => admin.get('/api/users'),
      () => admin.post('/api/jobs').send({ number: 'R-1', title: 'T', client: 'C' }),
      () => admin.get('/api/auth/me'),
    ]) {
      answers.push(await send().timeout(20_000));
    }
    for (const res of answers) {
      expect(res.status, `${res.req.path}: ${res.text}`).toBe(503);
      expect(res.headers['retry-after']).toBe('5');
      expect(res.body.error.code).toBe('service_unavailable');
    }

    await link.up();
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await admin.get('/api/jobs')).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
  }, 60_000);
});
