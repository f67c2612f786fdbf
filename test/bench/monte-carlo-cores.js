#!/usr/bin/env node
// The Monte Carlo on one and two threads: bundles monte-carlo-cores-run.ts
// with esbuild as the command line is built (split, so the worker module is
// a chunk of its own that a worker thread can load; minified) into a temporary folder,
// then runs it in Node. Run: node test/bench/monte-carlo-cores.js
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';

const root = new URL('../..', import.meta.url).pathname;
const outdir = mkdtempSync(join(tmpdir(), 'loftpoint-mc-bench-'));
try {
  await build({
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
