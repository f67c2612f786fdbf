// @ts-nocheck
import { describe, expect, it } from 'vitest';
import type { Propulsion } from '../../../core/model';
import { availableFraction, lapseAt } from '../../../core/propulsion/available-fraction';
import { isPropellerDriven, shaftPowerLoading } from '../../../core/propulsion/propeller';
import { assertInDelta, assertRelative } from '../helpers/asserts';

const piston: Propulsion = { kind: 'piston', engines: 1, lapseExponent: 1 };

describe('availableFraction', () => {
  it('includes the temperature offset in sigma: ISA+15 at sea level', () => {
    // Ideal gas at constant pressure: sigma = 288.15/303.15 = 0.950520 (common practice, core/methods.md section 1).
    const sigma = 288.15 / 303.15;
    assertInDelta(availableFraction(piston, 0, 15, 1), sigma - (1 - sigma) / 7.55, 1e-9);
  });

  it('multiplies the lapse by the power setting', () => {
    assertRelative(availableFraction(piston, 1829, 0, 0.75), 0.75 * availableFraction(piston, 1829, 0, 1), 1e-15);
  });

  it('uses the lapse exponent of turbine kinds', () => {
    const turbofan: Propulsion = { kind: 'turbofan', engines: 2, lapseExponent: 0.8 };
    assertRelative(lapseAt(turbofan, 0.4), Math.pow(0.4, 0.8), 1e-15);
  });

  it('uses the standard-day density of the critical altitude for a turbocharged piston', () => {
    const turbo: Propulsion = { kind: 'turbocharged-piston', engines: 1, lapseExponent: 1, criticalAltitudeM: 4000 };
    expect(availableFraction(turbo, 3999, 0, 1)).toBe(1);
    // At 3500 m ISA+30 sigma is about 0.633, below the standard sigma 0.669 of 4000 m (USSA 1976, from memory): the hot day lapses.
    expect(availableFraction(turbo, 3500, 30, 1)).toBeLessThan(1);
    // At 3000 m ISA+25 sigma is about 0.679, still above it: full power.
    expect(availableFraction(turbo, 3000, 25, 1)).toBe(1);
  });
});

describe('propeller conversion', () => {
  it('gives P/W = (T/W) V / eta', () => {
    // Thrust power T V over propeller efficiency (Anderson, Introduction to Flight): 0.1 x 60 / 0.8 = 7.5 W/N.
    assertInDelta(shaftPowerLoading(0.1, 60, 0.8), 7.5, 1e-12);
  });

  it('applies to every kind but the turbofan', () => {
    expect(isPropellerDriven('turbofan')).toBe(false);
    for (const kind of ['piston', 'turbocharged-piston', 'turboprop', 'electric'] as const) expect(isPropellerDriven(kind)).toBe(true);
  });
});
