/**
 * `loftpoint serve [--port N] [--project FILE]`: the designer window in a
 * web browser. Serves the page and the service API on 127.0.0.1 only and
 * prints the address (with its per-launch token) as the first line.
 */
import type { Command } from 'commander';
import { PRELIMINARY_CAUTION } from '../service/contract';
import type { BrowserMode } from '../server/launch';
import type { SetExitCode } from './io';
import { EXIT_OK, InputError } from './errors';
import type { CliIO } from './io';

export interface ServeOptions {
  port?: string;
  project?: string;
  /** Folder of the built page (not a command-line option; tests and embedders). */
  rendererDir?: string;
}

/** The port as given: a whole number 0-65535 (0 lets the system choose). */
export function parsePort(text: string | undefined): number {
  if (text === undefined) return 0;
  const trimmed = text.trim();
  const port = /^\d+$/.test(trimmed) ? Number(trimmed) : NaN;
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new InputError(`must be a whole number from 0 to 65535 (got "${text}"); 0 picks any free port`, undefined, '--port');
  }
  return port;
}

/** Starts browser mode and prints where it is; resolves once `until` does and everything is closed. */
export async function runServe(options: ServeOptions, io: CliIO, until: Promise<unknown>): Promise<BrowserMode> {
  const port = parsePort(options.port);
  // The server loads with the verb that needs it, so the other verbs start without it.
  const { LaunchError, launchBrowserMode } = await import('../server/launch');
  let mode: BrowserMode;
  try {
    // The address comes first, as soon as the server listens: the browser loads the page while the project opens.
    mode = await launchBrowserMode({ port, project: options.project, rendererDir: options.rendererDir }, (url) => io.out(`${url}\n`));
  } catch (error) {
    if (error instanceof LaunchError) throw new InputError(error.message, undefined, error.field);
    throw error;
  }
  io.out(`Project: ${mode.project.file}${mode.created ? ' (new, with the demo concepts)' : ''}${mode.project.readonly ? ' (read-only)' : ''}\n`);
  io.out('Open the address above in a browser on this computer; it includes a one-time access token. Press Ctrl+C to stop.\n');
  io.out(`${PRELIMINARY_CAUTION}\n`);
  await until;
  await mode.close();
  return mode;
}

/** Resolves on the first Ctrl+C or termination request. */
function stopRequested(): Promise<void> {
  return new Promise((resolve) => {
    const stop = () => {
      process.off('SIGINT', stop);
      process.off('SIGTERM', stop);
      resolve();
    };
    process.on('SIGINT', stop);
    process.on('SIGTERM', stop);
  });
}

export function registerServe(program: Command, io: CliIO, setExitCode: SetExitCode): void {
  program
    .command('serve')
    .description('Open the designer window in a web browser, served on 127.0.0.1 only with a per-launch access token.')
    .option('--port <n>', 'port to listen on; 0 picks any free port', '0')
    .option('--project <file>', 'project file to open, created with the demo concepts when missing (default: the demo project in your data folder)')
    .action(async (options: ServeOptions) => {
      await runServe({ port: options.port, project: options.project }, io, stopRequested());
      setExitCode(EXIT_OK);
    });
}
