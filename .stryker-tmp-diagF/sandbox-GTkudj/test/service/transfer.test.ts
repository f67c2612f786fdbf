/**
 * Export and import (`loftpoint-project-export/1`, `loftpoint-version-export/1`)
 * and backup: a round trip gives identical concepts and notes, byte for byte;
 * nothing existing is ever overwritten.
 */
// @ts-nocheck

import { existsSync, writeFileSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { ProjectService, toServiceError, type ServiceError } from '../../app/service';
import { demoConcept, serviceWithProject } from './helpers';

function failure(run: () => unknown): ServiceError {
  try {
    run();
  } catch (error) {
    return toServiceError(error);
  }
  throw new Error('expected a failure');
}

/** A project with branches, tags, a second concept and awkward notes. */
function richProject() {
  const setup = serviceWithProject({ demo: true });
  const { service } = setup;
  const edited = demoConcept(0);
  edited.aircraft.aero.aspectRatio = 9;
  service.saveVersion({ concept: edited, note: '<script>alert(1)</script>\r\nCRLF & "quotes" 🛩️', parent: 1 });
  service.saveVersion({ conceptText: `${JSON.stringify(edited)}   \n`, note: '', parent: 1, author: 'second author' });
  service.startConcept({ fromVersion: 5, name: 'Branch' });
  service.tagVersion({ version: 5, tag: 'sent to customer' });
  return setup;
}

describe('exportProject and importProject', () => {
  it('round trip: every concept text, note, author, time, parent, tag and number comes back identical', () => {
    const { service, folder } = richProject();
    const exported = service.exportProject({});
    const originals = exported.versions.map((v) => service.getVersion({ version: v.number }));
    // The document goes through JSON text, as a file would.
    const document = JSON.parse(JSON.stringify(exported));
    const copyFile = join(folder, 'imported.loftpoint');
    const imported = new ProjectService();
    const info = imported.importProject({ file: copyFile, document });
    expect(info.versionCount).toBe(originals.length);
    expect(imported.listConcepts({}).map((c) => c.name)).toEqual(service.listConcepts({}).map((c) => c.name));
    for (const original of originals) {
      const copy = imported.getVersion({ version: original.number });
      expect(Buffer.from(copy.conceptText).equals(Buffer.from(original.conceptText))).toBe(true);
      expect(Buffer.from(copy.note).equals(Buffer.from(original.note))).toBe(true);
      expect([copy.conceptName, copy.parent, copy.author, copy.createdAt, copy.tags]).toEqual([
        original.conceptName,
        original.parent,
        original.author,
        original.createdAt,
        original.tags,
      ]);
      expect(copy.summary).toEqual(original.summary);
    }
    // And exporting the copy gives the same document, apart from the export time.
    const again = imported.exportProject({});
    expect({ ...again, exportedAt: '' }).toEqual({ ...exported, exportedAt: '' });
    imported.closeProject({});
    service.closeProject({});
  });

  it('never imports over an existing file', () => {
    const { service, file } = richProject();
    const document = service.exportProject({});
    service.closeProject({});
    const before = readFileSync(file);
    expect(failure(() => new ProjectService().importProject({ file, document })).code).toBe('file-exists');
    expect(readFileSync(file).equals(before)).toBe(true);
  });

  it('refuses a document with a field wrong, naming the field, and creates no file', () => {
    const { service, folder } = richProject();
    const document = JSON.parse(JSON.stringify(service.exportProject({})));
    document.versions[2].parent = 99;
    const target = join(folder, 'never.loftpoint');
    const error = failure(() => new ProjectService().importProject({ file: target, document }));
    expect(error.code).toBe('bad-request');
    expect(error.field).toBe('versions[2].parent');
    expect(existsSync(target)).toBe(false);
    service.closeProject({});
  });

  it('refuses a document whose concept fails the schema, naming the version, and creates no file', () => {
    const { service, folder } = richProject();
    const document = JSON.parse(JSON.stringify(service.exportProject({})));
    document.versions[1].conceptText = '{"format": "loftpoint-concept/1"}';
    const target = join(folder, 'never.loftpoint');
    const error = failure(() => new ProjectService().importProject({ file: target, document }));
    expect(error.code).toBe('invalid-concept');
    expect(error.message).toContain('versions[1]');
    expect(existsSync(target)).toBe(false);
    service.closeProject({});
  });

  it('refuses a document of another format', () => {
    const { service, folder } = serviceWithProject();
    const error = failure(() => service.importProject({ file: join(folder, 'x.loftpoint'), document: { format: 'something-else/1' } }));
    expect(error).toMatchObject({ code: 'bad-request', field: 'format' });
    service.closeProject({});
  });
});

describe('exportVersion and importVersion', () => {
  it('carries one version into another project with its concept text, note, author and time intact', () => {
    const { service } = richProject();
    const document = JSON.parse(JSON.stringify(service.exportVersion({ version: 5 })));
    const original = service.getVersion({ version: 5 });
    service.closeProject({});
    const other = serviceWithProject({ demo: true }).service;
    const { version } = other.importVersion({ document });
    const copy = other.getVersion({ version: version.number });
    expect(copy.conceptText).toBe(original.conceptText);
    expect(copy.note).toBe(original.note);
    expect([copy.author, copy.createdAt, copy.parent, copy.tags]).toEqual([original.author, original.createdAt, null, original.tags]);
    other.closeProject({});
  });

  it('makes a new one-version project from a version export', () => {
    const { service, folder } = richProject();
    const document = service.exportVersion({ version: 5 });
    const target = join(folder, 'single.loftpoint');
    const single = new ProjectService();
    expect(single.importProject({ file: target, document }).versionCount).toBe(1);
    expect(single.getVersion({ version: 1 }).conceptText).toBe(service.getVersion({ version: 5 }).conceptText);
    single.closeProject({});
    service.closeProject({});
  });
});

describe('backupProject', () => {
  it('writes a sound, complete copy with SQLite online backup, and never overwrites', async () => {
    const { service, folder } = richProject();
    const target = join(folder, 'backup.loftpoint');
    const result = await service.backupProject({ file: target });
    expect(result.bytes).toBeGreaterThan(0);
    const db = new Database(target, { readonly: true });
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    db.close();
    const copy = new ProjectService();
    copy.openProject({ file: target });
    expect(copy.exportProject({}).versions).toEqual(service.exportProject({}).versions);
    copy.closeProject({});

    writeFileSync(join(folder, 'taken.loftpoint'), 'keep');
    await expect(service.backupProject({ file: join(folder, 'taken.loftpoint') })).rejects.toThrow(/already exists/);
    expect(readFileSync(join(folder, 'taken.loftpoint'), 'utf8')).toBe('keep');
    service.closeProject({});
  });
});
