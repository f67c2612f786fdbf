/**
 * Backing up an open project with SQLite's online backup (safe while the file
 * is in use), into a temporary file beside the destination that is then
 * linked into place: an existing file is never overwritten.
 */
// @ts-nocheck

import { existsSync, statSync, unlinkSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { StoreError, placeNewFile, type ProjectStore } from '../store';
import type { BackupProjectResponse } from './contract';
import { ServiceFailure } from './failure';

export async function backupTo(store: ProjectStore, path: string): Promise<BackupProjectResponse> {
  const destination = resolve(path);
  if (existsSync(destination)) {
    throw new ServiceFailure('file-exists', `${destination}: already exists; choose a new file name (an existing file is never overwritten)`, {
      file: destination,
    });
  }
  const temp = join(dirname(destination), `.${basename(destination)}.${process.pid}.${Date.now().toString(36)}.backup`);
  try {
    await store.backup(temp);
    placeNewFile(temp, destination);
  } catch (error) {
    if (error instanceof StoreError && error.file === temp) {
      throw new StoreError(error.code, error.message.replace(temp, destination), destination);
    }
    throw error;
  } finally {
    for (const leftover of [temp, `${temp}-wal`, `${temp}-shm`, `${temp}-journal`]) if (existsSync(leftover)) unlinkSync(leftover);
  }
  return { file: destination, bytes: statSync(destination).size };
}
