/**
 * Nothing lost, tested the hard way: a child process saves versions in a loop
 * and is killed with SIGKILL at random moments, 50 times. After each kill the
 * file must pass SQLite's integrity check and hold, byte for byte, every
 * version whose save had returned (SQLite's atomic commit, sqlite.org/atomiccommit.html).
 */
// @ts-nocheck

import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { ProjectService } from '../../app/service';
import { bundleScript } from './fixtures/bundle';
import { loopConceptText, loopNote } from './fixtures/loop-concept';
import { REPO_ROOT, freshFolder } from './helpers';

const KILLS = 50;

interface Saver {
  child: ChildProcess;
  label: string;
  /** Complete lines only: a line cut off by the kill is not a returned save. */
  saved: Array<{ number: number; seed: number }>;
  ready: Promise<void>;
  /** Settles once the first save has returned: the loop is running. */
  saving: Promise<void>;
  exited: Promise<void>;
}

function startSaver(script: string, file: string, label: string): Saver {
  const child = spawn(process.execPath, [script, file, label], {
    cwd: REPO_ROOT,
    stdio: ['pipe', 'pipe', 'inherit'],
  });
  const saved: Saver['saved'] = [];
  let buffer = '';
  let markReady!: () => void;
  let markSaving!: () => void;
  const ready = new Promise<void>((resolve) => (markReady = resolve));
  const saving = new Promise<void>((resolve) => (markSaving = resolve));
  child.stdout!.on('data', (chunk: Buffer) => {
    buffer += chunk.toString('utf8');
    let newline: number;
    while ((newline = buffer.indexOf('\n')) >= 0) {
      const line = buffer.slice(0, newline);
      buffer = buffer.slice(newline + 1);
      if (line === 'ready') markReady();
      const match = /^(\d+) (\d+)$/.exec(line);
      if (match) {
        saved.push({ number: Number(match[1]), seed: Number(match[2]) });
        markSaving();
      }
    }
  });
  // 'close', not 'exit': lines already in the pipe when the kill lands are still read.
  const exited = new Promise<void>((resolve) => child.once('close', () => resolve()));
  exited.then(markSaving, markSaving);
  return { child, label, saved, ready, saving, exited };
}

/** 0 to 60 ms: a few saves at most, so the kill lands at a random point of some save. */
function randomDelay(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, Math.random() * 60));
}

describe('a save killed with SIGKILL', () => {
  it(`leaves a sound file holding every returned save, over ${KILLS} kills`, async () => {
    const folder = freshFolder();
    const file = join(folder, 'killed.loftpoint');
    // The real save path (app/service, core, better-sqlite3) in one file for plain node: fast child start-up.
    const script = await bundleScript('test/store/fixtures/save-loop.ts', folder);
    const creator = new ProjectService({ author: 'setup' });
    creator.createProject({ file, name: 'Kill test' });
    creator.closeProject({});

    const returned: Array<{ number: number; seed: number; label: string }> = [];
    let next = startSaver(script, file, 'run0');
    for (let run = 0; run < KILLS; run++) {
      const current = next;
      await current.ready;
      // Start the next child now, so its start-up overlaps this one's saving.
      next = startSaver(script, file, `run${run + 1}`);
      current.child.stdin!.write('go\n');
      await current.saving;
      await randomDelay();
      current.child.kill('SIGKILL');
      await current.exited;
      returned.push(...current.saved.map((entry) => ({ ...entry, label: current.label })));

      const db = new Database(file, { readonly: true, fileMustExist: true });
      try {
        // PRAGMA integrity_check answers the single row "ok" for a sound file (sqlite.org/pragma.html#pragma_integrity_check).
        expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
        const select = db.prepare('SELECT concept_json AS conceptText, note FROM version WHERE number = ?');
        for (const entry of returned) {
          const row = select.get(entry.number) as { conceptText: string; note: string } | undefined;
          expect(row, `version ${entry.number} (${entry.label}, save ${entry.seed})`).toBeDefined();
          expect(row!.conceptText).toBe(loopConceptText(entry.seed));
          expect(row!.note).toBe(loopNote(entry.label, entry.seed));
        }
      } finally {
        db.close();
      }
    }
    next.child.kill('SIGKILL');
    await next.exited;

    // Saves really happened between kills, and every stored row is whole.
    expect(returned.length).toBeGreaterThanOrEqual(KILLS);
    const service = new ProjectService();
    service.openProject({ file });
    const versions = service.listVersions({});
    expect(versions.length).toBeGreaterThanOrEqual(returned.length);
    for (const version of versions) expect(version.summary.format).toBe('loftpoint-version-summary/1');
    service.closeProject({});
  }, 240_000);
});
