/**
 * `npm start`'s steps, without Electron or a network: the commands are
 * injected and recorded, and the end-to-end check runs `node app/start.js`
 * with a stand-in Electron executable (a shell script that records its
 * arguments and environment) named by ELECTRON_OVERRIDE_DIST_PATH.
 */
import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript module without types
import * as steps from '../../app/start-steps.js';

const root = join(import.meta.dirname, '..', '..');
const version: string = JSON.parse(readFileSync(join(root, 'node_modules', 'electron', 'package.json'), 'utf8')).version;

function deps(overrides: Record<string, unknown> = {}) {
  const ran: Array<{ command: string; args: string[] }> = [];
  const logged: string[] = [];
  return {
    ran,
    logged,
    deps: {
      root: '/opt/lp-not-here',
      env: {},
      platform: 'linux',
      arch: 'x64',
      exists: () => false,
      log: (line: string) => void logged.push(line),
      run: (command: string, args: string[]) => (ran.push({ command, args }), 1),
      capture: (command: string, args: string[]) => (ran.push({ command, args }), { status: 1, output: '' }),
      writeLog: () => {},
      ...overrides,
    },
  };
}

// electronVersion reads the real package; every other path is injected.
const withRoot = (overrides: Record<string, unknown>) => deps({ ...overrides, root });

describe('step 1: the Electron binary', () => {
  it('uses ELECTRON_OVERRIDE_DIST_PATH when it holds the executable, and never runs the installer', () => {
    const t = withRoot({ env: { ELECTRON_OVERRIDE_DIST_PATH: '/opt/electron-45' }, exists: (path: string) => path === '/opt/electron-45/electron' });
    expect(steps.electronBinary(t.deps)).toEqual({ ok: true, path: '/opt/electron-45/electron' });
    expect(t.ran).toEqual([]);
  });

  it('runs the electron package’s own installer when the binary is missing, saying so', () => {
    const installed = new Set<string>();
    const t = withRoot({
      exists: (path: string) => installed.has(path),
      capture: (command: string, args: string[]) => {
        t.ran.push({ command, args });
        installed.add(join(root, 'node_modules/electron/path.txt')).add(join(root, 'node_modules/electron/dist/electron'));
        return { status: 0, output: '' };
      },
    });
    expect(steps.electronBinary(t.deps)).toEqual({ ok: true, path: join(root, 'node_modules/electron/dist/electron') });
    expect(t.ran).toEqual([{ command: process.execPath, args: [join(root, 'node_modules/electron/install.js')] }]);
    expect(t.logged.join('\n')).toMatch(new RegExp(`Fetching the Electron ${version.replace(/\./g, '\\.')} binary with the electron package's own installer`));
  });

  it('names the failed step and the command that fixes it when the installer fails', () => {
    const failure = steps.electronBinary(withRoot({}).deps);
    expect(failure).toMatchObject({ ok: false, step: 'Electron binary' });
    expect(failure.fix).toContain('node node_modules/electron/install.js');
    const message = steps.fallbackMessage(failure);
    expect(message).toMatch(/step "Electron binary" failed/);
    expect(message).toMatch(/To fix it: node node_modules\/electron\/install\.js/);
    expect(message).toMatch(/Starting browser mode instead/);
  });

  // What the electron package's installer printed on a machine with no route to Electron's release
  // host (Node 20's fetch; paths shortened): the error, then its stack.
  const offlineOutput = [
    'TypeError: fetch failed',
    '    at node:internal/deps/undici/undici:14976:13',
    '    at process.processTicksAndRejections (node:internal/process/task_queues:95:5)',
    '    at async FetchDownloader.download (file:///app/node_modules/@electron/get/dist/FetchDownloader.js:46:30)',
    '    at async downloadArtifact (file:///app/node_modules/@electron/get/dist/index.js:154:12)',
    '',
  ].join('\n');

  it('keeps the installer’s output out of the terminal: its first error line is the reason, the whole of it goes to a log under out/', () => {
    const logs: Array<[string, string]> = [];
    const t = withRoot({
      capture: (command: string, args: string[]) => (t.ran.push({ command, args }), { status: 1, output: offlineOutput }),
      writeLog: (file: string, text: string) => void logs.push([file, text]),
    });
    const failure = steps.electronBinary(t.deps);
    expect(t.ran).toEqual([{ command: process.execPath, args: [join(root, 'node_modules/electron/install.js')] }]);
    expect(failure).toMatchObject({ ok: false, step: 'Electron binary' });
    expect(failure.problem).toContain('the installer failed (exit 1: TypeError: fetch failed)');
    expect(failure.problem).toContain(join('out', 'logs', 'electron-install.log'));
    expect(logs).toEqual([[join(root, 'out', 'logs', 'electron-install.log'), offlineOutput]]);
    const message = steps.fallbackMessage(failure);
    expect(message).not.toMatch(/^\s*at\s/m);
    expect(message).not.toContain('undici');
    expect(message.split('\n')).toHaveLength(3);
    // Nothing of the installer reached the terminal: the only line logged is our own.
    expect(t.logged).toHaveLength(1);
    expect(t.logged[0]).toMatch(/^Fetching the Electron /);
  });

  it('says so, still in one line, when the log cannot be written', () => {
    const t = withRoot({
      capture: () => ({ status: 1, output: offlineOutput }),
      writeLog: () => {
        throw new Error("EACCES: permission denied, open '/opt/app/out/logs/electron-install.log'");
      },
    });
    const failure = steps.electronBinary(t.deps);
    expect(failure.problem).toContain('TypeError: fetch failed');
    expect(failure.problem).toMatch(/could not be kept in out\/logs\/electron-install\.log \(EACCES: permission denied/);
  });

  it('takes the line naming the error from a program’s output, never a stack frame', () => {
    expect(steps.firstErrorLine(offlineOutput)).toBe('TypeError: fetch failed');
    // Progress first, then the error: the error is the reason.
    expect(steps.firstErrorLine('Downloading electron-v45.zip\nHTTPError: Response code 404 (Not Found)\n    at Request.<anonymous> (x.js:1:1)\n')).toBe('HTTPError: Response code 404 (Not Found)');
    // A system error code without the word "error" (Node's getaddrinfo).
    expect(steps.firstErrorLine('getaddrinfo ENOTFOUND github.com\n    at GetAddrInfoReqWrap.onlookup (node:dns:1:1)')).toBe('getaddrinfo ENOTFOUND github.com');
    // Only a stack, or nothing: no reason rather than a frame.
    expect(steps.firstErrorLine('    at a (b.js:1:1)\n    at c (d.js:2:2)\n')).toBe('');
    expect(steps.firstErrorLine('')).toBe('');
    expect(steps.firstErrorLine(`Error: ${'x'.repeat(300)}`)).toHaveLength(200);
  });

  it('says so when ELECTRON_OVERRIDE_DIST_PATH has no executable', () => {
    const failure = steps.electronBinary(withRoot({ env: { ELECTRON_OVERRIDE_DIST_PATH: '/nowhere' } }).deps);
    expect(failure).toMatchObject({ ok: false, step: 'Electron binary' });
    expect(failure.problem).toMatch(/\/nowhere, which has no electron/);
  });

  it('knows where each platform keeps the executable (the electron package’s install layout)', () => {
    expect(steps.electronExecutable('linux')).toBe('electron');
    expect(steps.electronExecutable('win32')).toBe('electron.exe');
    expect(steps.electronExecutable('darwin')).toBe('Electron.app/Contents/MacOS/Electron');
  });
});

describe('step 2: better-sqlite3 for Electron', () => {
  it('uses LOFTPOINT_SQLITE_BINDING as is, with no rebuild', () => {
    const t = withRoot({ env: { LOFTPOINT_SQLITE_BINDING: '/opt/native/better_sqlite3.node' }, exists: (path: string) => path === '/opt/native/better_sqlite3.node' });
    expect(steps.sqliteForElectron(t.deps)).toEqual({ ok: true, binding: '/opt/native/better_sqlite3.node' });
    expect(t.ran).toEqual([]);
  });

  it('builds into a folder of its own with @electron/rebuild, never into node_modules', () => {
    const folder = join(root, 'out', 'native', `electron-${version}-linux-x64`);
    const built = join(folder, 'app', 'node_modules', 'better-sqlite3', 'build', 'Release', 'better_sqlite3.node');
    const copied: string[][] = [];
    const t = withRoot({ exists: (path: string) => path === built, run: (command: string, args: string[]) => (t.ran.push({ command, args }), 0) });
    const prepared: string[] = [];
    const result = steps.sqliteForElectron(t.deps, (_base: string, app: string) => void prepared.push(app), (from: string, to: string) => void copied.push([from, to]));
    expect(result).toEqual({ ok: true, binding: join(folder, 'better_sqlite3.node') });
    expect(prepared).toEqual([join(folder, 'app')]);
    expect(t.ran).toEqual([
      { command: join(root, 'node_modules/.bin/electron-rebuild'), args: ['--version', version, '--arch', 'x64', '--module-dir', join(folder, 'app'), '--only', 'better-sqlite3', '--force'] },
    ]);
    expect(copied).toEqual([[built, join(folder, 'better_sqlite3.node')]]);
    expect(t.logged.join('\n')).toMatch(/Building better-sqlite3 for Electron .* with @electron\/rebuild \(Node's own build stays/);
  });

  it('when the rebuild fails (no network here), names the step and the rebuild command', () => {
    const t = withRoot({});
    const failure = steps.sqliteForElectron(t.deps, () => {});
    expect(failure).toMatchObject({ ok: false, step: 'SQLite for Electron' });
    expect(failure.fix).toContain(`node_modules/.bin/electron-rebuild --version ${version}`);
    expect(failure.fix).toContain('LOFTPOINT_SQLITE_BINDING');
  });
});

describe('npm start with a stand-in Electron', () => {
  it.skipIf(process.platform === 'win32')('launches the binary named by ELECTRON_OVERRIDE_DIST_PATH with the built main entry and the binding of LOFTPOINT_SQLITE_BINDING', () => {
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-start-'));
    const record = join(folder, 'record.txt');
    // Not Electron: a script that writes down how it was started, then exits.
    const standIn = join(folder, 'electron');
    writeFileSync(standIn, `#!/bin/sh\nprintf 'arg=%s\\n' "$@" > '${record}'\nprintf 'binding=%s\\n' "$LOFTPOINT_SQLITE_BINDING" >> '${record}'\nexit 0\n`);
    chmodSync(standIn, 0o755);
    const binding = join(folder, 'better_sqlite3.node');
    writeFileSync(binding, 'stand-in native module');
    const result = spawnSync(process.execPath, [join(root, 'app', 'start.js'), '--project=plans.loftpoint'], {
      cwd: root,
      encoding: 'utf8',
      env: { ...process.env, ELECTRON_OVERRIDE_DIST_PATH: folder, LOFTPOINT_SQLITE_BINDING: binding },
      timeout: 120_000,
    });
    expect(result.status, result.stderr).toBe(0);
    expect(result.stderr).not.toMatch(/browser mode/);
    const lines = readFileSync(record, 'utf8').trim().split('\n');
    expect(lines).toEqual([`arg=${join(root, 'out', 'main', 'index.js')}`, 'arg=--project=plans.loftpoint', `binding=${binding}`]);
    expect(existsSync(join(root, 'out', 'main', 'index.js'))).toBe(true);
    expect(existsSync(join(root, 'out', 'preload', 'index.cjs'))).toBe(true);
  });
});
