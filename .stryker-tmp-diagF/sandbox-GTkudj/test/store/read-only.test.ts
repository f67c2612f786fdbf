/**
 * A read-only project file opens read-only, says so, and refuses saves with a
 * message naming the file; its bytes never change.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { chmodSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { ProjectService, toServiceError } from '../../app/service';
import { bundleScript } from './fixtures/bundle';
import { fingerprint, freshFolder } from './helpers';

const restore: Array<() => void> = [];
afterEach(() => {
  for (const undo of restore.splice(0)) undo();
});

function project(folder: string): string {
  const file = join(folder, 'plans.loftpoint');
  const service = new ProjectService({ author: 'owner' });
  service.createProject({ file, name: 'Plans', demo: true });
  service.closeProject({});
  return file;
}

function trySave(service: ProjectService) {
  const text = service.getVersion({ version: 1 }).conceptText;
  try {
    service.saveVersion({ conceptText: text, note: 'edit' });
  } catch (error) {
    return toServiceError(error);
  }
  throw new Error('saved into a read-only project');
}

describe('a read-only project', () => {
  it('opens read-only when the file is marked read-only (chmod 444), reads, and refuses a save naming the file', () => {
    const file = project(freshFolder());
    chmodSync(file, 0o444);
    restore.push(() => chmodSync(file, 0o644));
    const before = fingerprint(file);
    const service = new ProjectService();
    const info = service.openProject({ file });
    expect(info.readonly).toBe(true);
    expect(service.listVersions({})).toHaveLength(4);
    const error = trySave(service);
    expect(error.code).toBe('read-only');
    expect(error.message).toContain(file);
    expect(error.message).toContain('read-only');
    service.closeProject({});
    expect(fingerprint(file)).toBe(before);
  });

  it('opens read-only in a read-only folder', () => {
    const folder = freshFolder();
    const file = project(folder);
    chmodSync(folder, 0o555);
    restore.push(() => chmodSync(folder, 0o755));
    const service = new ProjectService();
    expect(service.openProject({ file }).readonly).toBe(true);
    expect(trySave(service).code).toBe('read-only');
    service.closeProject({});
  });

  it('opens read-only on request, even when the file is writable', () => {
    const file = project(freshFolder());
    const service = new ProjectService();
    expect(service.openProject({ file, readonly: true }).readonly).toBe(true);
    expect(trySave(service).message).toContain('opened for reading only');
    service.closeProject({});
  });

  const root = typeof process.getuid === 'function' && process.getuid() === 0;
  it.runIf(root)(
    'opens read-only for a user without write permission, in a folder that user cannot write either',
    async () => {
      const folder = freshFolder();
      chmodSync(folder, 0o755);
      const file = project(folder);
      const script = await bundleScript('test/store/fixtures/read-project.ts', folder);
      writeFileSync(join(folder, 'marker'), '');
      const before = fingerprint(file);
      // uid/gid 65534: the unprivileged "nobody" account of Debian (base-passwd).
      const run = spawnSync(process.execPath, [script, file], { uid: 65534, gid: 65534, encoding: 'utf8', cwd: folder });
      expect(run.stderr).toBe('');
      const result = JSON.parse(run.stdout.trim());
      expect(result.openError).toBeUndefined();
      expect(result.readonly).toBe(true);
      expect(result.versions).toEqual([1, 2, 3, 4]);
      expect(typeof result.firstNote).toBe('string');
      expect(result.save.code).toBe('read-only');
      expect(result.save.message).toContain(file);
      expect(fingerprint(file)).toBe(before);
    },
    60_000,
  );
});
