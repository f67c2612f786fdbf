/**
 * Unsaved drafts of browser mode, kept per project file in the user's data
 * folder (drafts/<hash of the project's path>.json), so a restarted
 * `loftpoint serve` (a new port, so a new browser origin with empty storage)
 * still offers them. The page sends its drafts for the open project after
 * each edit and asks for them when it starts. Written to a temporary file and
 * renamed, so a crash never leaves half a file.
 */
// @ts-nocheck

import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const DRAFTS_FORMAT = 'loftpoint-drafts/1';

export interface DraftStore {
  /** The drafts kept for the open project: concept name -> { document, parent }. */
  load(): Record<string, unknown>;
  /** Replaces them (an empty record removes the file). */
  save(drafts: Record<string, unknown>): void;
}

export function draftFile(dataFolder: string, projectFile: string): string {
  const hash = createHash('sha256').update(resolve(projectFile)).digest('hex').slice(0, 32);
  return join(dataFolder, 'drafts', `${hash}.json`);
}

export function fileDraftStore(dataFolder: string, projectFile: string): DraftStore {
  const file = draftFile(dataFolder, projectFile);
  const project = resolve(projectFile);
  return {
    load() {
      try {
        const kept = JSON.parse(readFileSync(file, 'utf8')) as { format?: unknown; project?: unknown; drafts?: unknown };
        if (kept.format !== DRAFTS_FORMAT || kept.project !== project || !kept.drafts || typeof kept.drafts !== 'object' || Array.isArray(kept.drafts)) return {};
        return kept.drafts as Record<string, unknown>;
      } catch {
        return {};
      }
    },
    save(drafts) {
      if (Object.keys(drafts).length === 0) {
        rmSync(file, { force: true });
        return;
      }
      mkdirSync(join(dataFolder, 'drafts'), { recursive: true });
      const temporary = `${file}.${process.pid}.tmp`;
      try {
        writeFileSync(temporary, JSON.stringify({ format: DRAFTS_FORMAT, project, drafts }), { flag: 'w' });
        renameSync(temporary, file);
      } catch (error) {
        rmSync(temporary, { force: true });
        throw error;
      }
    },
  };
}
