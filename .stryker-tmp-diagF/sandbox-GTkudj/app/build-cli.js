#!/usr/bin/env node
// @ts-nocheck
// Builds the command line and browser mode's server ahead into out/cli with
// esbuild: plain JavaScript, split into chunks so a verb loads only what it
// imports (the project store, the report writer and the page build tools stay
// out of `evaluate`), with every package left in node_modules. `npm install`
// runs this (prepare), `npm start` and the `loftpoint` launcher run it again
// when a source is newer than the build.
//
// Every file is named by its content and written whole (a temporary file, then
// a rename), and the manifest naming the entries is written last the same way:
// two builds at once, or a build beside a running command, never leave a
// half-written file where a command would load it.
import { mkdirSync, readFileSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

export const CLI_OUT = join('out', 'cli');
export const MANIFEST = join(CLI_OUT, 'manifest.json');
/** Entry points: the command line (exports main) and browser mode (runs on import). */
export const ENTRIES = { loftpoint: 'app/cli/main.ts', serve: 'app/cli/serve-start.ts' };

const here = fileURLToPath(new URL('.', import.meta.url));
export const defaultRoot = join(here, '..');

function writeWhole(file, contents) {
  const temporary = `${file}.${process.pid}.tmp`;
  writeFileSync(temporary, contents);
  renameSync(temporary, file);
}

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

/** Builds out/cli under `root`; answers the manifest. Throws esbuild's error when a source does not build. */
export async function buildCli(root = defaultRoot) {
  const { build } = await import('esbuild');
  const startedAt = Date.now();
  const outdir = join(root, CLI_OUT);
  const result = await build({
    absWorkingDir: root,
    entryPoints: ENTRIES,
    outdir,
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'node',
    target: 'node20.19',
    // Pure-JavaScript packages are bundled (one file read instead of hundreds, and only the parts
    // used); the native SQLite module loads from node_modules, and the page build tools are never
    // part of the output.
    external: ['better-sqlite3', 'vite', '@sveltejs/*', 'svelte', 'svelte/*', 'esbuild', 'tsx'],
    // CommonJS packages inside an ES module bundle ask for Node's modules through require.
    banner: { js: "import { createRequire as __loftpointRequire } from 'node:module'; const require = __loftpointRequire(import.meta.url);" },
    plugins: [englishOnlyValidation],
    minify: true,
    entryNames: '[name]-[hash]',
    chunkNames: 'chunk-[hash]',
    metafile: true,
    write: false,
    logLevel: 'silent',
    legalComments: 'none',
  });
  mkdirSync(outdir, { recursive: true });
  const written = new Set([basename(MANIFEST)]);
  for (const file of result.outputFiles) {
    written.add(basename(file.path));
    writeWhole(file.path, file.contents);
  }
  const entries = {};
  for (const [output, info] of Object.entries(result.metafile.outputs)) {
    const name = Object.entries(ENTRIES).find(([, source]) => info.entryPoint === source)?.[0];
    if (name) entries[name] = basename(output);
  }
  // The sources the launcher compares with the build: our own files, this script, and the lock
  // file for the bundled packages (npm rewrites it whenever a package changes).
  const own = Object.keys(result.metafile.inputs).filter((input) => !input.startsWith('node_modules/'));
  const manifest = { builtAt: startedAt, entries, inputs: [...own.sort(), 'app/build-cli.js', 'package-lock.json'] };
  writeWhole(join(root, MANIFEST), `${JSON.stringify(manifest, null, 1)}\n`);
  // Files of earlier builds, once no command started in the last minute could still be loading them.
  for (const name of readdirSync(outdir)) {
    const file = join(outdir, name);
    if (!written.has(name) && Date.now() - statSync(file).mtimeMs > 60_000) rmSync(file, { force: true });
  }
  return manifest;
}

/**
 * The build's manifest when it is newer than every source it was built from, else null. One stat
 * per source (about 190, a few milliseconds), no walk of the folders: a new file matters only once
 * a listed source imports it, and then that source is newer.
 */
export function freshManifest(root = defaultRoot) {
  let manifest;
  try {
    manifest = JSON.parse(readFileSync(join(root, MANIFEST), 'utf8'));
  } catch {
    return null;
  }
  for (const input of manifest.inputs) {
    const info = statSync(`${root}/${input}`, { throwIfNoEntry: false });
    if (!info || info.mtimeMs > manifest.builtAt) return null;
  }
  return manifest;
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
  return { ok: true, url: pathToFileURL(join(root, CLI_OUT, manifest.entries[name])).href };
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
