/**
 * One file per kind, named after it, and one registry line each: the
 * registries list exactly the descriptor files beside them, in the order the
 * concept format's error messages have always used (DESIGN.md, "The concept
 * file").
 */
// @ts-nocheck

import { readdirSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PROPULSION_DESCRIPTORS } from '../../../core/propulsion/kinds';
import { REQUIREMENT_DESCRIPTORS } from '../../../core/requirements';

const kindFiles = (folder: string, shared: string[]) =>
  readdirSync(resolve(__dirname, '../../../core', folder))
    .filter((f) => f.endsWith('.ts') && !shared.includes(f))
    .map((f) => f.slice(0, -3))
    .sort();

describe('kind registries', () => {
  it('has a requirement descriptor file named after each kind, and no other', () => {
    expect(kindFiles('requirements', ['index.ts', 'descriptor.ts', 'common.ts', 'fields.ts'])).toEqual(REQUIREMENT_DESCRIPTORS.map((d) => d.kind).sort());
  });

  it('has a propulsion descriptor file named after each kind, and no other', () => {
    expect(kindFiles('propulsion/kinds', ['index.ts', 'descriptor.ts'])).toEqual(PROPULSION_DESCRIPTORS.map((d) => d.kind).sort());
  });

  it('keeps the order of the concept format (new kinds come after these)', () => {
    expect(REQUIREMENT_DESCRIPTORS.map((d) => d.kind).slice(0, 8)).toEqual([
      'stall',
      'landing-ground-roll',
      'takeoff-ground-roll',
      'cruise',
      'climb-rate',
      'climb-gradient',
      'ceiling',
      'sustained-turn',
    ]);
    expect(PROPULSION_DESCRIPTORS.map((d) => d.kind).slice(0, 5)).toEqual(['piston', 'turbocharged-piston', 'turboprop', 'turbofan', 'electric']);
  });

  it('gives every requirement kind its own colour and title', () => {
    const colours = REQUIREMENT_DESCRIPTORS.map((d) => d.colour);
    expect(new Set(colours).size).toBe(colours.length);
    for (const c of colours) expect(c).toMatch(/^#[0-9a-f]{6}$/);
  });

  it('draws propeller efficiency only where power meets the air (curves), as the master equation does', () => {
    // A limit (stall, landing roll) uses neither the polar's drag nor the propulsion (core/methods.md section 6).
    for (const d of REQUIREMENT_DESCRIPTORS) expect(d.propeller === null, d.kind).toBe(d.drawnAs === 'limit');
  });
});
