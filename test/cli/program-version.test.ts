/**
 * `loftpoint --version` and `-V` print the version the package declares;
 * `--version N` after a verb keeps meaning the stored version (a contract).
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { bufferIO } from '../../app/cli/io';
import { main } from '../../app/cli/main';

const declared = JSON.parse(readFileSync(resolve(__dirname, '../../package.json'), 'utf8')).version as string;
const dir = mkdtempSync(join(tmpdir(), 'loftpoint-program-version-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function run(...args: string[]) {
  const io = bufferIO();
  const code = await main(args, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

describe('the program version', () => {
  it('prints the package version for --version and -V, and says so in --help', async () => {
    expect(declared).toMatch(/^\d+\.\d+\.\d+/);
    for (const flag of ['--version', '-V']) expect(await run(flag)).toEqual({ code: 0, stdout: `${declared}\n`, stderr: '' });
    expect((await run('--help')).stdout).toMatch(/-V, --version\s+print the version of loftpoint/);
  });

  it('leaves --version N after a verb to the verb: the stored version to evaluate', async () => {
    const project = join(dir, 'p.loftpoint');
    expect((await run('project', 'create', project, '--demo')).code).toBe(0);
    const second = await run('evaluate', project, '--version', '2', '--json');
    expect(second.code, second.stderr).toBe(0);
    const shown = await run('project', 'show', project, '2');
    expect(JSON.parse(second.stdout).format).toBe('loftpoint-evaluation/1');
    // Version 2 of a demo project is the second demo; its evaluation differs from version 1's.
    const first = await run('evaluate', project, '--version', '1', '--json');
    expect(first.stdout).not.toEqual(second.stdout);
    expect(JSON.parse(shown.stdout).name).toBeTruthy();
  });
});
