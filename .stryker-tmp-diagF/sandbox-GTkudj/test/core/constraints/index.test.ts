// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { boundaryOf } from '../../../core/constraints';
import type { Requirement } from '../../../core/model';
import { aircraft, ceiling, climbGradient, climbRate, cruise, landingRoll, stall, sustainedTurn, takeoffRoll } from '../helpers/design';

describe('boundaryOf', () => {
  const table: Array<[Requirement, 'limit' | 'curve']> = [
    [stall(25), 'limit'],
    [landingRoll(400), 'limit'],
    [takeoffRoll(300), 'curve'],
    [cruise(55), 'curve'],
    [climbRate(3.5), 'curve'],
    [climbGradient(0.083), 'curve'],
    [ceiling(4000), 'curve'],
    [sustainedTurn(50, 1.4), 'curve'],
  ];
  for (const [requirement, type] of table) {
    it(`draws a ${type} for ${requirement.kind}, with the requirement's id and kind`, () => {
      const boundary = boundaryOf(requirement, aircraft());
      expect(boundary.type).toBe(type);
      expect(boundary.id).toBe(requirement.id);
      expect(boundary.kind).toBe(requirement.kind);
      if (boundary.type === 'curve') expect(boundary.required(600)).toBeGreaterThan(0);
      else expect(boundary.wingLoadingMaxPa).toBeGreaterThan(0);
    });
  }

  it('falls back to clean for a configuration the aircraft does not define', () => {
    const missing = boundaryOf(cruise(55, { configuration: 'ferry' }), aircraft());
    const clean = boundaryOf(cruise(55), aircraft());
    if (missing.type !== 'curve' || clean.type !== 'curve') throw new Error('expected curves');
    expect(missing.required(600)).toBe(clean.required(600));
  });

  it('leaves the requirement and the aircraft untouched', () => {
    const ac = aircraft();
    const requirement = takeoffRoll(300);
    const before = JSON.stringify([ac, requirement]);
    const boundary = boundaryOf(requirement, ac);
    if (boundary.type === 'curve') boundary.required(700);
    expect(JSON.stringify([ac, requirement])).toBe(before);
  });
});
