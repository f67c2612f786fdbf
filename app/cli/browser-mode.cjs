#!/usr/bin/env node
// Browser mode as `npm start` runs it where there is no Electron: the command
// line's `serve` verb, through the `loftpoint` launcher (loftpoint.cjs): the
// single file built ahead into out/cli with V8's code cache, rebuilt first
// when a source is newer; the split build, or the sources through tsx, when
// it cannot be. CommonJS, like the launcher: the server prints its address
// without waiting for Node's ES module loader (about 25 ms of a start).
// browser-mode.js runs this file for those who start that one.
'use strict';
process.argv.splice(2, 0, 'serve');
require('./loftpoint.cjs');
