// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { atmosphere } from '../../../core/atmosphere';
import { ceilingBoundary } from '../../../core/constraints/ceiling';
import { climbRateBoundary } from '../../../core/constraints/climb-rate';
import { FOOT_PER_MINUTE_MPS } from '../../../core/units/factors';
import { aircraft, ceiling, climbRate } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

// C_Lmax 3 keeps the 1.2 V_s floor inactive.
const clean = { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 3 };

describe('ceilingBoundary', () => {
  it('needs T_SL/W = 2 sqrt(K C_D0)/sigma at the absolute ceiling of a jet (RC = 0)', () => {
    // Absolute ceiling: thrust available equals minimum thrust required, W/(L/D)max (Anderson, Introduction to Flight, from memory).
    const jet = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, clean });
    const curve = curveOf(ceilingBoundary(ceiling(12000, { rateMps: 0 }), jet));
    const k = 1 / (Math.PI * 0.8 * 8);
    assertRelative(curve.required(4000), (2 * Math.sqrt(k * 0.02)) / atmosphere(12000).sigma, 1e-9);
  });

  it('needs P/W = V_mp (C_D/C_L)_mp / eta at the absolute ceiling of an electric aircraft (alpha = 1)', () => {
    // Absolute ceiling at minimum power required: with C_D = C_D0 + K C_L^2, C_L,mp = sqrt(3 C_D0/K) and
    // C_D,mp = 4 C_D0 (Anderson, Introduction to Flight, from memory); P/W = V C_D/C_L / eta.
    // Density at 6000 m by hand from the standard troposphere (U.S. Standard Atmosphere 1976):
    // T = 288.15 - 0.0065 x 6000 = 249.15 K, rho = 1.2250 (249.15/288.15)^4.25588 = 0.65970 kg/m^3.
    const electric = aircraft({ kind: 'electric', aspectRatio: 8, clean });
    const curve = curveOf(ceilingBoundary(ceiling(6000, { rateMps: 0 }), electric));
    const rho = 1.225 * Math.pow(249.15 / 288.15, 4.25588);
    assertRelative(rho, 0.6597, 1e-4);
    const k = 1 / (Math.PI * 0.8 * 8);
    const cl = Math.sqrt((3 * 0.02) / k);
    for (const w of [400, 800, 1600]) {
      const v = Math.sqrt((2 * w) / (rho * cl));
      assertRelative(curve.required(w), (v * 4 * 0.02) / cl / 0.75, 1e-5, `w ${w}`);
    }
  });

  it('is the 100 ft/min climb at the ceiling altitude at the best-rate speed', () => {
    // Service ceiling: 100 ft/min residual climb (Anderson; Raymer; core/methods.md section 6.3).
    const ac = aircraft({ kind: 'turboprop', engines: 2 });
    const atCeiling = curveOf(ceilingBoundary(ceiling(7000), ac));
    const asClimb = curveOf(climbRateBoundary(climbRate(100 * FOOT_PER_MINUTE_MPS, { altitudeM: 7000 }), ac));
    for (const w of [800, 1600, 2400]) expect(atCeiling.required(w)).toBe(asClimb.required(w));
  });

  it('cannot be met where a piston engine has no power left, from 16.93 km', () => {
    // Gagg-Ferrar, alpha = 1.132 sigma - 0.132 (Gudmundsson, from memory), is zero at sigma = 0.132/1.132 = 0.11661.
    // Standard stratosphere (U.S. Standard Atmosphere 1976), 11-20 km isothermal at 216.65 K:
    // sigma = 0.29708 exp(-g0 (h - 11000)/(R 216.65)), R T/g0 = 287.053 x 216.65/9.80665 = 6341.6 m, so
    // h = 11000 + 6341.6 ln(0.29708/0.11661) = 11000 + 6341.6 x 0.93517 = 16930 m.
    const at = (altitudeM: number) => curveOf(ceilingBoundary(ceiling(altitudeM), aircraft())).required(700);
    expect(at(16850)).toBeGreaterThan(0);
    expect(at(17010)).toBeNaN();
    expect(at(21000)).toBeNaN();
  });
});
