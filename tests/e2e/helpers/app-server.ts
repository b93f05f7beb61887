import { existsSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { createApp } from '../../../server/app';
import { seedDemo } from '../../../server/db/seed/seed-demo';
import { createTestDatabase } from '../../server/helpers/test-db';
import { testConfig } from '../../server/helpers/test-app';

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
  const db = await createTestDatabase();
  let server: Server;
  try {
    await seedDemo(db.dataSource, { samplesDir: path.join(ROOT, 'samples'), bcryptCost: 4 });
    const app = createApp({ dataSource: db.dataSource, config: testConfig(db.url), clientDir: CLIENT_DIR });
    server = await new Promise<Server>((resolve, reject) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
      s.on('error', reject);
    });
  } catch (error) {
    await db.drop();
    throw error;
  }
  const listening = server;
  const { port } = listening.address() as AddressInfo;
  return {
    baseUrl: `http://127.0.0.1:${port}`,
    stop: async () => {
      listening.closeAllConnections();
      await new Promise<void>((resolve) => listening.close(() => resolve()));
      await db.drop();
    },
  };
}
