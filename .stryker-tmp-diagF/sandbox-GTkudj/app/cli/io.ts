/** Where the command line writes: the process streams, or a buffer in tests. */
// @ts-nocheck

export interface CliIO {
  out(text: string): void;
  err(text: string): void;
}

/** How a verb sets the process's exit status. */
export type SetExitCode = (code: number) => void;

export const processIO: CliIO = {
  out: (text) => void process.stdout.write(text),
  err: (text) => void process.stderr.write(text),
};

/** An IO that keeps everything written, for tests and for all-or-nothing output. */
export function bufferIO(): CliIO & { stdout: () => string; stderr: () => string } {
  let out = '';
  let err = '';
  return {
    out: (text) => void (out += text),
    err: (text) => void (err += text),
    stdout: () => out,
    stderr: () => err,
  };
}
