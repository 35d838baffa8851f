import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser tests: each file against its own real server, its own database and its own browser, so two files run at
// once (most of a browser test's time is spent waiting on the page, not on a core).
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('./', import.meta.url)) } },
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    pool: 'forks',
    maxWorkers: 2,
    testTimeout: 60_000,
    hookTimeout: 90_000,
  },
});
