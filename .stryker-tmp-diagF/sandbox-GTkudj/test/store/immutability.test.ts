/** Versions are append-only: the schema itself refuses to rewrite or delete one. */
// @ts-nocheck

import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { ProjectService } from '../../app/service';
import { freshFolder } from './helpers';

describe('a stored version', () => {
  it('cannot be updated or deleted, even with raw SQL', () => {
    const file = join(freshFolder(), 'immutable.loftpoint');
    const service = new ProjectService({ author: 'tester' });
    service.createProject({ file, name: 'Immutable', demo: true });
    const original = service.getVersion({ version: 1 });
    service.closeProject({});

    const db = new Database(file);
    expect(() => db.prepare("UPDATE version SET note = 'rewritten' WHERE number = 1").run()).toThrow(/immutable/);
    expect(() => db.prepare('DELETE FROM version WHERE number = 1').run()).toThrow(/immutable/);
    db.close();

    service.openProject({ file });
    const after = service.getVersion({ version: 1 });
    expect(after.note).toBe(original.note);
    expect(after.conceptText).toBe(original.conceptText);
    service.closeProject({});
  });
});
