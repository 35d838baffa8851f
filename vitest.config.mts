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
    environment: 'node',
    testTimeout: 20000,
  },
});
