// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { atmosphere } from '../../../core/atmosphere';
import { electricLapse, pistonLapse, turbochargedPistonLapse, turbofanLapse, turbopropLapse } from '../../../core/propulsion/lapse';
import { FOOT_M } from '../../../core/units/factors';
import { assertInDelta } from '../helpers/asserts';

describe('pistonLapse (Gagg-Ferrar)', () => {
  it('is 1 at sea level and zero at sigma = 1/8.55', () => {
    // sigma - (1 - sigma)/7.55 (Gagg and Ferrar, NACA 1934, via Gudmundsson, from memory).
    expect(pistonLapse(1)).toBe(1);
    assertInDelta(pistonLapse(1 / 8.55), 0, 1e-15);
  });

  it('matches the rounded printed form 1.132 sigma - 0.132 to 5e-4', () => {
    // Both forms as core/methods.md section 5 quotes them (Gudmundsson, from memory).
    for (let sigma = 0.3; sigma <= 1; sigma += 0.05) assertInDelta(pistonLapse(sigma), 1.132 * sigma - 0.132, 5e-4);
  });

  it('gives 0.704 of rated power at 10 000 ft standard', () => {
    // sigma at 10 000 ft = 0.7385 (U.S. Standard Atmosphere 1976 table, from memory); 1.132 x 0.7385 - 0.132 = 0.7040.
    const sigma = atmosphere(10000 * FOOT_M).sigma;
    assertInDelta(sigma, 0.7385, 2e-4);
    assertInDelta(pistonLapse(sigma), 0.704, 1e-3);
  });
});

describe('turbochargedPistonLapse', () => {
  const critical = atmosphere(3000).sigma;

  it('holds rated power down to the critical density, including a hot day below it', () => {
    // Common practice (core/methods.md section 5).
    expect(turbochargedPistonLapse(atmosphere(2000).sigma, critical)).toBe(1);
    expect(turbochargedPistonLapse(atmosphere(0, 30).sigma, critical)).toBe(1);
  });

  it('follows Gagg-Ferrar of sigma/sigma_crit above the critical altitude', () => {
    const sigma = atmosphere(5000).sigma;
    assertInDelta(turbochargedPistonLapse(sigma, critical), pistonLapse(sigma / critical), 1e-15);
    expect(turbochargedPistonLapse(sigma, critical)).toBeLessThan(1);
  });
});

describe('turbine and electric lapse', () => {
  it('gives turbofan thrust proportional to density at the tropopause', () => {
    // sigma at 11 000 m = 0.2971 (U.S. Standard Atmosphere 1976 table, from memory); thrust ~ rho (Anderson, from memory).
    assertInDelta(turbofanLapse(atmosphere(11000).sigma, 1), 0.2971, 2e-4);
  });

  it('gives turboprop power as sigma^0.75', () => {
    // Common practice, m 0.7-0.9 (core/methods.md section 5): 0.5^0.75 = 0.59460.
    assertInDelta(turbopropLapse(0.5, 0.75), 0.5946, 1e-4);
  });

  it('keeps electric power at altitude', () => {
    expect(electricLapse()).toBe(1);
  });
});
