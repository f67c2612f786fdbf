/** ['requirements', 1, 'speed'] -> 'requirements[1].speed', the way concept issues and warnings name fields. */
// @ts-nocheck

import type { PathKey } from './edit';

export function pathText(path: readonly PathKey[]): string {
  let text = '';
  for (const key of path) text += typeof key === 'number' ? `[${key}]` : text === '' ? key : `.${key}`;
  return text;
}

/** A name safe for data-testid and element ids: 'requirements-1-speed'. */
export function pathId(path: readonly PathKey[]): string {
  return path.map((key) => String(key).replace(/[^A-Za-z0-9_-]/g, '_')).join('-');
}
