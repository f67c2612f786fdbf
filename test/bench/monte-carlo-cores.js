#!/usr/bin/env node
// The Monte Carlo on one and two threads: bundles monte-carlo-cores-run.ts
// with esbuild as the command line is built (minified, with the worker
// thread's own file beside it, built by app/build-cli.js's
// buildMonteCarloThread) into a temporary folder, then runs it in Node.
// Run: node test/bench/monte-carlo-cores.js
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';
import { buildMonteCarloThread } from '../../app/build-cli.js';

const root = new URL('../..', import.meta.url).pathname;
const outdir = mkdtempSync(join(tmpdir(), 'loftpoint-mc-bench-'));
try {
  const thread = await buildMonteCarloThread(root, outdir);
  for (const file of thread.outputFiles) writeFileSync(file.path, file.contents);
  await build({
    define: thread.define,
    absWorkingDir: root,
    entryPoints: { run: 'test/bench/monte-carlo-cores-run.ts' },
    outdir,
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20.19',
    // Minified as app/build-cli.js builds the command line: a worker thread loads what a user's would.
    minify: true,
    external: ['better-sqlite3', 'vite', '@sveltejs/*', 'svelte', 'esbuild', 'tsx'],
    banner: { js: "import { createRequire as __loftpointRequire } from 'node:module'; const require = __loftpointRequire(import.meta.url);" },
    logLevel: 'error',
  });
  const result = spawnSync(process.execPath, [join(outdir, 'run.js')], { cwd: root, stdio: 'inherit' });
  process.exitCode = result.status ?? 1;
} finally {
  rmSync(outdir, { recursive: true, force: true });
}
