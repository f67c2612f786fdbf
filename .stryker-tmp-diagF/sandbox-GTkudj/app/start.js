#!/usr/bin/env node
// @ts-nocheck
// `npm start`: the desktop window. On first use it fetches Electron's binary
// (the electron package's own installer) and builds better-sqlite3 for
// Electron (@electron/rebuild), each with a line saying so; honours
// ELECTRON_OVERRIDE_DIST_PATH and LOFTPOINT_SQLITE_BINDING. Only when a step
// fails does it start browser mode, saying which step failed and what fixes it.
// Arguments pass through, e.g. `npm start -- --project plans.loftpoint`.
// The steps live in start-steps.js.
import { desktopSteps, fallbackMessage, launchElectron, startBrowserMode, systemDeps } from './start-steps.js';

const deps = systemDeps();
const args = process.argv.slice(2);
const steps = desktopSteps(deps);

let child;
if (steps.ok) {
  child = launchElectron(deps, steps.electron, steps.binding, args);
} else {
  console.error(fallbackMessage(steps));
  child = startBrowserMode(deps, args);
}
const forward = (signal) => child.kill(signal);
process.on('SIGINT', forward);
process.on('SIGTERM', forward);
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
