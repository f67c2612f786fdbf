// The steps of `npm start`, each a small function over injected commands and
// environment so the tests can run them without Electron or a network:
//   1. electronBinary: ELECTRON_OVERRIDE_DIST_PATH, else the installed binary,
//      else the electron package's own installer fetches it.
//   2. sqliteForElectron: LOFTPOINT_SQLITE_BINDING as is, else better-sqlite3
//      built for Electron's ABI with @electron/rebuild into a folder of its own
//      (out/native/...); Node's build in node_modules stays for the CLI and tests.
//   3. buildDesktop: the main process, preload and page (electron-vite), when stale.
//   4. launchElectron: Electron with the built main entry and the binding.
// A step that fails says which step, why, and the command that would fix it;
// app/start.js then starts browser mode instead.
import { spawn, spawnSync } from 'node:child_process';
import { copyFileSync, cpSync, existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = fileURLToPath(new URL('..', import.meta.url));

/** Electron's version, from the installed electron package. */
export function electronVersion(base = root) {
  return JSON.parse(readFileSync(join(base, 'node_modules', 'electron', 'package.json'), 'utf8')).version;
}

/** Where the executable lies inside an unpacked Electron folder (as the electron package's installer lays it out). */
export function electronExecutable(platform) {
  if (platform === 'darwin' || platform === 'mas') return 'Electron.app/Contents/MacOS/Electron';
  if (platform === 'win32') return 'electron.exe';
  return 'electron';
}

/** The usual machinery, replaced in tests. */
export function systemDeps(overrides = {}) {
  return {
    root,
    env: process.env,
    platform: process.platform,
    arch: process.arch,
    exists: existsSync,
    log: (line) => console.error(line),
    /** Runs a command to its end with the output shown; answers its exit status. */
    run: (command, args, options = {}) => spawnSync(command, args, { cwd: root, stdio: ['ignore', 'inherit', 'inherit'], ...options }).status ?? 1,
    /** Runs a command to its end with its output kept, not shown; answers its exit status and its output (both streams). */
    capture: (command, args, options = {}) => {
      const result = spawnSync(command, args, { cwd: root, stdio: ['ignore', 'pipe', 'pipe'], encoding: 'utf8', maxBuffer: 16 * 1024 * 1024, ...options });
      const output = `${result.stdout ?? ''}${result.stderr ?? ''}${result.error ? `${result.error.message}\n` : ''}`;
      return { status: result.status ?? 1, output };
    },
    /** Writes a log file of ours (under out/), making its folder. */
    writeLog: (file, text) => {
      mkdirSync(dirname(file), { recursive: true });
      writeFileSync(file, text);
    },
    ...overrides,
  };
}

const failed = (step, problem, fix) => ({ ok: false, step, problem, fix });

/** Step 1: the Electron executable. */
export function electronBinary(deps) {
  const { env, exists, platform } = deps;
  const executable = electronExecutable(platform);
  const version = electronVersion(deps.root);
  if (env.ELECTRON_OVERRIDE_DIST_PATH) {
    const path = join(resolve(env.ELECTRON_OVERRIDE_DIST_PATH), executable);
    if (exists(path)) return { ok: true, path };
    return failed('Electron binary', `ELECTRON_OVERRIDE_DIST_PATH names ${env.ELECTRON_OVERRIDE_DIST_PATH}, which has no ${executable}`, `point ELECTRON_OVERRIDE_DIST_PATH at an unpacked Electron ${version} folder, or unset it and run \`${INSTALL_ELECTRON}\``);
  }
  const folder = join(deps.root, 'node_modules', 'electron');
  const installed = () => {
    const path = join(folder, 'dist', executable);
    return exists(join(folder, 'path.txt')) && exists(path) ? path : null;
  };
  const present = installed();
  if (present) return { ok: true, path: present };
  deps.log(`Fetching the Electron ${version} binary with the electron package's own installer (node_modules/electron/install.js); this happens once...`);
  // The installer's own output (on failure a stack of "at ..." lines) goes to a log file, not the terminal.
  const { status, output } = deps.capture(process.execPath, [join(folder, 'install.js')]);
  const fetched = status === 0 ? installed() : null;
  if (fetched) return { ok: true, path: fetched };
  const log = join(deps.root, INSTALL_LOG);
  let kept;
  try {
    deps.writeLog(log, output);
    kept = `its full output is in ${INSTALL_LOG}`;
  } catch (error) {
    kept = `its output could not be kept in ${INSTALL_LOG} (${firstErrorLine(error instanceof Error ? error.message : String(error))})`;
  }
  const reason = firstErrorLine(output);
  const problem =
    status === 0
      ? `the installer ended without an executable; ${kept}`
      : `the installer failed (exit ${status}${reason ? `: ${reason}` : ''}); Electron's release host may be unreachable; ${kept}`;
  return failed('Electron binary', problem, `${INSTALL_ELECTRON}   (where Electron's release host, or a mirror named by ELECTRON_MIRROR, is reachable; or set ELECTRON_OVERRIDE_DIST_PATH to an unpacked Electron folder)`);
}

/** The command that fetches Electron's binary: the electron package's own installer, run in the project folder. */
export const INSTALL_ELECTRON = 'node node_modules/electron/install.js';

/** Where the installer's output is kept when it fails (relative to the project folder). */
export const INSTALL_LOG = join('out', 'logs', 'electron-install.log');

/**
 * The line of a program's output that says what went wrong, for a one-line message: the first line
 * naming an error (else the first line with text), never a stack frame ("at ..."), trimmed and cut
 * to 200 characters; empty when the output has no such line.
 */
export function firstErrorLine(output) {
  const lines = String(output)
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line !== '' && !/^at\s/.test(line) && !/^\.\.\.\s*\d+\s+more/.test(line) && !/^[{}\[\]]+,?$/.test(line));
  const line = lines.find((text) => /error|fail/i.test(text) || /\bERR_|\bE[A-Z]{3,}\b/.test(text)) ?? lines[0] ?? '';
  return line.length > 200 ? `${line.slice(0, 199)}…` : line;
}

/** The folder of our own that holds better-sqlite3 built for this Electron. */
export function nativeFolder(deps) {
  return join(deps.root, 'out', 'native', `electron-${electronVersion(deps.root)}-${deps.platform}-${deps.arch}`);
}

/** Copies better-sqlite3's sources (without Node's build) and what it requires into `app/` for @electron/rebuild. */
function prepareRebuild(base, app) {
  const modules = join(base, 'node_modules');
  const sqlite = JSON.parse(readFileSync(join(modules, 'better-sqlite3', 'package.json'), 'utf8'));
  mkdirSync(join(app, 'node_modules'), { recursive: true });
  writeFileSync(join(app, 'package.json'), `${JSON.stringify({ name: 'loftpoint-native', private: true, dependencies: { 'better-sqlite3': sqlite.version } }, null, 2)}\n`);
  cpSync(join(modules, 'better-sqlite3'), join(app, 'node_modules', 'better-sqlite3'), {
    recursive: true,
    filter: (source) => relative(join(modules, 'better-sqlite3'), source).split(/[\\/]/)[0] !== 'build',
  });
  for (const name of ['bindings', 'file-uri-to-path']) {
    if (existsSync(join(modules, name))) cpSync(join(modules, name), join(app, 'node_modules', name), { recursive: true });
  }
}

/** The command that builds better-sqlite3 for Electron in `app/` (printed as the fix when it fails). */
export function rebuildCommand(deps, app) {
  const bin = join(deps.root, 'node_modules', '.bin', deps.platform === 'win32' ? 'electron-rebuild.cmd' : 'electron-rebuild');
  return { command: bin, args: ['--version', electronVersion(deps.root), '--arch', deps.arch, '--module-dir', app, '--only', 'better-sqlite3', '--force'] };
}

/** Step 2: better-sqlite3's native module for Electron's ABI. */
export function sqliteForElectron(deps, prepare = prepareRebuild, copy = copyFileSync) {
  const { env, exists } = deps;
  if (env.LOFTPOINT_SQLITE_BINDING) {
    const binding = resolve(env.LOFTPOINT_SQLITE_BINDING);
    if (exists(binding)) return { ok: true, binding };
    return failed('SQLite for Electron', `LOFTPOINT_SQLITE_BINDING names ${env.LOFTPOINT_SQLITE_BINDING}, which does not exist`, `unset LOFTPOINT_SQLITE_BINDING (npm start then builds one), or name a better_sqlite3.node built for Electron ${electronVersion(deps.root)}`);
  }
  const folder = nativeFolder(deps);
  const binding = join(folder, 'better_sqlite3.node');
  if (exists(binding)) return { ok: true, binding };
  const app = join(folder, 'app');
  const { command, args } = rebuildCommand(deps, app);
  const fix = `${relative(deps.root, command)} ${args.join(' ')}   (or set LOFTPOINT_SQLITE_BINDING to a better_sqlite3.node built for Electron)`;
  deps.log(`Building better-sqlite3 for Electron ${electronVersion(deps.root)} into ${relative(deps.root, folder)} with @electron/rebuild (Node's own build stays for the command line and tests); this happens once...`);
  try {
    prepare(deps.root, app);
  } catch (error) {
    return failed('SQLite for Electron', `its sources could not be copied (${error instanceof Error ? error.message : String(error)})`, fix);
  }
  const status = deps.run(command, args);
  const built = join(app, 'node_modules', 'better-sqlite3', 'build', 'Release', 'better_sqlite3.node');
  if (status !== 0 || !exists(built)) return failed('SQLite for Electron', status !== 0 ? `@electron/rebuild failed (exit ${status}); it fetches Electron's headers from Electron's host` : '@electron/rebuild left no better_sqlite3.node', fix);
  copy(built, binding);
  return { ok: true, binding };
}

/** Newest modification time of any file under these folders. */
function newest(base, folders) {
  let latest = 0;
  const walk = (path) => {
    const info = statSync(path);
    if (info.isDirectory()) for (const entry of readdirSync(path)) walk(join(path, entry));
    else latest = Math.max(latest, info.mtimeMs);
  };
  for (const folder of folders) if (existsSync(join(base, folder))) walk(join(base, folder));
  return latest;
}

/** True when `output` is missing or older than the sources it is built from. */
export function stale(base, output, sources) {
  const file = join(base, output);
  return !existsSync(file) || statSync(file).mtimeMs < newest(base, sources);
}

export const PAGE_SOURCES = ['app/renderer', 'app/chart', 'app/shared', 'core'];
export const DESKTOP_SOURCES = [...PAGE_SOURCES, 'app/main', 'app/preload', 'app/service', 'app/store', 'app/server'];
export const MAIN_ENTRY = join('out', 'main', 'index.js');

const bin = (base, name) => join(base, 'node_modules', '.bin', name);

/** Step 3: the main process, preload and page, built when older than their sources. */
export function buildDesktop(deps, isStale = () => stale(deps.root, MAIN_ENTRY, DESKTOP_SOURCES)) {
  if (!isStale()) return { ok: true };
  deps.log('Building the desktop window...');
  const status = deps.run(bin(deps.root, 'electron-vite'), ['build', '--config', 'electron.config.ts'], { env: { ...deps.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' } });
  return status === 0 ? { ok: true } : failed('Build', `electron-vite build failed (exit ${status})`, 'npm run build');
}

/** Step 4: Electron running the built main entry, with the binding named for the store. */
export function launchElectron(deps, electron, binding, args, start = spawn) {
  return start(electron, [join(deps.root, MAIN_ENTRY), ...args], {
    cwd: deps.root,
    stdio: 'inherit',
    env: { ...deps.env, LOFTPOINT_SQLITE_BINDING: binding },
  });
}

/** The desktop steps in order: the first failure, or what launching needs. */
export function desktopSteps(deps) {
  const electron = electronBinary(deps);
  if (!electron.ok) return electron;
  const sqlite = sqliteForElectron(deps);
  if (!sqlite.ok) return sqlite;
  const built = buildDesktop(deps);
  if (!built.ok) return built;
  return { ok: true, electron: electron.path, binding: sqlite.binding };
}

/** What the person reads when the window cannot start. */
export function fallbackMessage(failure) {
  return [`The desktop window cannot start: step "${failure.step}" failed: ${failure.problem}.`, `  To fix it: ${failure.fix}`, 'Starting browser mode instead.'].join('\n');
}

/** Browser mode: the page built when stale, then `loftpoint serve`'s server from JavaScript built ahead. */
export function startBrowserMode(deps, args, start = spawn) {
  if (stale(deps.root, 'out/renderer/index.html', PAGE_SOURCES)) {
    deps.log('Building the window for browser mode...');
    const status = deps.run(bin(deps.root, 'vite'), ['build', '--config', 'app/renderer/vite.config.ts', '--logLevel', 'error'], { env: { ...deps.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' } });
    if (status !== 0) process.exit(status);
  }
  // The server built ahead (out/cli), rebuilt by app/cli/browser-mode.cjs when a source is newer.
  return start(process.execPath, [join(deps.root, 'app', 'cli', 'browser-mode.cjs'), ...args], { cwd: deps.root, stdio: 'inherit', env: deps.env });
}
