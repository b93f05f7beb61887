import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../../../server/db/data-source';

/** A throwaway database with the real migrations applied. */
export interface TestDatabase {
  url: string;
  name: string;
  dataSource: DataSource;
  /** Closes the DataSource and drops the database. */
  drop(): Promise<void>;
}

/** The admin URL scripts/test.sh exports; the tests refuse to guess one. */
function adminUrl(): string {
  const url = process.env.TEST_DATABASE_ADMIN_URL;
  if (!url) {
    throw new Error(
      'TEST_DATABASE_ADMIN_URL is not set. Run the API tests through `npm test` (scripts/test.sh), ' +
        'or point it at a PostgreSQL you may create databases on, e.g. postgres://postgres@127.0.0.1:54718/postgres',
    );
  }
  return url;
}

async function withAdmin<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/**
 * Creates a fresh database (random name) for one test file, runs every migration on
 * it the way the server does, and returns an initialised DataSource.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  const name = `tackline_test_${randomBytes(6).toString('hex')}`;
  await withAdmin((c) => c.query(`CREATE DATABASE ${name}`));
  const url = new URL(adminUrl());
  url.pathname = `/${name}`;
  const dataSource = createDataSource(url.toString(), { poolSize: 5 });
  await dataSource.initialize();
  await dataSource.runMigrations({ transaction: 'each' });
  return {
    url: url.toString(),
    name,
    dataSource,
    async drop() {
      if (dataSource.isInitialized) await dataSource.destroy();
      await withAdmin((c) => c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`));
    },
  };
}
