// @ts-nocheck
import { defineConfig } from 'vitest/config';

// The engine tests only, for mutation testing of core/: they import core/
// in-process, so a mutant is seen by the test that covers it. The CLI tests
// start child processes, which never see the active mutant.
// LOFTPOINT_MUTATION_ENGINE=1 leaves out the concept and studies tests (the
// slowest, and aimed at core/concept and core/studies) for runs on the engine
// folders only: core/constraints, core/diagram, core/aero, core/propulsion, core/atmosphere.ts.
// LOFTPOINT_MUTATION_SKIP=properties,studies leaves out those folders of
// test/core (comma-separated): a quick first pass whose survivors a second,
// incremental pass with every test then tries again (killed mutants are kept
// from the first pass, so only the survivors meet the slow property tests).
const engineOnly = process.env.LOFTPOINT_MUTATION_ENGINE === '1';
const skipped = (process.env.LOFTPOINT_MUTATION_SKIP ?? '')
  .split(',')
  .map((s) => s.trim())
  .filter((s) => s !== '')
  .map((s) => `test/core/${s}/**`);

export default defineConfig({
  test: {
    include: ['test/core/**/*.test.ts'],
    exclude: [
      'node_modules/**',
      ...(engineOnly ? ['test/core/studies/**', 'test/core/concept/**'] : []),
      ...skipped,
    ],
    testTimeout: 60_000,
  },
});
