#!/usr/bin/env node
// Browser mode for those who start this file: it runs browser-mode.cjs, which
// `npm start` runs without Electron (the `serve` verb of the command line
// built ahead; see there).
import './browser-mode.cjs';
