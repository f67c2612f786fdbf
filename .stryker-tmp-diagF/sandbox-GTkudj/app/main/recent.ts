/**
 * Recent projects: the last few project files opened, newest first, kept
 * in a small JSON file in the user's data folder. A list that cannot be read
 * is treated as empty; files that no longer exist are left out.
 */
// @ts-nocheck

import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';

export const RECENT_LIMIT = 8;

export function readRecent(listFile: string, exists: (file: string) => boolean = existsSync): string[] {
  try {
    const parsed: unknown = JSON.parse(readFileSync(listFile, 'utf8'));
    const files = Array.isArray(parsed) ? parsed.filter((entry): entry is string => typeof entry === 'string' && entry.length > 0) : [];
    return [...new Set(files)].filter((file) => exists(file)).slice(0, RECENT_LIMIT);
  } catch {
    return [];
  }
}

/** The list with `file` moved to the front. */
export function withRecent(list: readonly string[], file: string): string[] {
  const full = resolve(file);
  return [full, ...list.filter((entry) => entry !== full)].slice(0, RECENT_LIMIT);
}

export function writeRecent(listFile: string, list: readonly string[]): void {
  try {
    mkdirSync(dirname(listFile), { recursive: true });
    writeFileSync(listFile, `${JSON.stringify(list, null, 2)}\n`, 'utf8');
  } catch {
    // A list that cannot be kept only costs the menu its entries.
  }
}
