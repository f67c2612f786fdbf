/**
 * Schema migrations keyed on PRAGMA user_version: a file written by every
 * earlier schema version opens, is migrated in place (each step in one
 * transaction) and keeps every version exactly; read-only files are migrated
 * in memory only.
 */
// @ts-nocheck

import { chmodSync, copyFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { MIGRATIONS, SCHEMA_VERSION } from '../../app/store';
import { ProjectService, toServiceError } from '../../app/service';
import { EARLIER_SCHEMA_BUILDERS, SCHEMA_V1_DDL, fixtureVersions, writeSchemaV1File } from './fixtures/earlier-schemas';
import { fingerprint, freshFolder } from './helpers';

const restore: Array<() => void> = [];
afterEach(() => {
  for (const undo of restore.splice(0)) undo();
});

function userVersion(file: string): number {
  const db = new Database(file, { readonly: true });
  try {
    return db.pragma('user_version', { simple: true }) as number;
  } finally {
    db.close();
  }
}

const squeeze = (sql: string) => sql.replace(/\s+/g, ' ').trim();

describe('schema migrations', () => {
  it('have a fixture builder for every earlier schema version', () => {
    const earlier = MIGRATIONS.map((migration) => migration.version).filter((version) => version < SCHEMA_VERSION);
    expect(earlier.length).toBeGreaterThan(0);
    for (const version of earlier) expect(EARLIER_SCHEMA_BUILDERS[version], `builder for schema ${version}`).toBeTypeOf('function');
  });

  it('are numbered 1, 2, 3... with no gaps, so user_version names exactly one schema', () => {
    expect(MIGRATIONS.map((migration) => migration.version)).toEqual(MIGRATIONS.map((_, index) => index + 1));
  });

  it('never edit a released migration: schema 1 is still the frozen DDL', () => {
    expect(squeeze(MIGRATIONS[0].sql)).toBe(squeeze(SCHEMA_V1_DDL));
  });

  for (const [version, build] of Object.entries(EARLIER_SCHEMA_BUILDERS)) {
    it(`open a file written by schema ${version}, migrate it and keep every version byte for byte`, () => {
      const file = join(freshFolder(), `schema-${version}.loftpoint`);
      build(file);
      expect(userVersion(file)).toBe(Number(version));
      const service = new ProjectService({ author: 'tester' });
      const info = service.openProject({ file });
      expect(info.schemaVersion).toBe(SCHEMA_VERSION);
      expect(info.name).toBe('Schema one');
      expect(info.units).toBe('us');
      const expected = fixtureVersions();
      const listed = service.listVersions({});
      expect(listed.map((v) => [v.number, v.conceptName, v.parent, v.author, v.createdAt])).toEqual(
        expected.map((v) => [v.number, v.concept, v.parent, v.author, v.createdAt]),
      );
      for (const v of expected) {
        const stored = service.getVersion({ version: v.number });
        expect(stored.conceptText).toBe(v.conceptText);
        expect(stored.note).toBe(v.note);
      }
      // What schema 2 added works on the migrated file.
      expect(service.tagVersion({ version: 3, tag: 'baseline' }).tags).toEqual(['baseline']);
      const next = service.saveVersion({ conceptText: expected[2].conceptText, note: 'after migration', parent: 3 });
      expect(next.version.number).toBe(4);
      expect(next.version.parent).toBe(3);
      expect(next.version.conceptName).toBe('Baseline');
      service.closeProject({});
      expect(userVersion(file)).toBe(SCHEMA_VERSION);
    });
  }

  it('read a read-only schema-1 file by migrating a copy in memory, leaving the file as it was', () => {
    const file = join(freshFolder(), 'old.loftpoint');
    writeSchemaV1File(file);
    chmodSync(file, 0o444);
    restore.push(() => chmodSync(file, 0o644));
    const before = fingerprint(file);
    const service = new ProjectService();
    const info = service.openProject({ file });
    expect(info.readonly).toBe(true);
    expect(info.schemaVersion).toBe(SCHEMA_VERSION);
    expect(service.listVersions({})).toHaveLength(3);
    expect(service.getVersion({ version: 2 }).tags).toEqual([]);
    service.closeProject({});
    expect(fingerprint(file)).toBe(before);
    expect(userVersion(file)).toBe(1);
  });

  it('run each step in one transaction: a step that fails leaves the file at its old schema', () => {
    const folder = freshFolder();
    const file = join(folder, 'blocked.loftpoint');
    writeSchemaV1File(file);
    // A stray table with the name schema 2 creates makes that step fail half-way.
    const db = new Database(file);
    db.exec('CREATE TABLE version_tag (x)');
    db.close();
    const copy = join(folder, 'before.loftpoint');
    copyFileSync(file, copy);
    const service = new ProjectService();
    let error;
    try {
      service.openProject({ file });
    } catch (caught) {
      error = toServiceError(caught);
    }
    expect(error?.message).toContain(file);
    expect(userVersion(file)).toBe(1);
    const check = new Database(file, { readonly: true });
    expect(check.prepare("SELECT count(*) FROM sqlite_master WHERE name = 'version_by_concept'").pluck().get()).toBe(0);
    check.close();
  });
});
