import { defineConfig } from 'vitest/config';

// Four suites, one command (`npm test`). The API and worker suites share a throw-away PostgreSQL
// cluster that tests/helpers/database-cluster.ts starts on a free loopback port and removes afterwards;
// each test file gets a database of its own cloned from a migrated template, so files run in parallel.
export default defineConfig({
  test: {
    reporters: ['default', './tests/helpers/summary-reporter.ts'],
    projects: [
      {
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts', 'tests/worker/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/helpers/global-database.ts'],
          setupFiles: ['tests/helpers/file-database.ts'],
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/helpers/global-e2e.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
