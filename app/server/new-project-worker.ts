/**
 * A new project with the demo concepts made on a worker thread while the
 * server answers the browser: making it checks and evaluates the demos and
 * writes the file (a few hundred milliseconds of one core), which on the
 * server's own thread would hold up every file of the page behind it.
 *
 * The worker runs the command line built ahead as one file (out/cli, with
 * V8's code cache, app/cli/built-cli.cjs) and its `project create FILE
 * --demo` verb, which writes the project whole (a temporary file, then a
 * rename) or not at all. It is only ever a shortcut: it answers true when
 * the file was made, and false for anything else (no single-file build, a
 * worker that could not start, any refusal), and the caller then makes the
 * project itself, as before, with its own error naming --project.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';

/** The worker's script (CommonJS, Node's own modules only): load the single-file command line, run the verb, post its exit code. */
const WORKER_SCRIPT = `
const { parentPort, workerData } = require('node:worker_threads');
const quiet = { out: () => {}, err: () => {} };
(async () => {
  const { main } = require(workerData.loader).loadBuiltCli(workerData.bundle, 'use');
  return main(['project', 'create', workerData.file, '--demo', '--name', workerData.name], quiet);
})().then(
  (code) => parentPort.postMessage({ code }),
  () => parentPort.postMessage({ code: -1 }),
);
`;

export interface SingleFileBuild {
  /** The single-file command line (out/cli/loftpoint-cli-*.cjs). */
  bundle: string;
  /** Its loader, app/cli/built-cli.cjs. */
  loader: string;
}

/**
 * The single-file build this code runs from, or null when it runs from
 * anything else (the split build, the TypeScript sources): inside that file
 * `import.meta.url` names the file itself (app/build-cli.js).
 */
export function singleFileBuild(moduleUrl: string = import.meta.url): SingleFileBuild | null {
  if (!moduleUrl.startsWith('file:') || !moduleUrl.endsWith('.cjs')) return null;
  const bundle = fileURLToPath(moduleUrl);
  const loader = join(fileURLToPath(new URL('../..', moduleUrl)), 'app', 'cli', 'built-cli.cjs');
  return existsSync(bundle) && existsSync(loader) ? { bundle, loader } : null;
}

/**
 * Makes the project `file` (which must not exist) named `name`, with the demo
 * concepts, on a worker thread running `build`. Resolves true once the file is
 * there whole, false when the worker did not make it (never rejects).
 */
export function makeProjectOnWorker(build: SingleFileBuild, file: string, name: string): Promise<boolean> {
  return new Promise((resolveMade) => {
    let worker: Worker;
    try {
      worker = new Worker(WORKER_SCRIPT, { eval: true, workerData: { ...build, file, name }, stdout: true, stderr: true });
    } catch {
      return resolveMade(false);
    }
    let settled = false;
    const settle = (made: boolean) => {
      if (settled) return;
      settled = true;
      resolveMade(made && existsSync(file));
    };
    worker.once('message', (answer: { code?: unknown }) => settle(answer?.code === 0));
    worker.once('error', () => settle(false));
    worker.once('exit', () => settle(false));
  });
}
