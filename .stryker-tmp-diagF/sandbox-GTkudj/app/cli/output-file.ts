/**
 * Writing a file the user named on the command line (`--svg OUT`, `--out
 * PATH`). An existing file is replaced only when it carries Loftpoint's own
 * mark (see output-mark.ts) and the extension the option writes, or when the
 * user adds --force; never the input, a folder or a read-only file. The
 * content goes to a temporary file in the same folder and is renamed over the
 * target, so a failed write (a full disk) never leaves half a file.
 */
// @ts-nocheck

import { accessSync, closeSync, constants, fstatSync, openSync, readSync, realpathSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, extname, join, resolve } from 'node:path';
import { InputError } from './errors';

/** Text on one line, for messages that must stay one line. */
export function oneLine(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, ' ').trim();
}

export interface OutputTarget {
  /** The input file the command reads (named in every message); undefined when there is none. */
  file: string | undefined;
  /** The output as the user wrote it. */
  out: string;
  /** The option that named it, e.g. `--svg` or `--out`. */
  flag: string;
  /** Extension with its dot, for messages: `.svg`. */
  extension: string;
  /** Whether an existing file carries the mark this kind of output is written with (first and last 4 KB); absent: never replaced without --force. */
  isOurs?: (head: Buffer, tail: Buffer) => boolean;
  /** A file name to suggest when `out` is a folder. */
  exampleName: string;
  /** What the input is to the command, for the message when the output names it: "the file being evaluated". */
  inputRole: string;
  /** Replace an existing file without the mark (--force); a read-only file is still never replaced. */
  force?: boolean;
}

function sameFile(a: string, b: string): boolean {
  try {
    return realpathSync(a) === realpathSync(b);
  } catch {
    return resolve(a) === resolve(b);
  }
}

const EDGE = 4096;

/** The first and last 4 KB of a file (empty buffers when it cannot be read). */
function edgesOf(path: string): { head: Buffer; tail: Buffer } {
  try {
    const fd = openSync(path, 'r');
    try {
      const size = fstatSync(fd).size;
      const head = Buffer.alloc(Math.min(EDGE, size));
      readSync(fd, head, 0, head.length, 0);
      const tail = Buffer.alloc(Math.min(EDGE, size));
      readSync(fd, tail, 0, tail.length, size - tail.length);
      return { head, tail };
    } finally {
      closeSync(fd);
    }
  } catch {
    return { head: Buffer.alloc(0), tail: Buffer.alloc(0) };
  }
}

function isReadOnly(path: string, mode: number): boolean {
  if ((mode & 0o222) === 0) return true;
  try {
    accessSync(path, constants.W_OK);
    return false;
  } catch {
    return true;
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
  const name = oneLine(out);
  if (stats.isDirectory()) throw new InputError(`${name} is a folder; give a file name such as ${join(out, target.exampleName)}`, file, flag);
  if (file !== undefined && sameFile(path, file)) throw new InputError(`names ${target.inputRole}; give the output its own name`, file, flag);
  if (isReadOnly(path, stats.mode)) {
    throw new InputError(`${name} exists and is read-only; it was left as it was (even --force never replaces a read-only file); choose another name`, file, flag);
  }
  if (target.force) return path;
  if (!target.isOurs) throw new InputError(`${name} exists; it was left as it was (choose another name, or add --force to replace it)`, file, flag);
  const edges = edgesOf(path);
  if (extname(path).toLowerCase() !== extension || !target.isOurs(edges.head, edges.tail)) {
    const kind = extension.slice(1).toUpperCase();
    // Letters whose names start with a vowel sound take "an": an SVG, an HTML, a PDF.
    const article = /^[AEFHILMNORSX]/.test(kind) ? 'an' : 'a';
    throw new InputError(
      `${name} exists and is not ${article} ${kind} file written by Loftpoint; it was left as it was (choose another name, or add --force to replace it)`,
      file,
      flag,
    );
  }
  return path;
}

/** Why a write failed, in words: the disk being full is said by name. */
export function writeFailure(code: string | undefined, path: string, out: string, error: unknown): string {
  if (code === 'ENOSPC' || code === 'EDQUOT') return `cannot write ${oneLine(out)}: the disk is full; nothing was written and no partial file was left`;
  if (code === 'ENOENT') return `the folder ${dirname(path)} does not exist`;
  if (code === 'EACCES' || code === 'EPERM' || code === 'EROFS') return `cannot write ${oneLine(out)} (permission denied)`;
  return `cannot write ${oneLine(out)} (${code ?? (error instanceof Error ? oneLine(error.message) : String(error))})`;
}

/** Writes to a temporary file in the same folder and renames it over `path`; on failure removes it and names the reason. */
export function writeWhole(target: Pick<OutputTarget, 'file' | 'out' | 'flag'>, path: string, content: string | Buffer): void {
  const temporary = join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now().toString(36)}.tmp`);
  try {
    writeFileSync(temporary, content, { flag: 'wx' });
    renameSync(temporary, path);
  } catch (error) {
    rmSync(temporary, { force: true });
    throw new InputError(writeFailure((error as NodeJS.ErrnoException).code, path, target.out, error), target.file, target.flag);
  }
}
