/**
 * Float comparisons for reference tests, in the manner of d3's assertInDelta.
 */
// @ts-nocheck

import { expect } from 'vitest';

/** |actual - expected| <= delta (absolute). */
export function assertInDelta(actual: number, expected: number, delta = 1e-6, what = 'value'): void {
  const ok = Math.abs(actual - expected) <= delta;
  expect(ok, `${what}: expected ${expected} +/- ${delta}, got ${actual}`).toBe(true);
}

/** |actual/expected - 1| <= relative. */
export function assertRelative(actual: number, expected: number, relative = 1e-9, what = 'value'): void {
  const ok = Math.abs(actual - expected) <= relative * Math.abs(expected);
  expect(ok, `${what}: expected ${expected} within ${relative * 100} %, got ${actual}`).toBe(true);
}

/** Every number anywhere in a JSON-like value, with its path. */
export function numbersIn(value: unknown, path = '$', out: Array<[string, number]> = []): Array<[string, number]> {
  if (typeof value === 'number') out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbersIn(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) numbersIn(v, `${path}.${k}`, out);
  }
  return out;
}
