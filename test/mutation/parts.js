// The parts of core/ that `npm run test:mutation` mutates one after another,
// each with the tests of its own folder of test/core (LOFTPOINT_MUTATION_ONLY,
// see test/mutation/vitest.config.ts). Every file of core/ that Stryker
// mutates (stryker.config.json: not index.ts, the generated methods text or
// the demos) is in exactly one part; test/mutation/parts.test.ts checks so.
//
// A mutant killed by a part's tests is killed by all of test/core, so each
// part's score is a lower bound of the score with every test; the narrow sets
// are what makes a run over all of core/ take about an hour rather than a day
// (a mutant of core/diagram met with every test that evaluates a design costs
// 5 to 10 seconds).

/** @typedef {{ name: string, mutate: string[], tests: string[], skip?: string[] }} MutationPart */

/** @type {MutationPart[]} */
export const mutationParts = [
  { name: 'top', mutate: ['core/*.ts', '!core/index.ts', '!core/methods-generated.ts'], tests: ['*.test.ts'] },
  { name: 'units', mutate: ['core/units/**/*.ts'], tests: ['units'] },
  { name: 'numeric', mutate: ['core/numeric/**/*.ts'], tests: ['numeric'] },
  { name: 'aero', mutate: ['core/aero/**/*.ts'], tests: ['aero'] },
  { name: 'propulsion', mutate: ['core/propulsion/**/*.ts'], tests: ['propulsion'] },
  { name: 'constraints', mutate: ['core/constraints/**/*.ts'], tests: ['constraints', 'requirements'] },
  { name: 'requirements', mutate: ['core/requirements/**/*.ts'], tests: ['requirements', 'constraints'] },
  { name: 'assumptions', mutate: ['core/assumptions/**/*.ts'], tests: ['assumptions'] },
  { name: 'mission', mutate: ['core/mission/**/*.ts'], tests: ['mission'] },
  // The kinds' own refusals (core/requirements/<kind>.ts `refused`) reach the diagram's impossible-input check.
  { name: 'diagram', mutate: ['core/diagram/**/*.ts'], tests: ['diagram', 'numeric', 'requirements/ground-run-lift-at-weight.test.ts', 'requirements/ground-run-cl-at-clmax.test.ts'] },
  { name: 'concept', mutate: ['core/concept/**/*.ts', '!core/concept/demos/**'], tests: ['concept'] },
  // The two slowest studies tests (several seconds for each mutant they cover) are left out: the Monte Carlo
  // is recounted by hand in monte-carlo-hand-count.test.ts, the typical ranges in typical-ranges.test.ts.
  { name: 'studies', mutate: ['core/studies/**/*.ts'], tests: ['studies'], skip: ['studies/monte-carlo.test.ts', 'studies/typical-basis.test.ts'] },
].map((part) => ({ ...part, mutate: [...part.mutate, '!core/**/index.ts'] }));
