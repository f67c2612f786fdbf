// The command line built ahead into out/cli (app/build-cli.js builds it): is
// the build newer than its sources, and running its single-file form with
// V8's code cache. The cache holds the compiled code of a whole run, so a
// command starts without parsing and compiling the bundle again: about a
// fifth of a cold start's CPU. It is only ever a shortcut: a missing, stale
// or rejected cache (another Node, other V8 flags) just means the bundle is
// compiled as usual, and the cache is written again after the run.
//
// Plain CommonJS with Node's own modules only: the launcher (loftpoint.cjs)
// requires this before anything is built. CommonJS because an ES module
// start costs about 9 ms of CPU more (Node's module loader), and `import` of
// node:fs would read every export, loading the whole streams stack for
// nothing. ES modules (build-cli.js) import it through
// built-cli.js.
'use strict';
const { readFileSync, renameSync, rmSync, statSync, writeFileSync } = require('node:fs');
const { createRequire } = require('node:module');
const { dirname, join } = require('node:path');
const { pathToFileURL } = require('node:url');
const { Script } = require('node:vm');

const CLI_OUT = join('out', 'cli');
const MANIFEST = join(CLI_OUT, 'manifest.json');

/** Writes a file whole: a temporary file beside it, then a rename, so no reader sees half of it. */
function writeWhole(file, contents) {
  const temporary = `${file}.${process.pid}.tmp`;
  try {
    writeFileSync(temporary, contents);
    renameSync(temporary, file);
  } catch (error) {
    rmSync(temporary, { force: true });
    throw error;
  }
}

/**
 * The build's manifest when it is newer than every source it was built from, else null. One stat
 * per source (about 250, a few milliseconds), no walk of the folders: a new file matters only once
 * a listed source imports it, and then that source is newer.
 */
function freshManifest(root) {
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

/** The single-file bundle is CommonJS run inside this function; the last parameter stands for `import.meta.url`. */
const HEAD = '(function (exports, require, module, __filename, __dirname, __loftpointModuleUrl) {';
const TAIL = '\n})';

/** A short fingerprint of text (djb2), so a changed wrapper never meets a cache made for another. */
function fingerprint(text) {
  let hash = 5381;
  for (let i = 0; i < text.length; i++) hash = ((hash * 33) ^ text.charCodeAt(i)) >>> 0;
  return hash.toString(36);
}

/**
 * The code cache file of a bundle for this V8 and processor (Nodes sharing a folder keep one each),
 * and for this process's Node options: V8 refuses a cache made under other flags (a profiler, a
 * stack size), and a command that then wrote its own over the shared one would leave a cache of
 * that command only, which every other command compiles around until the next build.
 */
function codeCacheFile(bundle) {
  const options = `${process.execArgv.join(' ')}|${process.env.NODE_OPTIONS ?? ''}`;
  return `${bundle}.${process.versions.v8}-${process.arch}-${fingerprint(HEAD + TAIL + options)}.cache`;
}

/**
 * Loads the single-file command line `bundle` (a path) and answers its `main` and `saveCache`,
 * which writes the code cache when there was none or V8 refused it (call it after the run, so the
 * cache holds every function the run compiled). `cache`: 'use' (the default), 'write' (ignore the
 * cache there is and write a new one), 'off' (neither read nor write).
 */
function loadBuiltCli(bundle, cache = 'use') {
  const source = readFileSync(bundle, 'utf8');
  const cacheFile = codeCacheFile(bundle);
  let cachedData;
  if (cache === 'use') {
    try {
      cachedData = readFileSync(cacheFile);
    } catch {
      // no cache yet: compiled as usual, and written after the run
    }
  }
  const script = new Script(HEAD + source + TAIL, { filename: bundle, cachedData });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(bundle), module, bundle, dirname(bundle), pathToFileURL(bundle).href);
  const write = cache === 'write' || (cache === 'use' && (cachedData === undefined || script.cachedDataRejected === true));
  return {
    main: module.exports.main,
    /** Every export of the bundle (the build also asks it for the demo checks it keeps beside it). */
    exports: module.exports,
    saveCache() {
      if (!write) return false;
      try {
        writeWhole(cacheFile, script.createCachedData());
        return true;
      } catch {
        // a read-only install runs without a cache, as before
        return false;
      }
    },
  };
}

module.exports = { CLI_OUT, MANIFEST, writeWhole, freshManifest, codeCacheFile, loadBuiltCli };
