/**
 * Opening files that are not sound projects: each gives a clear error naming
 * the file, never a crash, and the file's bytes are left exactly as they were.
 */
// @ts-nocheck

import { copyFileSync, mkdirSync, openSync, readFileSync, truncateSync, writeFileSync, writeSync, closeSync, statSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { APPLICATION_ID, BUSY_TIMEOUT_MS, SCHEMA_VERSION, openProjectFile, createProjectFile, insertProjectRow } from '../../app/store';
import { ProjectService, toServiceError } from '../../app/service';
import { fingerprint, freshFolder } from './helpers';

/** A closed demo project (checkpointed: everything is in the main file). */
function demoProject(folder: string, name = 'sound.loftpoint'): string {
  const file = join(folder, name);
  const service = new ProjectService({ author: 'tester' });
  service.createProject({ file, name: 'Sound', demo: true });
  service.closeProject({});
  return file;
}

function openError(file: string) {
  try {
    openProjectFile(file).db.close();
  } catch (error) {
    return toServiceError(error);
  }
  throw new Error(`${file} opened`);
}

describe('openProjectFile on files that are not sound projects', () => {
  it('reports a missing file by name', () => {
    const file = join(freshFolder(), 'missing.loftpoint');
    const error = openError(file);
    expect(error.code).toBe('file-missing');
    expect(error.message).toContain(file);
  });

  it('reports an empty file and leaves it empty', () => {
    const file = join(freshFolder(), 'empty.loftpoint');
    writeFileSync(file, '');
    const error = openError(file);
    expect(error.code).toBe('not-a-project');
    expect(error.message).toContain(file);
    expect(error.message).toContain('empty');
    expect(statSync(file).size).toBe(0);
  });

  it('reports a text file that is not SQLite and leaves it unchanged', () => {
    const file = join(freshFolder(), 'notes.loftpoint');
    writeFileSync(file, '{"format": "loftpoint-concept/1"}\n');
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('not-a-project');
    expect(error.message).toContain('not a SQLite database');
    expect(fingerprint(file)).toBe(before);
  });

  it("reports another program's SQLite file, creates no tables in it and leaves its bytes alone", () => {
    const folder = freshFolder();
    const file = join(folder, 'other.db');
    const other = new Database(file);
    other.exec('CREATE TABLE customers (id INTEGER PRIMARY KEY, name TEXT)');
    other.close();
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('not-a-project');
    expect(error.message).toContain('another program');
    expect(fingerprint(file)).toBe(before);
    expect(fingerprint(`${file}-wal`)).toBe('absent');
    const check = new Database(file, { readonly: true });
    expect(check.prepare("SELECT name FROM sqlite_master WHERE type = 'table'").pluck().all()).toEqual(['customers']);
    check.close();
  });

  it('reports a SQLite file with a different application id as not ours', () => {
    const file = join(freshFolder(), 'foreign-id.db');
    const other = new Database(file);
    other.pragma('application_id = 1234');
    other.exec('CREATE TABLE t (x)');
    other.close();
    expect(openError(file).code).toBe('not-a-project');
  });

  it('reports a project truncated to half its length as damaged and does not change it', () => {
    const folder = freshFolder();
    const file = demoProject(folder);
    truncateSync(file, Math.floor(statSync(file).size / 2) + 100);
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('corrupt');
    expect(error.message).toContain(file);
    expect(fingerprint(file)).toBe(before);
  });

  it('reports a project cut inside its 100-byte header as damaged', () => {
    const file = demoProject(freshFolder());
    truncateSync(file, 60);
    expect(openError(file).code).toBe('corrupt');
  });

  it('reports a project whose pages were overwritten with garbage as damaged, unchanged', () => {
    const file = demoProject(freshFolder());
    const size = statSync(file).size;
    const pageSize = readFileSync(file).readUInt16BE(16);
    const fd = openSync(file, 'r+');
    // Every page after the first: the schema page survives, the tables do not.
    for (let offset = pageSize; offset < size; offset += pageSize) writeSync(fd, Buffer.alloc(pageSize, 0xa5), 0, pageSize, offset);
    closeSync(fd);
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('corrupt');
    expect(error.message).toContain(file);
    expect(fingerprint(file)).toBe(before);
  });

  it('reports a folder given as the project file', () => {
    const folder = join(freshFolder(), 'looks-like-a-file.loftpoint');
    mkdirSync(folder);
    expect(openError(folder).code).toBe('not-a-project');
  });

  it('refuses a file written by a newer schema without changing it', () => {
    const file = demoProject(freshFolder());
    const db = new Database(file);
    db.pragma(`user_version = ${SCHEMA_VERSION + 1}`);
    db.close();
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('newer-schema');
    expect(error.message).toContain(`schema ${SCHEMA_VERSION + 1}`);
    expect(fingerprint(file)).toBe(before);
  });

  it('refuses a newer-schema file in rollback-journal mode without switching it to WAL (header bytes 18-19 stay 1)', () => {
    const file = demoProject(freshFolder());
    const db = new Database(file);
    db.pragma('journal_mode = DELETE');
    db.pragma(`user_version = ${SCHEMA_VERSION + 1}`);
    db.close();
    const before = fingerprint(file);
    expect(openError(file).code).toBe('newer-schema');
    expect(fingerprint(file)).toBe(before);
    // File format version numbers at offsets 18 and 19: 1 = rollback journal, 2 = WAL (sqlite.org/fileformat.html, 1.3.3).
    expect([...readFileSync(file).subarray(18, 20)]).toEqual([1, 1]);
  });

  it('refuses a SQLite file with the Loftpoint application id but no tables, and adds nothing to it', () => {
    const file = join(freshFolder(), 'marked-empty.loftpoint');
    const db = new Database(file);
    db.pragma('journal_mode = DELETE');
    db.pragma(`application_id = ${APPLICATION_ID}`);
    db.close();
    const before = fingerprint(file);
    const error = openError(file);
    expect(error.code).toBe('corrupt');
    expect(error.message).toContain('no project tables');
    expect(fingerprint(file)).toBe(before);
    const check = new Database(file, { readonly: true });
    expect(check.prepare("SELECT count(*) AS n FROM sqlite_master").get()).toEqual({ n: 0 });
    check.close();
  });

  it('keeps the service usable after a failed open (no crash, the previous project stays closed cleanly)', () => {
    const folder = freshFolder();
    const good = demoProject(folder);
    const bad = join(folder, 'bad.loftpoint');
    writeFileSync(bad, 'not a project');
    const service = new ProjectService();
    expect(() => service.openProject({ file: bad })).toThrow(/not a Loftpoint project/);
    expect(service.openProject({ file: good }).versionCount).toBe(4);
    service.closeProject({});
  });
});

describe('a sound project file', () => {
  it("carries Loftpoint's application id in the SQLite header (offset 68) and uses WAL, foreign keys and a busy timeout", () => {
    const file = demoProject(freshFolder());
    // Application ID: 4-byte big-endian integer at header offset 68 (sqlite.org/fileformat.html, 1.3).
    expect(readFileSync(file).readUInt32BE(68)).toBe(APPLICATION_ID);
    // File format read/write versions 2 mean WAL (sqlite.org/fileformat.html, 1.3.3).
    expect(readFileSync(file)[18]).toBe(2);
    const opened = openProjectFile(file);
    expect(opened.db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(opened.db.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(opened.db.pragma('busy_timeout', { simple: true })).toBe(BUSY_TIMEOUT_MS);
    expect(opened.db.pragma('user_version', { simple: true })).toBe(SCHEMA_VERSION);
    opened.db.close();
  });

  it('is never overwritten by creating a project at its path', () => {
    const folder = freshFolder();
    const file = demoProject(folder);
    const before = fingerprint(file);
    const error = (() => {
      try {
        createProjectFile(file, (db) => insertProjectRow(db, { name: 'x', description: '', units: 'si', createdAt: 'now' }));
      } catch (caught) {
        return toServiceError(caught);
      }
      throw new Error('created');
    })();
    expect(error.code).toBe('file-exists');
    expect(fingerprint(file)).toBe(before);
  });

  it('is never overwritten by creating a project over any other existing file either', () => {
    const folder = freshFolder();
    const file = join(folder, 'precious.txt');
    writeFileSync(file, 'keep me');
    const service = new ProjectService();
    expect(() => service.createProject({ file, name: 'x' })).toThrow(/already exists/);
    expect(readFileSync(file, 'utf8')).toBe('keep me');
  });

  it('copies of it open like the original (the header is enough to recognise it)', () => {
    const folder = freshFolder();
    const file = demoProject(folder);
    const copy = join(folder, 'copy.loftpoint');
    copyFileSync(file, copy);
    const service = new ProjectService();
    expect(service.openProject({ file: copy }).versionCount).toBe(4);
    service.closeProject({});
  });
});
