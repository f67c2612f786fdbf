#!/usr/bin/env node
// Cold start of the command line: `loftpoint evaluate DEMO --json` as
// installed (the JavaScript built into out/cli), the same through tsx from the
// sources (LOFTPOINT_FROM_SOURCE=1, fewer runs: it is slow), and a bare
// `node -e 0`, interleaved run by run so all three see the same machine load.
// CPU time is the child's user + system time as bash's `times` reports it
// (millisecond resolution); wall time is measured around the same bash, whose
// own start (a few ms) is in every row alike. Plain Node, no tsx, so the
// benchmark's own start does not matter. Run: node test/bench/cold-start.js
//
// Targets: `evaluate --json` under 0.25 s CPU (aim 0.15 s) and within 3x of
// `node -e 0` in the same run.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';

const root = new URL('../..', import.meta.url).pathname;
const RUNS = Number(process.env.RUNS ?? 15);
const SOURCE_EVERY = 3; // the tsx run joins every third round
const bin = join(root, 'app/cli/loftpoint.cjs'); // what the `loftpoint` bin runs
const dir = mkdtempSync(join(tmpdir(), 'loftpoint-cold-'));
const concept = join(dir, 'trainer.json');

const quote = (s) => `'${s.replace(/'/g, "'\\''")}'`;

/** One run: wall [s] around bash, CPU [s] of bash's children. */
function once(command, env = {}) {
  const start = performance.now();
  const result = spawnSync('bash', ['-c', `${command} >/dev/null 2>&1; status=$?; times; exit $status`], { encoding: 'utf8', env: { ...process.env, ...env } });
  const wall = (performance.now() - start) / 1000;
  if (result.status !== 0) throw new Error(`${command} failed (exit ${result.status})`);
  const lines = result.stdout.trim().split('\n');
  const seconds = (text) => {
    const m = /(\d+)m([\d.]+)s/.exec(text);
    return m ? Number(m[1]) * 60 + Number(m[2]) : NaN;
  };
  const [user, system] = lines[lines.length - 1].trim().split(/\s+/).map(seconds);
  return { wall, cpu: user + system };
}

function stats(xs) {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9), n: s.length };
}
const fmt = (x) => `${x.median.toFixed(3)} s (${x.p10.toFixed(3)}-${x.p90.toFixed(3)})`;

try {
  const made = spawnSync(process.execPath, [bin, 'demo', 'trainer', '--out', concept], { encoding: 'utf8' });
  if (made.status !== 0) throw new Error(`could not write the demo: ${made.stderr}`);
  const evaluate = `${quote(process.execPath)} ${quote(bin)} evaluate ${quote(concept)} --json`;
  const bare = `${quote(process.execPath)} -e 0`;
  once(evaluate); // a stale build is rebuilt here, outside the timing
  const rows = { bare: [], built: [], source: [] };
  for (let r = 0; r < RUNS; r++) {
    const order = r % 2 === 0 ? ['bare', 'built'] : ['built', 'bare'];
    if (r % SOURCE_EVERY === 0) order.push('source');
    for (const name of order) {
      rows[name].push(name === 'bare' ? once(bare) : name === 'built' ? once(evaluate) : once(evaluate, { LOFTPOINT_FROM_SOURCE: '1' }));
    }
  }
  console.log(`Cold start, median (10th-90th percentile) of interleaved runs; load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}; Node ${process.version}`);
  const bareCpu = stats(rows.bare.map((x) => x.cpu));
  const bareWall = stats(rows.bare.map((x) => x.wall));
  for (const [name, title] of [['bare', 'node -e 0'], ['built', 'loftpoint evaluate --json (built)'], ['source', 'the same through tsx (sources)']]) {
    const cpu = stats(rows[name].map((x) => x.cpu));
    const wall = stats(rows[name].map((x) => x.wall));
    const ratio = name === 'bare' ? '' : `   ${(cpu.median / bareCpu.median).toFixed(1)}x CPU, ${(wall.median / bareWall.median).toFixed(1)}x wall of node -e 0`;
    console.log(`  ${title.padEnd(36)} CPU ${fmt(cpu)}  wall ${fmt(wall)}  n=${cpu.n}${ratio}`);
  }
  const builtCpu = stats(rows.built.map((x) => x.cpu)).median;
  console.log(`evaluate --json: ${builtCpu.toFixed(3)} s CPU; target under 0.25 s (aim 0.15 s): ${builtCpu < 0.25 ? 'met' : 'NOT met'}; within 3x of node -e 0: ${builtCpu <= 3 * bareCpu.median ? 'met' : 'NOT met'}`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
