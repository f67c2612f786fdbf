#!/usr/bin/env node
// The `loftpoint` command: loads the TypeScript CLI through tsx, so the
// command works straight from a clone with no build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2));
