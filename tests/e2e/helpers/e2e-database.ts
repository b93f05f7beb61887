import { randomBytes } from 'node:crypto';
import pg from 'pg';

/** A fresh, empty database on the throwaway test cluster, dropped by `drop`. */
export interface ThrowawayDatabase {
  url: string;
  drop: () => Promise<void>;
}

/** Creates `tackline_e2e_<random>` through TEST_DATABASE_ADMIN_URL (exported by scripts/test.sh). */
export async function createThrowawayDatabase(): Promise<ThrowawayDatabase> {
  const adminUrl = process.env.TEST_DATABASE_ADMIN_URL;
  if (!adminUrl) throw new Error('TEST_DATABASE_ADMIN_URL is not set: run the browser tests through `npm test`');
  const name = `tackline_e2e_${randomBytes(5).toString('hex')}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    await admin.query(`create database "${name}"`);
  } finally {
    await admin.end();
  }
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      const c = new pg.Client({ connectionString: adminUrl });
      await c.connect();
      try {
        await c.query(`drop database if exists "${name}" with (force)`);
      } finally {
        await c.end();
      }
    },
  };
}
