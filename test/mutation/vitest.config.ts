import { defineConfig } from 'vitest/config';

// The engine tests only, for mutation testing of core/: they import core/
// in-process, so a mutant is seen by the test that covers it. The CLI tests
// start child processes, which never see the active mutant.
// LOFTPOINT_MUTATION_ENGINE=1 leaves out the concept and studies tests (the
// slowest, and aimed at core/concept and core/studies) for runs on the engine
// folders only: core/constraints, core/diagram, core/aero, core/propulsion, core/atmosphere.ts.
// For runs on one folder of core/ on a busy machine:
// LOFTPOINT_MUTATION_ONLY=diagram,numeric runs only those folders (or files)
// of test/core, and LOFTPOINT_MUTATION_SKIP=properties leaves some out
// (comma-separated; a name ending in .ts is one file). A quick first pass
// with the folder's own tests, then an incremental pass with every test:
// mutants killed in the first pass are kept, so only the survivors meet the
// slower tests of the other folders.
const engineOnly = process.env.LOFTPOINT_MUTATION_ENGINE === '1';
const under = (list: string | undefined): string[] =>
  (list ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '')
    .map((s) => (s.endsWith('.ts') ? `test/core/${s}` : `test/core/${s}/**/*.test.ts`));
const only = under(process.env.LOFTPOINT_MUTATION_ONLY);
const skipped = under(process.env.LOFTPOINT_MUTATION_SKIP);

export default defineConfig({
  test: {
    include: only.length > 0 ? only : ['test/core/**/*.test.ts'],
    exclude: [
      'node_modules/**',
      ...(engineOnly ? ['test/core/studies/**', 'test/core/concept/**'] : []),
      ...skipped,
    ],
    testTimeout: 60_000,
  },
});
