import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: {
    alias: { '@': fileURLToPath(new URL('./', import.meta.url)) },
  },
  test: {
    include: [
      'tests/shared/**/*.test.ts',
      'tests/server/**/*.test.ts',
      'tests/db/**/*.test.ts',
      'tests/components/**/*.test.ts',
      'tests/scripts/**/*.test.ts',
    ],
    pool: 'forks',
    // At least two files at once: left to itself vitest keeps one core free, which on a 2-core machine means one file
    // at a time.
    maxWorkers: Math.max(2, availableParallelism() - 1),
    environment: 'node',
    testTimeout: 20000,
  },
});
