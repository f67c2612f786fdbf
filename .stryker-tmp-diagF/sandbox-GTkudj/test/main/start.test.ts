/**
 * `npm start`'s steps, without Electron or a network: the commands are
 * injected and recorded, and the end-to-end check runs `node app/start.js`
 * with a stand-in Electron executable (a shell script that records its
 * arguments and environment) named by ELECTRON_OVERRIDE_DIST_PATH.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
//  plain JavaScript module without types
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
      run: (command: string, args: string[]) => {
        t.ran.push({ command, args });
        installed.add(join(root, 'node_modules/electron/path.txt')).add(join(root, 'node_modules/electron/dist/electron'));
        return 0;
      },
    });
    expect(steps.electronBinary(t.deps)).toEqual({ ok: true, path: join(root, 'node_modules/electron/dist/electron') });
    expect(t.ran).toEqual([{ command: process.execPath, args: [join(root, 'node_modules/electron/install.js')] }]);
    expect(t.logged.join('\n')).toMatch(new RegExp(`Fetching the Electron ${version.replace(/\./g, '\\.')} binary with the electron package's own installer`));
  });

  it('names the failed step and the command that fixes it when the installer fails', () => {
    const failure = steps.electronBinary(withRoot({}).deps);
    expect(failure).toMatchObject({ ok: false, step: 'Electron binary' });
    expect(failure.fix).toContain('npx install-electron');
    const message = steps.fallbackMessage(failure);
    expect(message).toMatch(/step "Electron binary" failed/);
    expect(message).toMatch(/To fix it: npx install-electron/);
    expect(message).toMatch(/Starting browser mode instead/);
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
