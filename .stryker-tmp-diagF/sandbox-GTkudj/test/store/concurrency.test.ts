/**
 * Two writers on one project: both succeed, or one is told "busy" after the
 * timeout; nothing is lost either way (SQLite locking, sqlite.org/wal.html,
 * "Concurrency"; busy handler, sqlite.org/c3ref/busy_timeout.html).
 */
// @ts-nocheck

import { spawn } from 'node:child_process';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { BUSY_TIMEOUT_MS } from '../../app/store';
import { ProjectService, toServiceError } from '../../app/service';
import { bundleScript } from './fixtures/bundle';
import { loopConceptText, loopNote } from './fixtures/loop-concept';
import { REPO_ROOT, freshFolder } from './helpers';

const SAVES_EACH = 25;

function saver(script: string, file: string, label: string) {
  const child = spawn(process.execPath, [script, file, label], {
    cwd: REPO_ROOT,
    stdio: ['pipe', 'pipe', 'inherit'],
    env: { ...process.env, LOOP_SAVES: String(SAVES_EACH) },
  });
  let output = '';
  child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString('utf8')));
  const ready = new Promise<void>((resolve) => {
    const check = () => (output.includes('ready\n') ? resolve() : setTimeout(check, 10));
    check();
  });
  const done = new Promise<{ code: number | null; lines: string[] }>((resolve) =>
    child.once('close', (code) => resolve({ code, lines: output.trim().split('\n').slice(1) })),
  );
  return { child, ready, done };
}

describe('two processes saving into one project', () => {
  it('both succeed or get "busy"; every returned save is stored once, intact', async () => {
    const folder = freshFolder();
    const file = join(folder, 'shared.loftpoint');
    const creator = new ProjectService();
    creator.createProject({ file, name: 'Shared' });
    creator.closeProject({});
    const script = await bundleScript('test/store/fixtures/save-loop.ts', folder);

    const a = saver(script, file, 'a');
    const b = saver(script, file, 'b');
    await Promise.all([a.ready, b.ready]);
    a.child.stdin!.write('go\n');
    b.child.stdin!.write('go\n');
    const results = { a: await a.done, b: await b.done };

    const service = new ProjectService();
    service.openProject({ file });
    const stored = new Set(service.listVersions({}).map((v) => v.number));
    let returned = 0;
    for (const [label, result] of Object.entries(results)) {
      expect(result.code).toBe(0);
      expect(result.lines).toHaveLength(SAVES_EACH);
      for (const line of result.lines) {
        const failed = /^failed (\d+) (\S+)$/.exec(line);
        if (failed) {
          expect(failed[2]).toBe('busy');
          continue;
        }
        const [number, seed] = line.split(' ').map(Number);
        returned++;
        expect(stored.has(number)).toBe(true);
        const version = service.getVersion({ version: number });
        expect(version.conceptText).toBe(loopConceptText(seed));
        expect(version.note).toBe(loopNote(label, seed));
      }
    }
    expect(stored.size).toBe(returned);
    service.closeProject({});
  }, 120_000);

  it('reports "busy", naming the file, when another writer holds the file past the timeout, and writes nothing', () => {
    const file = join(freshFolder(), 'held.loftpoint');
    const service = new ProjectService();
    service.createProject({ file, name: 'Held', demo: true });
    const text = service.getVersion({ version: 1 }).conceptText;

    const other = new Database(file);
    other.exec('BEGIN IMMEDIATE');
    const started = Date.now();
    let error;
    try {
      service.saveVersion({ conceptText: text, note: 'waits' });
    } catch (caught) {
      error = toServiceError(caught);
    }
    const waited = Date.now() - started;
    other.exec('ROLLBACK');
    other.close();

    expect(error?.code).toBe('busy');
    expect(error?.message).toContain(file);
    expect(error?.message).toContain('busy');
    expect(waited).toBeGreaterThanOrEqual(BUSY_TIMEOUT_MS - 100);
    expect(service.getProject({}).versionCount).toBe(4);
    // Once the other writer is gone the same save goes through.
    expect(service.saveVersion({ conceptText: text, note: 'now' }).version.number).toBe(5);
    service.closeProject({});
  }, 30_000);
});
