#!/usr/bin/env node
// @ts-nocheck
// Mutation testing of the core/ files changed since a base (default: main),
// for CI: `npm run test:mutation:changed [-- <base>]`. Runs StrykerJS in its
// incremental mode, so mutants whose code and covering tests are unchanged
// since the last run (reports/mutation/stryker-incremental.json, kept between
// CI runs as a cache) are not tested again. Exits 0 with a note when no
// core/ file changed.
import { spawnSync } from 'node:child_process';

const base = process.argv[2] ?? 'main';
const diff = spawnSync('git', ['diff', '--name-only', '--diff-filter=AMR', `${base}...HEAD`, '--', 'core/'], { encoding: 'utf8' });
if (diff.status !== 0) {
  console.error(`test:mutation:changed: git diff against ${base} failed: ${diff.stderr.trim()}`);
  process.exit(2);
}
const skipped = [/\/index\.ts$/, /^core\/methods-generated\.ts$/, /^core\/concept\/demos\//];
const files = diff.stdout
  .split('\n')
  .filter((f) => f.endsWith('.ts') && !skipped.some((re) => re.test(f)));
if (files.length === 0) {
  console.log(`test:mutation:changed: no core/ source changed since ${base}; nothing to mutate.`);
  process.exit(0);
}
console.log(`test:mutation:changed: mutating ${files.length} file(s) changed since ${base}:\n  ${files.join('\n  ')}`);
const run = spawnSync('npx', ['stryker', 'run', '--incremental', '--mutate', files.join(',')], { stdio: 'inherit' });
process.exit(run.status ?? 1);
