#!/usr/bin/env node
// `npm run bench`: the speed and size targets, measured, never asserted by a
// timed test. Each benchmark is its own script so one can be run alone, and
// each prints medians with their spread and the load average at the time.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

const root = new URL('../..', import.meta.url).pathname;
const benches = [
  ['Command line: cold start against node -e 0', 'test/bench/cold-start.js'],
  ['Browser mode: launch to first diagram', 'test/bench/browser-start.js'],
  ['Engine: evaluation per demo against a floor doing the same work; growth with samples', 'test/bench/engine.ts'],
  ['Project file: save, list, open, size', 'test/bench/store.ts'],
  ['Trade studies: bands, tornado, Monte Carlo', 'test/bench/studies.ts'],
  ['Monte Carlo on one and two threads', 'test/bench/monte-carlo-cores.js'],
  ["Window's chance study on one and two threads", 'test/bench/window-monte-carlo.js'],
  ['Designer window: drag to redraw', 'test/bench/drag.ts'],
];
let failed = 0;
for (const [title, script] of benches) {
  if (!existsSync(join(root, script))) continue;
  console.log(`\n== ${title} (${script})`);
  // Plain JavaScript benchmarks run in Node itself; TypeScript ones through tsx.
  const [command, args] = script.endsWith('.js') ? [process.execPath, [script]] : [join(root, 'node_modules/.bin/tsx'), [script]];
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) failed++;
}
process.exit(failed > 0 ? 1 : 0);
