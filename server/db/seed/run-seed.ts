import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadConfig } from '../../config/env';
import { createDataSource } from '../data-source';
import { DEMO_ORGANISATIONS, DEMO_PASSWORD } from './demo-data';
import { seedDemo } from './seed-demo';

/** `npm run seed`: loads the demo scenario into DATABASE_URL (idempotent) and prints the sign-ins. */
async function main(): Promise<void> {
  const config = loadConfig();
  const ds = createDataSource(config.databaseUrl, { poolSize: 2 });
  await ds.initialize();
  try {
    const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
    const report = await seedDemo(ds, {
      samplesDir: path.join(root, 'samples'),
      bcryptCost: config.bcryptCost,
    });
    for (const w of report.warnings) console.warn(`[tackline] seed: ${w}`);
    const added = `${report.organisations} organisations, ${report.users} users, ${report.jobs} jobs, ${report.spools} spools, ${report.revisions} revisions`;
    console.log(`[tackline] demo data: added ${added}`);
    console.log(`[tackline] demo sign-ins (password for all: ${DEMO_PASSWORD}):`);
    for (const org of DEMO_ORGANISATIONS) {
      for (const u of org.users)
        console.log(`  ${u.role.padEnd(10)} ${u.email.padEnd(30)} ${u.displayName} (${org.name})`);
    }
  } finally {
    await ds.destroy();
  }
}

main().catch((err: unknown) => {
  console.error('[tackline] seeding failed:', err);
  process.exit(1);
});
