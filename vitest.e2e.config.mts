import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser tests: one file at a time, each against its own real server.
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('./', import.meta.url)) } },
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    pool: 'forks',
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 90_000,
  },
});
