import { loadConfig } from '../config/env';
import { createDataSource } from './data-source';

/** `npm run migration:run`: applies pending migrations to DATABASE_URL. */
async function main(): Promise<void> {
  const config = loadConfig();
  const ds = createDataSource(config.databaseUrl, { poolSize: 2 });
  await ds.initialize();
  try {
    const applied = await ds.runMigrations({ transaction: 'each' });
    console.log(
      applied.length
        ? `[tackline] applied migrations: ${applied.map((m) => m.name).join(', ')}`
        : '[tackline] schema up to date',
    );
  } finally {
    await ds.destroy();
  }
}

main().catch((err: unknown) => {
  console.error('[tackline] migration failed:', err);
  process.exit(1);
});
