#!/usr/bin/env node
// The `loftpoint` command as it was first started (`node app/cli/loftpoint.js`):
// it runs the launcher, loftpoint.cjs, which the `loftpoint` bin names. Starting
// loftpoint.cjs directly saves Node's ES module loader, about 9 ms of CPU.
import './loftpoint.cjs';
