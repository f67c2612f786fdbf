#!/usr/bin/env node
// `npm start`: the desktop window where the Electron binary is installed,
// otherwise browser mode, which prints its address as its first line.
// Arguments pass through, e.g. `npm start -- --project plans.loftpoint`.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const args = process.argv.slice(2);
const bin = (name) => join(root, 'node_modules', '.bin', name);

/** The Electron executable, found without triggering the electron package's download. */
function electronBinary() {
  const folder = join(root, 'node_modules', 'electron');
  const pathFile = join(folder, 'path.txt');
  if (!existsSync(pathFile)) return null;
  const relative = readFileSync(pathFile, 'utf8').trim();
  const base = process.env.ELECTRON_OVERRIDE_DIST_PATH ?? join(folder, 'dist');
  const full = join(base, relative);
  return existsSync(full) ? full : null;
}

/** Newest modification time of any file under these folders. */
function newest(folders) {
  let latest = 0;
  const walk = (path) => {
    const info = statSync(path);
    if (info.isDirectory()) for (const entry of readdirSync(path)) walk(join(path, entry));
    else latest = Math.max(latest, info.mtimeMs);
  };
  for (const folder of folders) if (existsSync(join(root, folder))) walk(join(root, folder));
  return latest;
}

/** True when `output` is missing or older than the sources it is built from. */
function stale(output, sources) {
  const file = join(root, output);
  return !existsSync(file) || statSync(file).mtimeMs < newest(sources);
}

function run(command, commandArgs, env = {}) {
  const result = spawnSync(command, commandArgs, { cwd: root, stdio: ['ignore', 'inherit', 'inherit'], env: { ...process.env, ...env } });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

const pageSources = ['app/renderer', 'app/chart', 'app/shared', 'core'];
const electron = electronBinary();

if (electron) {
  if (stale('out/main/index.js', [...pageSources, 'app/main', 'app/preload', 'app/service', 'app/store', 'app/server'])) {
    console.error('Building the desktop window...');
    run(bin('electron-vite'), ['build', '--config', 'electron.config.ts'], { VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' });
  }
  const child = spawn(electron, [join(root, 'out', 'main', 'index.js'), ...args], { cwd: root, stdio: 'inherit' });
  child.on('exit', (code) => process.exit(code ?? 0));
} else {
  if (stale('out/renderer/index.html', pageSources)) {
    console.error('Building the window for browser mode...');
    run(bin('vite'), ['build', '--config', 'app/renderer/vite.config.ts', '--logLevel', 'error'], { VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' });
  }
  console.error('No Electron binary here: starting browser mode.');
  const child = spawn(bin('tsx'), [join(root, 'app', 'cli', 'serve-start.ts'), ...args], { cwd: root, stdio: 'inherit' });
  const forward = (signal) => child.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  child.on('exit', (code) => process.exit(code ?? 0));
}
