#!/usr/bin/env node
// `npm test`: every check the project has, in one command, ending with one
// line "N passed, N failed" so a run that executed nothing is visible.
//   1. type check (tsc)      2. unit, reference, property, store and CLI tests (Vitest)
//   3. renderer build        4. browser tests (Playwright in Debian's Chromium)
//   5. mutation testing of the core/ lines the last commit changed (StrykerJS)
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const root = new URL('..', import.meta.url).pathname;
const reports = mkdtempSync(join(tmpdir(), 'loftpoint-test-'));
const totals = { passed: 0, failed: 0, skipped: 0 };
let broken = [];

function run(title, command, args, env = {}) {
  console.log(`\n== ${title}: ${command} ${args.join(' ')}`);
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
  if (result.status !== 0) broken.push(`${title} (exit ${result.status ?? result.signal})`);
  return result.status === 0;
}

function npx(bin) {
  return join(root, 'node_modules', '.bin', bin);
}

/**
 * Debian's Chromium (browser tests, PDF reports), strace (fault injection) and poppler-utils (pdftotext,
 * to read reports back). Installed when we may (root with apt), else the
 * caller prints a one-line instruction.
 */
function ensureDebianTools() {
  const chromiumCandidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].filter(Boolean);
  const findChromium = () => chromiumCandidates.find((path) => existsSync(path)) ?? null;
  const missing = [];
  if (!findChromium()) missing.push('chromium');
  if (!existsSync('/usr/bin/pdftotext')) missing.push('poppler-utils');
  // strace injects kills and a full disk at each write of a save (test/store/fault-injection.test.ts).
  if (!existsSync('/usr/bin/strace')) missing.push('strace');
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (missing.length > 0 && isRoot && existsSync('/usr/bin/apt-get')) {
    console.log(`\n== Installing Debian packages the tests need: ${missing.join(' ')}`);
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    spawnSync('apt-get', ['update'], { stdio: 'inherit', env });
    spawnSync('apt-get', ['install', '-y', '--no-install-recommends', ...missing], { stdio: 'inherit', env });
  }
  return { chromium: findChromium(), pdftotext: existsSync('/usr/bin/pdftotext') };
}

function countVitest(file) {
  if (!existsSync(file)) return;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  totals.passed += report.numPassedTests ?? 0;
  totals.failed += report.numFailedTests ?? 0;
  totals.skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
}

function countPlaywright(file) {
  if (!existsSync(file)) return;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  const stats = report.stats ?? {};
  totals.passed += (stats.expected ?? 0) + (stats.flaky ?? 0);
  totals.failed += stats.unexpected ?? 0;
  totals.skipped += stats.skipped ?? 0;
}

const tools = ensureDebianTools();
if (tools.chromium) process.env.CHROMIUM_PATH = tools.chromium;
if (!tools.chromium) console.error('Browser tests and PDF reports need Chromium: install it with `apt-get install -y chromium` or set CHROMIUM_PATH.');
if (!tools.pdftotext) console.error('Report tests read PDFs with pdftotext: install it with `apt-get install -y poppler-utils`.');
if (!existsSync('/usr/bin/strace')) console.error('The fault-injection test needs strace and is skipped without it: install it with `apt-get install -y strace`.');

run('Type check', npx('tsc'), ['--noEmit', '-p', 'tsconfig.json']);

const vitestReport = join(reports, 'vitest.json');
run('Unit, reference, property, store and CLI tests', npx('vitest'), [
  'run',
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${vitestReport}`,
]);
countVitest(vitestReport);

const browserConfig = join(root, 'test/browser/playwright.config.ts');
if (existsSync(browserConfig)) {
  const chromium = tools.chromium;
  if (!chromium) {
    broken.push('browser tests (no Chromium)');
  } else {
    const playwrightReport = join(reports, 'playwright.json');
    run('Browser tests', npx('playwright'), ['test', '-c', browserConfig, '--reporter=list,json'], {
      CHROMIUM_PATH: chromium,
      PLAYWRIGHT_JSON_OUTPUT_NAME: playwrightReport,
    });
    countPlaywright(playwrightReport);
  }
}

// The lines of core/ the last commit added or changed, mutated one at a time against the tests of
// their folders: a change to a formula whose tests would not notice a wrong version shows here as
// surviving mutants (the score is reported, not enforced: equivalent mutants are listed by hand in
// test/mutation/equivalent.md). Nothing to do when the last commit left core/ alone.
run('Mutation testing of the core/ lines changed by the last commit', process.execPath, ['test/mutation/changed.js', 'HEAD~1', '--lines']);

console.log('');
if (broken.length > 0) console.log(`Failed steps: ${broken.join('; ')}`);
const skipped = totals.skipped > 0 ? `, ${totals.skipped} skipped` : '';
console.log(`${totals.passed} passed, ${totals.failed} failed${skipped}`);
process.exit(broken.length > 0 || totals.failed > 0 || totals.passed === 0 ? 1 : 0);
