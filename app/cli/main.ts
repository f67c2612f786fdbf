/**
 * The `loftpoint` command line. Each verb lives in its own file and registers
 * itself here; this file owns argument errors, exit codes and the rule that
 * bad input prints one line and exits 2, never a stack trace.
 */
import { Command, CommanderError } from 'commander';
import { EXIT_FAILURE, EXIT_INPUT, EXIT_OK, InputError } from './errors';
import type { CliIO } from './io';
import { processIO } from './io';
import { registerCommands } from './commands';
import manifest from '../../package.json';

export async function main(argv: string[], io: CliIO = processIO): Promise<number> {
  const program = new Command('loftpoint')
    .description(
      'Preliminary aircraft sizing: constraint diagrams, design points and versioned concepts.\n' +
        'Preliminary sizing only: certification requirements come from the applicable authority, ' +
        'and final numbers need licensed engineering review.',
    )
    // `--version` before a verb is the program's; after one (`evaluate FILE --version 3`) it stays the verb's.
    .enablePositionalOptions()
    .version(manifest.version, '-V, --version', 'print the version of loftpoint')
    .exitOverride()
    .configureOutput({
      writeOut: (text) => io.out(text),
      writeErr: (text) => io.err(text),
      outputError: (text, write) => write(`loftpoint: ${text.replace(/^error: /, '').trim()}\n`),
    })
    .showHelpAfterError(false);
  let exitCode = EXIT_OK;
  try {
    await registerCommands(
      program,
      io,
      (code) => {
        exitCode = code;
      },
      argv,
    );
    await program.parseAsync(argv, { from: 'user' });
    return exitCode;
  } catch (error) {
    if (error instanceof CommanderError) {
      if (error.code === 'commander.helpDisplayed' || error.code === 'commander.version' || error.code === 'commander.help') {
        return EXIT_OK;
      }
      return EXIT_INPUT;
    }
    if (error instanceof InputError) {
      io.err(`loftpoint: ${error.line()}\n`);
      return EXIT_INPUT;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.err(`loftpoint: internal error: ${message.split('\n')[0]}\n`);
    if (process.env.LOFTPOINT_DEBUG && error instanceof Error && error.stack) io.err(`${error.stack}\n`);
    return EXIT_FAILURE;
  }
}

/**
 * For the build (app/build-cli.js): the demo concepts checked and evaluated now, and the file this
 * single-file build keeps them in (app/service/demo-checks.ts); null from anything but the single
 * file. Loads the service only when called.
 */
export async function demoChecksForBuild(): Promise<{ file: string; text: string } | null> {
  const [{ freshDemoChecksText }, { ownDemoChecksFile }] = await Promise.all([import('../service/engine'), import('../service/demo-checks')]);
  const file = ownDemoChecksFile();
  return file === null ? null : { file, text: freshDemoChecksText() };
}
