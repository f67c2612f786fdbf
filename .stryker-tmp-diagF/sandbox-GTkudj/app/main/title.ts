/**
 * The window title: the project's name, an unsaved mark while the concept in
 * view has changes not saved as a version, and the product's name.
 */
// @ts-nocheck

import { basename, extname } from 'node:path';

export const UNSAVED_MARK = '•';

export function windowTitle(projectFile: string | null, dirty: boolean): string {
  if (!projectFile) return 'Loftpoint';
  const name = basename(projectFile, extname(projectFile));
  return `${dirty ? `${UNSAVED_MARK} ` : ''}${name} — Loftpoint`;
}
