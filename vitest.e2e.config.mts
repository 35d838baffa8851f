import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser tests: each file against its own real server, its own database and its own browser, so three files run at
// once (most of a browser test's time is spent waiting on the page, not on a core: on two cores the suite took 366 s
// two at a time and 315 s three at a time).
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('./', import.meta.url)) } },
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    pool: 'forks',
    maxWorkers: 3,
    testTimeout: 60_000,
    hookTimeout: 90_000,
  },
});
