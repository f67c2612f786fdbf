import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    exclude: ['test/browser/**', 'node_modules/**'],
    benchmark: { include: ['test/bench/**/*.bench.ts'] },
    testTimeout: 60_000,
  },
});
