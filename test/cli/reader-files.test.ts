/**
 * A command that only reads a project file leaves nothing beside it: SQLite's
 * -wal and -shm files (SQLite, "Write-Ahead Logging", section 2.2: the last
 * connection to close checkpoints and deletes them) are gone once the command
 * ends, unless another connection still has the project open.
 */
import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runInProcess } from './run-in-process';
import { DEMO_CONCEPTS } from '../../core';

let dir: string;
let project: string;

const run = runInProcess;

const beside = () => readdirSync(dir).filter((name) => name.startsWith('p.loftpoint')).sort();

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-reader-'));
  project = join(dir, 'p.loftpoint');
  expect((await run('project', 'create', project, '--demo')).code).toBe(0);
  writeFileSync(join(dir, 'trainer.json'), JSON.stringify(DEMO_CONCEPTS[0].concept));
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('after a command ends', () => {
  const reads: [string, string[]][] = [
    ['project versions', ['project', 'versions', 'PROJECT']],
    ['project show', ['project', 'show', 'PROJECT', '1']],
    ['project compare', ['project', 'compare', 'PROJECT', '1', '2']],
    ['evaluate --version', ['evaluate', 'PROJECT', '--version', '2', '--json']],
    ['project save', ['project', 'save', 'PROJECT', 'TRAINER', '--note', 'again']],
  ];
  for (const [what, args] of reads) {
    it(`leaves no -wal or -shm beside the project: ${what}`, async () => {
      const result = await run(...args.map((a) => (a === 'PROJECT' ? project : a === 'TRAINER' ? join(dir, 'trainer.json') : a)));
      expect(result.code, result.stderr).toBe(0);
      expect(beside()).toEqual(['p.loftpoint']);
    });
  }

  it('keeps them while another connection has the project open, and that connection goes on working', async () => {
    const other = new Database(project);
    try {
      other.pragma('user_version');
      expect(existsSync(`${project}-wal`)).toBe(true);
      expect((await run('project', 'versions', project)).code).toBe(0);
      expect(beside()).toEqual(['p.loftpoint', 'p.loftpoint-shm', 'p.loftpoint-wal']);
      expect(other.prepare('SELECT count(*) AS n FROM version').get()).toEqual({ n: expect.any(Number) });
    } finally {
      other.close();
    }
    expect(beside()).toEqual(['p.loftpoint']);
  });
});
