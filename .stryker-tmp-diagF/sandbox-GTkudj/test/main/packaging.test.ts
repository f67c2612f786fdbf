/**
 * The packaging configuration, checked without packaging (that needs a
 * network and each system's own tools): electron-builder's own validator
 * accepts it, and it asks for what the desktop app needs.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PROJECT_EXTENSION } from '../../app/service/first-start';

const root = join(import.meta.dirname, '..', '..');
const config = JSON.parse(readFileSync(join(root, 'electron-builder.json'), 'utf8'));
const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
const require = createRequire(import.meta.url);

describe('electron-builder.json', () => {
  it('passes electron-builder’s own configuration check (its JSON schema)', async () => {
    const { validateConfiguration } = require('app-builder-lib/out/util/config/config.js');
    const { DebugLogger } = require('builder-util');
    await expect(validateConfiguration(config, new DebugLogger(false))).resolves.toBeUndefined();
    // The check is real: a misspelt option is refused.
    await expect(validateConfiguration({ ...config, electronFusez: {} }, new DebugLogger(false))).rejects.toThrow(/electronFusez/);
  });

  it('builds AppImage and deb for Linux, dmg for macOS and NSIS for Windows', () => {
    expect(config.linux.target).toEqual(['AppImage', 'deb']);
    expect(config.mac.target).toEqual(['dmg']);
    expect(config.win.target).toEqual(['nsis']);
  });

  it('sets the fuses Electron recommends (electronjs.org/docs/latest/tutorial/fuses)', () => {
    expect(config.electronFuses).toMatchObject({
      runAsNode: false,
      enableCookieEncryption: true,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
    });
    // onlyLoadAppFromAsar needs the app in an asar archive.
    expect(config.asar).toBe(true);
  });

  it('associates the project extension with the app', () => {
    expect(config.fileAssociations).toEqual([expect.objectContaining({ ext: PROJECT_EXTENSION.slice(1), role: 'Editor' })]);
  });

  it('ships better-sqlite3 built for Electron where the store looks for it, and never rebuilds node_modules in place', () => {
    // app/store/native.ts loads <resources>/native/better_sqlite3.node under Electron.
    expect(config.extraResources).toEqual([{ from: 'out/native/package/better_sqlite3.node', to: 'native/better_sqlite3.node' }]);
    // An in-place rebuild would replace the Node build the command line and tests use.
    expect(config.npmRebuild).toBe(false);
  });

  it('packs the built main entry, preload and page', () => {
    expect(pkg.main).toBe('out/main/index.js');
    expect(config.files).toEqual(expect.arrayContaining(['out/main/**', 'out/preload/**', 'out/renderer/**', 'package.json']));
    expect(pkg.scripts.package).toBe('node app/package-app.js');
  });

  it('has the app’s own icon: a square PNG of at least 512 px (macOS needs 512, electron-builder docs)', () => {
    for (const platform of ['linux', 'mac', 'win']) {
      const png = readFileSync(join(root, config[platform].icon));
      // PNG signature, then the IHDR chunk with width and height (ISO/IEC 15948, 5.2 and 11.2.2).
      expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
      expect(png.subarray(12, 16).toString('latin1')).toBe('IHDR');
      const width = png.readUInt32BE(16);
      expect(png.readUInt32BE(20)).toBe(width);
      expect(width).toBeGreaterThanOrEqual(512);
    }
  });

  it('pins electron-builder 26 and @electron/rebuild 4 exactly', () => {
    expect(pkg.devDependencies['electron-builder']).toMatch(/^26\.\d+\.\d+$/);
    expect(pkg.devDependencies['@electron/rebuild']).toMatch(/^4\.\d+\.\d+$/);
  });
});
