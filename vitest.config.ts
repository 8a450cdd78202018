import { defineConfig } from 'vitest/config';

// One config for every test project: unit tests for shared/, API tests against the real database,
// browser tests in Debian's Chromium. scripts/test.mjs starts PostgreSQL and sets DATABASE_URL first.
export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    globalSetup: ['tests/helpers/global-setup.ts'],
    setupFiles: ['tests/helpers/fast-check-seed.ts'],
    pool: 'forks',
    fileParallelism: true,
  },
});
