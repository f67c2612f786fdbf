/**
 * How a failed read of an input is told to the user: each system error code
 * the command line meets (POSIX errno names, as Node reports them) becomes a
 * line naming the input, file or standard input, and what to do.
 */
import { describe, expect, it } from 'vitest';
import { inputFileError, inputName, STANDARD_INPUT } from '../../app/cli/input-text';

const failure = (code: string) => Object.assign(new Error(`${code}: from the system`), { code });

describe('a failed read of an input', () => {
  it('names the file or standard input, and says what is wrong in words for each error code', () => {
    expect(inputName(STANDARD_INPUT)).toBe('standard input');
    expect(inputName('jet.json')).toBe('jet.json');
    expect(inputFileError(failure('ENOENT'), 'jet.json').line()).toBe('jet.json: no such file');
    expect(inputFileError(failure('EACCES'), 'jet.json').line()).toBe('jet.json: cannot be read (permission denied)');
    expect(inputFileError(failure('EPERM'), 'jet.json').line()).toBe('jet.json: cannot be read (permission denied)');
    expect(inputFileError(failure('EISDIR'), 'concepts').line()).toBe('concepts: is a folder; name a concept JSON file or a project file');
    // A non-blocking standard input with nothing in it (a terminal or pipe set so by another program).
    expect(inputFileError(failure('EAGAIN'), STANDARD_INPUT).line()).toBe('standard input: has nothing to read yet (pipe a concept into it, or name a file)');
  });

  it('keeps an unknown code, or the message when there is no code, so nothing is lost', () => {
    expect(inputFileError(failure('EIO'), 'jet.json').line()).toBe('jet.json: cannot be read (EIO)');
    expect(inputFileError(new Error('disk went away'), 'jet.json').line()).toBe('jet.json: cannot be read (disk went away)');
    expect(inputFileError('odd', STANDARD_INPUT).line()).toBe('standard input: cannot be read (odd)');
  });
});
