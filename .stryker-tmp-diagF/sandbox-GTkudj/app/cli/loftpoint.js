#!/usr/bin/env node
// @ts-nocheck
// The `loftpoint` command. It runs the JavaScript built ahead into out/cli
// (app/build-cli.js; `npm install` builds it), rebuilding it first when a
// source it was built from is newer, so an edited clone still runs what it
// says. LOFTPOINT_FROM_SOURCE=1 runs the TypeScript sources through tsx
// instead (development, and the test that compares the two).
import { existsSync, readFileSync, realpathSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

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

async function cli(root) {
  if (process.env.LOFTPOINT_FROM_SOURCE === '1') return fromSource(root);
  const { builtEntry } = await import(pathToFileURL(join(root, 'app', 'build-cli.js')).href);
  const entry = await builtEntry(root, 'loftpoint');
  if (entry.ok) return import(entry.url);
  process.stderr.write(`loftpoint: the command line could not be rebuilt (${entry.reason}); running it from its sources\n`);
  return fromSource(root);
}

const root = projectRoot(realpathSync(fileURLToPath(import.meta.url)));
const { main } = await cli(root);
process.exitCode = await main(process.argv.slice(2));
