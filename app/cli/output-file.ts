/**
 * Writing a file the user named on the command line (`--svg OUT`,
 * `--out PATH`): an existing file is replaced only when it is an earlier
 * output of the same kind, never the input, a project or anything else; the
 * content goes next to the target and is renamed over it, so a failed write
 * never leaves half a file.
 */
import { closeSync, openSync, readSync, realpathSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { InputError } from './errors';

/** Text on one line, for messages that must stay one line. */
export function oneLine(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, ' ').trim();
}

export interface OutputTarget {
  /** The input file the command reads (named in every message). */
  file: string;
  /** The output as the user wrote it. */
  out: string;
  /** The option that named it, e.g. `--svg` or `--out`. */
  flag: string;
  /** Extension with its dot, for messages: `.svg`. */
  extension: string;
  /** Whether the first bytes of an existing file show it is an earlier output of this kind. */
  looksLike: (head: Buffer) => boolean;
  /** A file name to suggest when `out` is a folder. */
  exampleName: string;
  /** What the input is to the command, for the message when the output names it: "the file being evaluated". */
  inputRole: string;
}

function sameFile(a: string, b: string): boolean {
  try {
    return realpathSync(a) === realpathSync(b);
  } catch {
    return resolve(a) === resolve(b);
  }
}

function headOf(path: string): Buffer {
  try {
    const fd = openSync(path, 'r');
    try {
      const bytes = Buffer.alloc(2048);
      return bytes.subarray(0, readSync(fd, bytes, 0, bytes.length, 0));
    } finally {
      closeSync(fd);
    }
  } catch {
    return Buffer.alloc(0);
  }
}

/** Throws an InputError when `out` may not be written; returns the absolute target otherwise. */
export function checkOutputTarget(target: OutputTarget): string {
  const { file, out, flag, extension } = target;
  const path = resolve(out);
  let stats;
  try {
    stats = statSync(path);
  } catch {
    return path;
  }
  if (stats.isDirectory()) throw new InputError(`${oneLine(out)} is a folder; give a file name such as ${join(out, target.exampleName)}`, file, flag);
  if (sameFile(path, file)) throw new InputError(`names ${target.inputRole}; give the output its own name`, file, flag);
  if (!target.looksLike(headOf(path))) {
    const kind = extension.slice(1).toUpperCase();
    // Letters whose names start with a vowel sound take "an": an SVG, an HTML, a PDF.
    const article = /^[AEFHILMNORSX]/.test(kind) ? 'an' : 'a';
    throw new InputError(`${oneLine(out)} exists and is not ${article} ${kind} file written by Loftpoint; it was left as it was (choose another name)`, file, flag);
  }
  return path;
}

/** Writes next to the target and renames; on failure removes the temporary file and names the reason. */
export function writeWhole(target: OutputTarget, path: string, content: string | Buffer): void {
  const temporary = `${path}.${process.pid}.tmp`;
  try {
    writeFileSync(temporary, content);
    renameSync(temporary, path);
  } catch (error) {
    rmSync(temporary, { force: true });
    const code = (error as NodeJS.ErrnoException).code;
    const reason =
      code === 'ENOENT'
        ? `the folder ${dirname(path)} does not exist`
        : code === 'EACCES' || code === 'EPERM' || code === 'EROFS'
          ? `cannot write ${oneLine(target.out)} (permission denied)`
          : `cannot write ${oneLine(target.out)} (${code ?? (error instanceof Error ? error.message : String(error))})`;
    throw new InputError(reason, target.file, target.flag);
  }
}
