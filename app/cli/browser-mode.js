#!/usr/bin/env node
// Browser mode as `npm start` runs it where there is no Electron: the command
// line's `serve` verb from the single file built ahead into out/cli, with V8's
// code cache (app/cli/built-cli.js), rebuilt first when a source is newer; the
// split build's own server entry (app/cli/serve-start.ts) when there is no
// single file; through tsx only when it cannot be built.
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import { builtEntry, defaultRoot } from '../build-cli.js';
import { loadBuiltCli } from './built-cli.js';

async function fromSingleFile() {
  const single = await builtEntry(defaultRoot, 'cli');
  if (!single.ok || !single.url) return false;
  let loaded;
  try {
    loaded = loadBuiltCli(fileURLToPath(single.url), process.env.LOFTPOINT_CODE_CACHE === 'off' ? 'off' : 'use');
  } catch {
    return false; // an unreadable single file: the split build's entry serves the same
  }
  process.exitCode = await loaded.main(['serve', ...process.argv.slice(2)]);
  loaded.saveCache();
  return true;
}

if (!(await fromSingleFile())) {
  const entry = await builtEntry(defaultRoot, 'serve');
  if (entry.ok) {
    await import(entry.url);
  } else {
    process.stderr.write(`loftpoint: browser mode could not be rebuilt (${entry.reason}); running it from its sources\n`);
    const { register } = await import('tsx/esm/api');
    register();
    await import(pathToFileURL(join(defaultRoot, 'app', 'cli', 'serve-start.ts')).href);
  }
}
