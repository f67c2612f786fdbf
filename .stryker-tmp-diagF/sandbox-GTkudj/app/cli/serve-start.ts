/**
 * Browser mode on its own (what `npm start` runs where there is no Electron):
 * the `serve` verb with the arguments given, and the command line's rule that
 * bad input prints one line and exits 2.
 */
// @ts-nocheck

import { Command, CommanderError } from 'commander';
import { InputError, EXIT_FAILURE, EXIT_INPUT } from './errors';
import { processIO } from './io';
import { registerServe } from './serve';

const program = new Command('loftpoint')
  .exitOverride()
  .configureOutput({ outputError: (text, write) => write(`loftpoint: ${text.replace(/^error: /, '').trim()}\n`) });
let exitCode = 0;
registerServe(program, processIO, (code) => {
  exitCode = code;
});

try {
  await program.parseAsync(['serve', ...process.argv.slice(2)], { from: 'user' });
  process.exitCode = exitCode;
} catch (error) {
  if (error instanceof CommanderError) {
    process.exitCode = error.exitCode === 0 ? 0 : EXIT_INPUT;
  } else if (error instanceof InputError) {
    processIO.err(`loftpoint: ${error.line()}\n`);
    process.exitCode = EXIT_INPUT;
  } else {
    processIO.err(`loftpoint: internal error: ${error instanceof Error ? error.message.split('\n')[0] : String(error)}\n`);
    process.exitCode = EXIT_FAILURE;
  }
}
