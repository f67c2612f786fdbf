#!/usr/bin/env node
// @ts-nocheck
// Browser mode as `npm start` runs it where there is no Electron: the server
// (app/cli/serve-start.ts) built ahead into out/cli, rebuilt first when a
// source is newer; through tsx only when it cannot be built.
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { builtEntry, defaultRoot } from '../build-cli.js';

const entry = await builtEntry(defaultRoot, 'serve');
if (entry.ok) {
  await import(entry.url);
} else {
  process.stderr.write(`loftpoint: browser mode could not be rebuilt (${entry.reason}); running it from its sources\n`);
  const { register } = await import('tsx/esm/api');
  register();
  await import(pathToFileURL(join(defaultRoot, 'app', 'cli', 'serve-start.ts')).href);
}
