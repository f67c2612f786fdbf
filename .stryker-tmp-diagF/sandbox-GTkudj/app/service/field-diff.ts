/**
 * Field-by-field differences between two JSON values as written: objects by
 * key, arrays by position when their lengths agree, anything else as a whole.
 */
// @ts-nocheck

import type { FieldChange } from './contract';

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function sameJson(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== typeof b || a === null || b === null || typeof a !== 'object') return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a)) {
    const other = b as unknown[];
    return a.length === other.length && a.every((item, index) => sameJson(item, other[index]));
  }
  const left = a as Record<string, unknown>;
  const right = b as Record<string, unknown>;
  const keys = new Set([...Object.keys(left), ...Object.keys(right)]);
  for (const key of keys) if (!sameJson(left[key], right[key])) return false;
  return true;
}

function join(prefix: string, key: string | number): string {
  if (typeof key === 'number') return `${prefix}[${key}]`;
  return prefix === '' ? key : `${prefix}.${key}`;
}

function change(path: string, before: unknown, after: unknown): FieldChange {
  return {
    path,
    ...(before === undefined ? {} : { before: structuredClone(before) }),
    ...(after === undefined ? {} : { after: structuredClone(after) }),
  };
}

/** Every leaf that differs between `before` and `after`, with paths under `prefix`. */
export function fieldChanges(before: unknown, after: unknown, prefix = ''): FieldChange[] {
  if (sameJson(before, after)) return [];
  if (isPlainObject(before) && isPlainObject(after)) {
    const keys = [...Object.keys(before), ...Object.keys(after).filter((key) => !(key in before))];
    return keys.flatMap((key) => fieldChanges(before[key], after[key], join(prefix, key)));
  }
  if (Array.isArray(before) && Array.isArray(after) && before.length === after.length) {
    return before.flatMap((item, index) => fieldChanges(item, after[index], join(prefix, index)));
  }
  return [change(prefix, before, after)];
}
