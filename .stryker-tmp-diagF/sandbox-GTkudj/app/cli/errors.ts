/**
 * Errors the command line reports as one line and exit status 2: bad input
 * from the user (a file, a field, an argument), never a program fault.
 */
// @ts-nocheck

export class InputError extends Error {
  constructor(
    message: string,
    /** The file the input came from, when there is one. */
    readonly file?: string,
    /** Field path inside that file, e.g. `requirements[1].speed`. */
    readonly field?: string,
  ) {
    super(message);
    this.name = 'InputError';
  }

  /** "trainer.json: requirements[1].speed: is a bare number ..." */
  line(): string {
    return [this.file, this.field, this.message].filter((part) => part !== undefined && part !== '').join(': ');
  }
}

export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_INPUT = 2;
