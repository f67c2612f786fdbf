#!/usr/bin/env node
// Builds the command line and browser mode's server ahead into out/cli with
// esbuild: plain JavaScript, split into chunks so a verb loads only what it
// imports (the project store, the report writer and the page build tools stay
// out of `evaluate`), with every package left in node_modules. Beside it, the
// command line once more as a single CommonJS file, which the launcher runs
// with V8's code cache (app/cli/built-cli.cjs): the cache is made here by
// evaluating a demo, so the first command after a build starts fast too.
// `npm install` runs this (prepare), `npm start` and the `loftpoint` launcher
// run it again when a source is newer than the build.
//
// Every file is named by its content and written whole (a temporary file, then
// a rename), and the manifest naming the entries is written last the same way:
// two builds at once, or a build beside a running command, never leave a
// half-written file where a command would load it.
import { mkdirSync, mkdtempSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { CLI_OUT, MANIFEST, codeCacheFile, freshManifest, loadBuiltCli, writeWhole } from './cli/built-cli.js';

export { CLI_OUT, MANIFEST, freshManifest };
/** Entry points: the command line (exports main) and browser mode (runs on import). */
export const ENTRIES = { loftpoint: 'app/cli/main.ts', serve: 'app/cli/serve-start.ts' };
/** The Monte Carlo worker thread's own entry, built alone (app/cli/monte-carlo-workers.ts starts it). */
export const THREAD_ENTRY = 'app/cli/monte-carlo-thread.ts';

const here = fileURLToPath(new URL('.', import.meta.url));
export const defaultRoot = join(here, '..');

/**
 * zod's namespace object carries every language's messages (`z.locales`, a third of the bundle);
 * the product speaks English and configures nothing else, so the build gives it English only.
 */
const englishOnlyValidation = {
  name: 'loftpoint-english-only-validation',
  setup(build) {
    build.onLoad({ filter: /[\\/]zod[\\/]v4[\\/]locales[\\/]index\.js$/ }, () => ({
      contents: 'export { default as en } from "./en.js";\n',
      loader: 'js',
    }));
  },
};

/**
 * commander loads child_process at start (7 ms of a cold start, with net and dgram) for the
 * subcommands it runs as separate programs, which the product has none of: the build gives it
 * child_process when it spawns one, and never otherwise. When commander's text changes, the
 * package is bundled as it is.
 */
const COMMANDER_CHILD_PROCESS = "const childProcess = require('node:child_process');";
const commanderSpawnsLazily = {
  name: 'loftpoint-commander-spawns-lazily',
  setup(build) {
    build.onLoad({ filter: /[\\/]commander[\\/]lib[\\/]command\.js$/ }, async (args) => {
      const { readFile } = await import('node:fs/promises');
      const text = await readFile(args.path, 'utf8');
      if (!text.includes(COMMANDER_CHILD_PROCESS)) return undefined;
      const lazy = "const childProcess = { spawn: (...args) => require('node:child_process').spawn(...args) };";
      return { contents: text.replace(COMMANDER_CHILD_PROCESS, lazy), loader: 'js' };
    });
  },
};

/** esbuild options every built file shares: bundled for Node, minified, named by content, kept in memory until all are built. */
const BUNDLE = {
  bundle: true,
  platform: 'node',
  target: 'node20.19',
  minify: true,
  entryNames: '[name]-[hash]',
  metafile: true,
  write: false,
  logLevel: 'silent',
  legalComments: 'none',
};

/**
 * The Monte Carlo worker's file: app/cli/monte-carlo-thread.ts and only what it imports, as one
 * CommonJS file (minified) that the worker's loader runs with V8's code cache. Answers esbuild's
 * output files, the file's name, its sources, and the `define` that names it to the command line.
 */
export async function buildMonteCarloThread(root, outdir) {
  const { build } = await import('esbuild');
  const result = await build({
    ...BUNDLE,
    absWorkingDir: root,
    outdir,
    entryPoints: { 'monte-carlo-thread': THREAD_ENTRY },
    format: 'cjs',
    outExtension: { '.js': '.cjs' },
  });
  const [output] = Object.keys(result.metafile.outputs);
  const file = basename(output);
  return { outputFiles: result.outputFiles, file, inputs: Object.keys(result.metafile.inputs), define: { __LOFTPOINT_MONTE_CARLO_THREAD__: JSON.stringify(file) } };
}

/** Builds out/cli under `root`; answers the manifest. Throws esbuild's error when a source does not build. */
export async function buildCli(root = defaultRoot) {
  const { build } = await import('esbuild');
  const startedAt = Date.now();
  const outdir = join(root, CLI_OUT);
  const common = {
    ...BUNDLE,
    absWorkingDir: root,
    outdir,
    // Pure-JavaScript packages are bundled (one file read instead of hundreds, and only the parts
    // used); the native SQLite module loads from node_modules, and the page build tools are never
    // part of the output.
    external: ['better-sqlite3', 'vite', '@sveltejs/*', 'svelte', 'svelte/*', 'esbuild', 'tsx'],
  };
  // The worker first: the command line is built knowing its file name.
  const thread = await buildMonteCarloThread(root, outdir);
  const split = await build({
    ...common,
    define: thread.define,
    entryPoints: ENTRIES,
    splitting: true,
    format: 'esm',
    // CommonJS packages inside an ES module bundle ask for Node's modules through require.
    banner: { js: "import { createRequire as __loftpointRequire } from 'node:module'; const require = __loftpointRequire(import.meta.url);" },
    plugins: [englishOnlyValidation, commanderSpawnsLazily],
    chunkNames: 'chunk-[hash]',
  });
  const outputOf = (result, source) => {
    const found = Object.entries(result.metafile.outputs).find(([, info]) => info.entryPoint === source);
    if (!found) throw new Error(`the build has no output for ${source}`);
    return basename(found[0]);
  };
  // The same command line as one CommonJS file (every verb inside, loaded when used), which V8 can
  // cache compiled; its worker threads start from the worker's own file, like the split build's.
  const single = await build({
    ...common,
    entryPoints: { 'loftpoint-cli': ENTRIES.loftpoint },
    format: 'cjs',
    outExtension: { '.js': '.cjs' },
    define: { ...thread.define, 'import.meta.url': '__loftpointModuleUrl' },
    plugins: [englishOnlyValidation, commanderSpawnsLazily],
  });
  mkdirSync(outdir, { recursive: true });
  const written = new Set([basename(MANIFEST)]);
  for (const file of [...thread.outputFiles, ...split.outputFiles, ...single.outputFiles]) {
    written.add(basename(file.path));
    writeWhole(file.path, file.contents);
  }
  const entries = {};
  for (const name of Object.keys(ENTRIES)) entries[name] = outputOf(split, ENTRIES[name]);
  entries.cli = outputOf(single, ENTRIES.loftpoint);
  const cache = await makeCodeCache(join(outdir, entries.cli));
  if (cache) written.add(basename(cache));
  const demoChecks = await recordDemoChecks(join(outdir, entries.cli));
  if (demoChecks) written.add(basename(demoChecks));
  // The worker's caches of this very file (one per set of Node options) stay valid.
  for (const name of readdirSync(outdir)) if (name.startsWith(`${thread.file}.`) && name.endsWith('.cache')) written.add(name);
  // The sources the launcher compares with the build: our own files, the build scripts, and the
  // lock file for the bundled packages (npm rewrites it whenever a package changes).
  const own = [...new Set([...Object.keys(split.metafile.inputs), ...thread.inputs])].filter((input) => !input.startsWith('node_modules/'));
  const manifest = { builtAt: startedAt, entries, inputs: [...own.sort(), 'app/build-cli.js', 'app/cli/built-cli.cjs', 'app/cli/built-cli.js', 'package-lock.json'] };
  writeWhole(join(root, MANIFEST), `${JSON.stringify(manifest, null, 1)}\n`);
  // Files of earlier builds, once no command started in the last minute could still be loading them.
  for (const name of readdirSync(outdir)) {
    const file = join(outdir, name);
    if (!written.has(name) && Date.now() - statSync(file, { throwIfNoEntry: false })?.mtimeMs > 60_000) rmSync(file, { force: true });
  }
  return manifest;
}

/**
 * The code cache of the single-file command line, made by running it here, quietly, on what a
 * cold start does most: `demo trainer`, `evaluate --json` of it, and a new project with the demo
 * concepts (what browser mode's first start makes); then a report's Monte Carlo on two threads
 * makes the worker's own cache. Answers the command line's cache file, or null when it could not
 * be made (the command line then compiles as usual and writes the cache after its first run).
 */
async function makeCodeCache(bundle) {
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-cache-'));
  try {
    const { main, saveCache } = loadBuiltCli(bundle, 'write');
    let text = '';
    const quiet = { out: (chunk) => void (text += chunk), err: () => {} };
    const concept = join(folder, 'trainer.json');
    try {
      if ((await main(['demo', 'trainer'], quiet)) === 0) {
        writeFileSync(concept, text);
        await main(['evaluate', concept, '--json'], quiet);
      }
      // Without a working SQLite module this step fails; the cache keeps what ran before it.
      await main(['project', 'create', join(folder, 'demo.loftpoint'), '--demo'], quiet);
    } catch {
      // whatever ran is still worth caching
    }
    const saved = saveCache() ? codeCacheFile(bundle) : null;
    // After the command line's own cache is written, so that cache stays the size a cold start needs:
    // a report on two threads, whose worker writes the code cache of its own file as it ends.
    const workers = process.env.LOFTPOINT_WORKERS;
    try {
      process.env.LOFTPOINT_WORKERS = '2';
      await main(['report', concept, '--out', join(folder, 'chance.svg'), '--samples', '2000'], quiet);
    } catch {
      // the worker then compiles its file on its first run and writes the cache itself
    } finally {
      if (workers === undefined) delete process.env.LOFTPOINT_WORKERS;
      else process.env.LOFTPOINT_WORKERS = workers;
    }
    return saved;
  } catch {
    return null;
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

/**
 * The demo concepts checked and evaluated by the single file `bundle` itself, kept beside it
 * (app/service/demo-checks.ts), so that a new project with the demos (browser mode's first start)
 * need not evaluate them again. Answers the file, or null when they could not be worked out
 * (a new project then evaluates the demos as it is made).
 */
async function recordDemoChecks(bundle) {
  try {
    const { exports } = loadBuiltCli(bundle, 'off');
    const checks = await exports.demoChecksForBuild();
    if (!checks) return null;
    writeWhole(checks.file, checks.text);
    return checks.file;
  } catch {
    return null;
  }
}

/**
 * The URL of a built entry (`loftpoint` or `serve`), rebuilt first when stale; or the reason it
 * could not be built (a source that does not compile, esbuild missing), for the caller to run the
 * sources through tsx instead.
 */
export async function builtEntry(root, name) {
  let manifest = freshManifest(root);
  if (!manifest) {
    try {
      manifest = await buildCli(root);
    } catch (error) {
      return { ok: false, reason: error instanceof Error ? error.message.split('\n')[0] : String(error) };
    }
  }
  const file = manifest.entries[name];
  if (!file) return { ok: false, reason: `the build has no entry named ${name}` };
  return { ok: true, url: pathToFileURL(join(root, CLI_OUT, file)).href };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  try {
    const manifest = await buildCli();
    console.log(`Built the command line into ${CLI_OUT} (${manifest.inputs.length} sources).`);
  } catch (error) {
    console.error(`Building the command line failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  }
}
