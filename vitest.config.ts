import { defineConfig } from 'vitest/config';

// One config for unit, API and browser tests. API test files each get their own
// database (tests/server/helpers/test-db.ts), so files may run in parallel.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    benchmark: { include: ['tests/bench/**/*.bench.ts'] },
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 120_000,
    maxWorkers: 2,
    reporters: ['default'],
  },
});
