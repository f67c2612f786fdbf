/**
 * The text of an input the user named on the command line: a file, or "-"
 * for standard input, so a concept can be piped from one command into the
 * next (`loftpoint project show P 3 | loftpoint concept add-configuration -
 * engine-out | loftpoint project save P -`). A byte-order mark is dropped.
 * Every way the read can fail is an InputError that names the input.
 */
import { readFileSync } from 'node:fs';
import { InputError } from './errors';

/** The input name that means standard input. */
export const STANDARD_INPUT = '-';

/** How messages name an input: the file as given, or "standard input". */
export function inputName(file: string): string {
  return file === STANDARD_INPUT ? 'standard input' : file;
}

export function readInputText(file: string): string {
  try {
    return readFileSync(file === STANDARD_INPUT ? 0 : file, 'utf8').replace(/^\uFEFF/, '');
  } catch (error) {
    throw inputFileError(error, file);
  }
}

/** An error from opening or reading an input, in the user's terms. */
export function inputFileError(error: unknown, file: string): InputError {
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  const name = inputName(file);
  switch (code) {
    case 'ENOENT':
      return new InputError('no such file', name);
    case 'EACCES':
    case 'EPERM':
      return new InputError('cannot be read (permission denied)', name);
    case 'EISDIR':
      return new InputError('is a folder; name a concept JSON file or a project file', name);
    case 'EAGAIN':
      return new InputError('has nothing to read yet (pipe a concept into it, or name a file)', name);
    default:
      return new InputError(`cannot be read (${code ?? (error instanceof Error ? error.message : String(error))})`, name);
  }
}
