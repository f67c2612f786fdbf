#!/usr/bin/env node
// Mutation testing of what changed in core/ since a base (default: main):
//   npm run test:mutation:changed [-- BASE] [-- --lines]
// Runs StrykerJS in its incremental mode, so mutants whose code and covering
// tests are unchanged since the last run (reports/mutation/stryker-incremental.json,
// kept between runs as a cache) are not tested again.
//
// --lines mutates only the lines the diff added or changed (Stryker's
// `file:start-end` ranges) and runs only the tests of the changed folders
// (test/core/<folder>, or test/core/<name>.test.ts for a file at core/*.ts):
// this is the run `npm test` makes on the last commit (BASE HEAD~1), small
// enough for every CI run. Exits 0 with a note when no core/ source changed
// or the base does not exist (a clone with one commit).
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const args = process.argv.slice(2);
const linesOnly = args.includes('--lines');
const base = args.find((a) => !a.startsWith('--')) ?? 'main';
const root = new URL('../..', import.meta.url).pathname;

const git = (...gitArgs) => spawnSync('git', gitArgs, { cwd: root, encoding: 'utf8' });
if (git('rev-parse', '--verify', '--quiet', `${base}^{commit}`).status !== 0) {
  console.log(`test:mutation:changed: no commit ${base} in this clone; nothing to compare with, nothing mutated.`);
  process.exit(0);
}

const skipped = [/\/index\.ts$/, /^core\/methods-generated\.ts$/, /^core\/concept\/demos\//];
const isMutated = (file) => file.startsWith('core/') && file.endsWith('.ts') && !skipped.some((re) => re.test(file));

/** The core/ files changed since the base, each with the line ranges the diff added or changed (new numbering). */
function changedFiles() {
  // `base...HEAD` for a branch (what it adds since it left the base); `base HEAD` for an ancestor like HEAD~1.
  const range = linesOnly ? [base, 'HEAD'] : [`${base}...HEAD`];
  const diff = git('diff', '--unified=0', '--diff-filter=AMR', ...range, '--', 'core/');
  if (diff.status !== 0) {
    console.error(`test:mutation:changed: git diff against ${base} failed: ${diff.stderr.trim()}`);
    process.exit(2);
  }
  const files = new Map();
  let current = null;
  for (const line of diff.stdout.split('\n')) {
    const file = /^\+\+\+ b\/(.+)$/.exec(line);
    if (file) {
      current = isMutated(file[1]) ? file[1] : null;
      if (current) files.set(current, []);
      continue;
    }
    const hunk = /^@@ -\S+ \+(\d+)(?:,(\d+))? @@/.exec(line);
    if (hunk && current) {
      const start = Number(hunk[1]);
      const count = hunk[2] === undefined ? 1 : Number(hunk[2]);
      if (count > 0) files.get(current).push([start, start + count - 1]);
    }
  }
  return files;
}

/** The test/core folders (or files) that test the changed sources; empty: all of test/core. */
function testsFor(files) {
  const chosen = new Set();
  for (const file of files) {
    const parts = file.split('/');
    if (parts.length > 2) {
      if (!existsSync(`${root}test/core/${parts[1]}`)) return [];
      chosen.add(parts[1]);
    } else {
      const own = parts[1].replace(/\.ts$/, '.test.ts');
      if (!existsSync(`${root}test/core/${own}`)) return [];
      chosen.add(own);
    }
  }
  return [...chosen];
}

const files = changedFiles();
const targets = linesOnly
  ? [...files].flatMap(([file, ranges]) => ranges.map(([from, to]) => `${file}:${from}-${to}`))
  : [...files.keys()];
if (targets.length === 0) {
  console.log(`test:mutation:changed: no core/ source ${linesOnly ? 'line ' : ''}changed since ${base}; nothing to mutate.`);
  process.exit(0);
}
const tests = linesOnly ? testsFor([...files.keys()]) : [];
console.log(
  `test:mutation:changed: mutating ${linesOnly ? `${targets.length} changed line range(s) in ` : ''}${files.size} file(s) changed since ${base}:\n  ${[...files.keys()].join('\n  ')}` +
    (tests.length > 0 ? `\n  with the tests of test/core: ${tests.join(', ')}` : ''),
);
const strykerArgs = ['stryker', 'run', '--incremental', '--mutate', targets.join(',')];
if (linesOnly) strykerArgs.push('--reporters', 'clear-text,json', '--incrementalFile', 'reports/mutation/changed-lines-incremental.json');
const run = spawnSync('npx', strykerArgs, {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, ...(tests.length > 0 ? { LOFTPOINT_MUTATION_ONLY: tests.join(',') } : {}) },
});
process.exit(run.status ?? 1);
