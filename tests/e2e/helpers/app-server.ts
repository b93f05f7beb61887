import { existsSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { createApp } from '../../../server/app';
import { loadConfig } from '../../../server/config/env';
import { createDataSource } from '../../../server/db/data-source';
import { seedDemo } from '../../../server/db/seed/seed-demo';
import { createThrowawayDatabase } from './e2e-database';

const ROOT = path.resolve(import.meta.dirname, '../../..');
const CLIENT_DIR = path.join(ROOT, 'dist');

/** The real server on a random loopback port, over a throwaway database with the demo data. */
export interface RunningApp {
  baseUrl: string;
  stop: () => Promise<void>;
}

/**
 * Starts Tackline as `npm start` would (migrations, demo seed, API plus the built
 * client from dist/), but on a fresh database and port 0.
 */
export async function startAppServer(): Promise<RunningApp> {
  if (!existsSync(path.join(CLIENT_DIR, 'index.html'))) {
    throw new Error('dist/ has no built client: run `npx vite build` first (npm test does)');
  }
  const db = await createThrowawayDatabase();
  const ds = createDataSource(db.url, { poolSize: 5 });
  try {
    await ds.initialize();
    await ds.runMigrations({ transaction: 'each' });
    await seedDemo(ds, { samplesDir: path.join(ROOT, 'samples'), bcryptCost: 4 });
  } catch (error) {
    if (ds.isInitialized) await ds.destroy();
    await db.drop();
    throw error;
  }
  const config = loadConfig({ ...process.env, NODE_ENV: 'test', DATABASE_URL: db.url, BCRYPT_COST: '4' });
  const app = createApp({ dataSource: ds, config, clientDir: CLIENT_DIR });
  const server = await new Promise<import('node:http').Server>((resolve, reject) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
    s.on('error', reject);
  });
  const { port } = server.address() as AddressInfo;
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    stop: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await ds.destroy();
      await db.drop();
    },
  };
}
