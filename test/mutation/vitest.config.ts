import { defineConfig } from 'vitest/config';

// The engine tests only, for mutation testing of core/: they import core/
// in-process, so a mutant is seen by the test that covers it. The CLI tests
// start child processes, which never see the active mutant.
export default defineConfig({
  test: {
    include: ['test/core/**/*.test.ts'],
    exclude: ['node_modules/**'],
    testTimeout: 60_000,
  },
});
