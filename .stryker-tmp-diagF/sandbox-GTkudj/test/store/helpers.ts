/** Shared helpers for store and service tests: a fresh folder per test, file fingerprints, child processes. */
// @ts-nocheck

import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach } from 'vitest';

const folders: string[] = [];

/** A new empty temporary folder, removed after the test. */
export function freshFolder(): string {
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-store-'));
  folders.push(folder);
  return folder;
}

afterEach(() => {
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

/** SHA-256 of a file's bytes, or 'absent'. */
export function fingerprint(file: string): string {
  return existsSync(file) ? createHash('sha256').update(readFileSync(file)).digest('hex') : 'absent';
}

export const REPO_ROOT = new URL('../..', import.meta.url).pathname;
