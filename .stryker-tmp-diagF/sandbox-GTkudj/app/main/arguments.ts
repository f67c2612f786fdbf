/**
 * Which project a launch names: `--project=FILE`, `--project FILE`, or a bare
 * file (as the system's file association passes it). Electron and Chromium
 * put switches of their own on the command line; every other `-`/`--` switch
 * is left alone. A named file with another extension is not opened silently
 * or ignored: the person is told why.
 */
// @ts-nocheck

import { extname, resolve } from 'node:path';

export interface ProjectArgument {
  /** The project file, absolute, when one was named and has the project extension. */
  file?: string;
  /** One line for the person when a file was named that cannot be a project. */
  problem?: string;
}

/**
 * `argv` is the process's whole command line; `skip` how many leading entries
 * are the program itself (1 packaged, 2 when Electron runs the built main
 * entry); relative names resolve against `cwd` (for a second launch, its own
 * working folder).
 */
export function projectArgument(argv: readonly string[], skip: number, cwd: string, extension: string): ProjectArgument {
  const args = argv.slice(skip);
  let named: string | undefined;
  for (let i = 0; i < args.length; i += 1) {
    const arg = args[i];
    if (arg === '--project') {
      named = args[i + 1];
      if (named === undefined || named.startsWith('-')) return { problem: '--project needs a file name, e.g. --project plans' + extension };
      break;
    }
    if (arg.startsWith('--project=')) {
      named = arg.slice('--project='.length);
      if (named === '') return { problem: '--project needs a file name, e.g. --project=plans' + extension };
      break;
    }
    if (!arg.startsWith('-') && named === undefined) named = arg;
  }
  if (named === undefined) return {};
  if (extname(named).toLowerCase() !== extension) {
    return { problem: `${named}: not a Loftpoint project (project files end in ${extension}); open it with File > Open Project or name a ${extension} file` };
  }
  return { file: resolve(cwd, named) };
}
