/**
 * One-shot reads of a project file for other verbs (`loftpoint evaluate FILE
 * --version N`): open read-only, read, close. The file is never migrated or
 * written by these.
 */
// @ts-nocheck

import { closeSync, openSync, readSync, statSync } from 'node:fs';
import type { VersionDetail } from './contract';
import { ProjectService } from './service';
import { APPLICATION_ID } from '../store/schema';

/** The stored version `number` of the project `file`, exactly as saved. Throws ServiceFailure or StoreError. */
export function getStoredVersion(file: string, number: number): VersionDetail {
  const service = new ProjectService();
  try {
    service.openProject({ file, readonly: true });
    return service.getVersion({ version: number });
  } finally {
    service.closeProject({});
  }
}

function header(file: string): Buffer | null {
  try {
    if (!statSync(file).isFile()) return null;
    const bytes = Buffer.alloc(72);
    const fd = openSync(file, 'r');
    try {
      return bytes.subarray(0, readSync(fd, bytes, 0, 72, 0));
    } finally {
      closeSync(fd);
    }
  } catch {
    return null;
  }
}

/** True when `file` is a SQLite database of any program (opening one that is not ours gives 'not-a-project'). */
export function isSqliteFile(file: string): boolean {
  const bytes = header(file);
  return bytes !== null && bytes.length >= 16 && bytes.subarray(0, 16).toString('latin1') === 'SQLite format 3\0';
}

/** True when `file` starts like a Loftpoint project (SQLite header with our application id). */
export function isProjectFile(file: string): boolean {
  const bytes = header(file);
  return isSqliteFile(file) && bytes !== null && bytes.length >= 72 && bytes.readUInt32BE(68) === APPLICATION_ID;
}
