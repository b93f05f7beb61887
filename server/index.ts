import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { createApp } from './app';
import { createLogger } from './common/logger';
import { loadConfig } from './config/env';
import { createDataSource } from './db/data-source';
import { createHttpServer } from './http-server';

/** Starts Tackline: migrations, then the API and the built client on HOST:PORT. */
async function main(): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  if (config.usingDevSessionSecret) {
    logger.warn('SESSION_SECRET is not set: using the development secret (never in production)');
  }
  const ds = createDataSource(config.databaseUrl);
  await ds.initialize();
  const applied = await ds.runMigrations({ transaction: 'each' });
  if (applied.length) logger.info(`applied migrations: ${applied.map((m) => m.name).join(', ')}`);

  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
  const app = createApp({ dataSource: ds, config, logger, clientDir: path.join(root, 'dist') });
  const server = createHttpServer(app, config.http);
  server.on('error', (err) => {
    logger.fatal({ err }, 'could not listen');
    process.exit(1);
  });
  server.listen(config.port, config.host, () => {
    logger.info(`listening on http://${config.host}:${config.port}`);
  });

  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal}: stopping`);
    // Finish in-flight requests, then close the pool; force-exit if something hangs.
    const force = setTimeout(() => process.exit(1), 10_000);
    force.unref();
    server.close(() => {
      void app.locals.sheetRenderer
        .close()
        .catch(() => {})
        .then(() => ds.destroy())
        .finally(() => process.exit(0));
    });
    server.closeIdleConnections();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error('[tackline] failed to start:', err);
  process.exit(1);
});
