#!/usr/bin/env node
// @ts-nocheck
// `npm run package`: installers for this computer's system (Linux AppImage and
// deb, macOS dmg, Windows NSIS; electron-builder cannot build a macOS or
// Windows installer elsewhere). It needs a network, as `npm start` does:
// better-sqlite3 is built for Electron (the same step as `npm start`, or
// LOFTPOINT_SQLITE_BINDING as is) and shipped beside the app as
// resources/native/better_sqlite3.node; then the window is built and
// electron-builder packs it with electron-builder.json (fuses included).
// Arguments pass to electron-builder, e.g. `npm run package -- --linux deb`.
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { buildDesktop, fallbackMessage, sqliteForElectron, systemDeps } from './start-steps.js';

const deps = systemDeps();
const sqlite = sqliteForElectron(deps);
if (!sqlite.ok) {
  console.error(fallbackMessage(sqlite).split('\n').slice(0, 2).join('\n'));
  process.exit(1);
}
const built = buildDesktop(deps, () => true);
if (!built.ok) {
  console.error(fallbackMessage(built).split('\n').slice(0, 2).join('\n'));
  process.exit(1);
}
const staged = join(deps.root, 'out', 'native', 'package');
mkdirSync(staged, { recursive: true });
copyFileSync(sqlite.binding, join(staged, 'better_sqlite3.node'));
const status = deps.run(join(deps.root, 'node_modules', '.bin', process.platform === 'win32' ? 'electron-builder.cmd' : 'electron-builder'), ['--config', 'electron-builder.json', '--publish', 'never', ...process.argv.slice(2)]);
process.exit(status);
