#!/usr/bin/env node
// The `loftpoint` command. It runs the JavaScript built ahead into out/cli
// (app/build-cli.js; `npm install` builds it), rebuilding it first when a
// source it was built from is newer, so an edited clone still runs what it
// says: the single-file form with V8's code cache (app/cli/built-cli.cjs),
// else the split build. LOFTPOINT_FROM_SOURCE=1 runs the TypeScript sources
// through tsx instead (development, and the test that compares the two);
// LOFTPOINT_CODE_CACHE=off runs the single file without the code cache.
//
// CommonJS, like built-cli.cjs: an ES module start costs about 9 ms of CPU
// more (Node's module loader), a third of what the command line itself adds
// to a bare Node. loftpoint.js runs this file for those who start that one.
'use strict';
const { existsSync, readFileSync, realpathSync } = require('node:fs');
const { dirname, join } = require('node:path');
const { pathToFileURL } = require('node:url');
const { CLI_OUT, freshManifest, loadBuiltCli } = require('./built-cli.cjs');

/** The project folder: the nearest folder above this file (links resolved) whose package.json is loftpoint's. */
function projectRoot(start) {
  for (let folder = dirname(start); dirname(folder) !== folder; folder = dirname(folder)) {
    const manifest = join(folder, 'package.json');
    if (!existsSync(manifest)) continue;
    try {
      if (JSON.parse(readFileSync(manifest, 'utf8')).name === 'loftpoint') return folder;
    } catch {
      // an unreadable package.json is not ours; keep looking
    }
  }
  throw new Error(`no loftpoint package.json in the folders above ${start}`);
}

async function fromSource(root) {
  const { register } = await import('tsx/esm/api');
  register();
  return import(pathToFileURL(join(root, 'app', 'cli', 'main.ts')).href);
}

/** The build's manifest, rebuilt first when a source is newer; or the reason it could not be built. */
async function built(root) {
  const manifest = freshManifest(root);
  if (manifest) return { ok: true, manifest };
  // The build tools load only when there is something to build.
  const { buildCli } = await import(pathToFileURL(join(root, 'app', 'build-cli.js')).href);
  try {
    return { ok: true, manifest: await buildCli(root) };
  } catch (error) {
    return { ok: false, reason: error instanceof Error ? error.message.split('\n')[0] : String(error) };
  }
}

async function cli(root) {
  if (process.env.LOFTPOINT_FROM_SOURCE === '1') return fromSource(root);
  const build = await built(root);
  if (!build.ok) {
    process.stderr.write(`loftpoint: the command line could not be rebuilt (${build.reason}); running it from its sources\n`);
    return fromSource(root);
  }
  const { entries } = build.manifest;
  if (entries.cli) {
    try {
      return loadBuiltCli(join(root, CLI_OUT, entries.cli), process.env.LOFTPOINT_CODE_CACHE === 'off' ? 'off' : 'use');
    } catch {
      // an unreadable single file: the split build below runs the very same command line
    }
  }
  return import(pathToFileURL(join(root, CLI_OUT, entries.loftpoint)).href);
}

async function run() {
  const root = projectRoot(realpathSync(__filename));
  const { main, saveCache } = await cli(root);
  process.exitCode = await main(process.argv.slice(2));
  // After the run, so a cache written now holds everything the run compiled.
  saveCache?.();
}

run();
