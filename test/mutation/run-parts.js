#!/usr/bin/env node
// `npm run test:mutation`: StrykerJS over every mutated file of core/, one
// part (a folder) at a time with the tests of that folder (test/mutation/parts.js),
// then one score over core/.
//
//   npm run test:mutation                      every part
//   npm run test:mutation -- units,mission     only those parts (the others' last reports still count)
//   npm run test:mutation -- --report          no run: the score from the parts' last reports
//   npm run test:mutation -- --concurrency 2   passed on to Stryker (default 1)
//   npm run test:mutation -- --survivors       with --report or a run: list the survivors that
//                                              test/mutation/equivalent.md does not list
//
// Each part runs in Stryker's incremental mode with its own cache
// (reports/mutation/parts/<part>-incremental.json): a second run tests again
// only the mutants whose code or covering tests changed. Reports:
// reports/mutation/parts/<part>.json (Stryker's JSON report of the part) and
// reports/mutation/mutation.json (all parts in one report, for the survivors
// list). Score = (killed + timed out) / (killed + timed out + survived + no
// coverage); mutants Stryker ignores (static values) or cannot compile are
// not counted. Exit 0 when every part ran (the score is reported, not
// enforced), 1 when a part's run failed, 2 for a bad argument.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { mutationParts } from './parts.js';
import { survivors, unlistedLines } from './listed-survivors.js';
import { mergedReport, partRow, scoreTable } from './report-counts.js';

const root = new URL('../..', import.meta.url).pathname;
const folder = join(root, 'reports/mutation/parts');
const args = process.argv.slice(2);
const reportOnly = args.includes('--report');
const listSurvivors = args.includes('--survivors');
const concurrencyAt = args.indexOf('--concurrency');
const concurrency = concurrencyAt >= 0 ? args[concurrencyAt + 1] : '1';
if (!/^[1-9][0-9]?$/.test(concurrency ?? '')) {
  console.error(`test:mutation: --concurrency must be a whole number from 1 to 99, not "${concurrency ?? ''}"`);
  process.exit(2);
}
const named = args.filter((a, i) => !a.startsWith('--') && args[i - 1] !== '--concurrency').flatMap((a) => a.split(','));
const unknown = named.filter((n) => !mutationParts.some((p) => p.name === n));
if (unknown.length > 0) {
  console.error(`test:mutation: no part named ${unknown.join(', ')}; the parts are ${mutationParts.map((p) => p.name).join(', ')}`);
  process.exit(2);
}
const chosen = named.length > 0 ? mutationParts.filter((p) => named.includes(p.name)) : mutationParts;

mkdirSync(folder, { recursive: true });
const failed = [];
if (!reportOnly) {
  for (const part of chosen) {
    const config = {
      ...JSON.parse(readFileSync(join(root, 'stryker.config.json'), 'utf8')),
      mutate: part.mutate,
      concurrency: Number(concurrency),
      reporters: ['clear-text', 'progress', 'json'],
      jsonReporter: { fileName: `reports/mutation/parts/${part.name}.json` },
      incremental: true,
      incrementalFile: `reports/mutation/parts/${part.name}-incremental.json`,
    };
    delete config.$schema;
    delete config.htmlReporter;
    const configFile = join(folder, `${part.name}.stryker.json`);
    writeFileSync(configFile, `${JSON.stringify(config, null, 2)}\n`);
    console.log(`\n== test:mutation, part ${part.name}: ${part.mutate.filter((m) => !m.startsWith('!')).join(' ')} with test/core ${part.tests.join(', ')}${part.skip ? ` without ${part.skip.join(', ')}` : ''}`);
    const run = spawnSync(join(root, 'node_modules/.bin/stryker'), ['run', configFile], {
      cwd: root,
      stdio: 'inherit',
      env: { ...process.env, LOFTPOINT_MUTATION_ONLY: part.tests.join(','), LOFTPOINT_MUTATION_ENGINE: '', LOFTPOINT_MUTATION_SKIP: (part.skip ?? []).join(',') },
    });
    if (run.status !== 0) failed.push(part.name);
  }
}

const reports = [];
const rows = [];
for (const part of mutationParts) {
  const file = join(folder, `${part.name}.json`);
  if (!existsSync(file)) {
    rows.push({ part: part.name, missing: true });
    continue;
  }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  reports.push(report);
  rows.push(partRow(part.name, report));
}
const merged = mergedReport(reports);
writeFileSync(join(root, 'reports/mutation/mutation.json'), JSON.stringify(merged));
console.log(`\n${scoreTable(rows)}`);
const found = survivors(merged, readFileSync(join(root, 'test/mutation/equivalent.md'), 'utf8'));
const unlisted = unlistedLines(found);
console.log(`Survivors (survived or not covered): ${found.length}; listed as equivalent in test/mutation/equivalent.md: ${found.length - unlisted.length}; not listed: ${unlisted.length}${unlisted.length > 0 && !listSurvivors ? ' (add --survivors to see them)' : ''}.`);
if (listSurvivors && unlisted.length > 0) console.log(unlisted.join('\n'));
if (failed.length > 0) {
  console.error(`test:mutation: Stryker failed on part(s) ${failed.join(', ')}; their last reports (if any) are counted above.`);
  process.exit(1);
}
