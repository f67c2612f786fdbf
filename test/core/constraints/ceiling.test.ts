import { describe, expect, it } from 'vitest';
import { minimumPowerLiftCoefficient } from '../../../core/aero/lift-coefficients';
import { dragCoefficient } from '../../../core/aero/drag-polar';
import { atmosphere } from '../../../core/atmosphere';
import { flightCondition } from '../../../core/constraints';
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

  it('needs P/W = V_mp (C_D/C_L)_mp / (eta alpha) at the absolute ceiling of a propeller', () => {
    // Absolute ceiling of a propeller aircraft at minimum power required (Anderson, Introduction to Flight, from memory).
    const electric = aircraft({ kind: 'electric', aspectRatio: 8, clean });
    const requirement = ceiling(6000, { rateMps: 0 });
    const curve = curveOf(ceilingBoundary(requirement, electric));
    const c = flightCondition(requirement, electric);
    const cl = minimumPowerLiftCoefficient(c.polar);
    const v = Math.sqrt((2 * 800) / (c.densityKgM3 * cl));
    assertRelative(curve.required(800), (v * dragCoefficient(c.polar, cl)) / cl / 0.75, 1e-12);
  });

  it('is the 100 ft/min climb at the ceiling altitude at the best-rate speed', () => {
    // Service ceiling: 100 ft/min residual climb (Anderson; Raymer; core/methods.md section 6.3).
    const ac = aircraft({ kind: 'turboprop', engines: 2 });
    const atCeiling = curveOf(ceilingBoundary(ceiling(7000), ac));
    const asClimb = curveOf(climbRateBoundary(climbRate(100 * FOOT_PER_MINUTE_MPS, { altitudeM: 7000 }), ac));
    for (const w of [800, 1600, 2400]) expect(atCeiling.required(w)).toBe(asClimb.required(w));
  });

  it('cannot be met where a piston engine has no power left', () => {
    // Gagg-Ferrar reaches zero at sigma = 0.117, about 20 km.
    const curve = curveOf(ceilingBoundary(ceiling(21000), aircraft()));
    expect(curve.required(700)).toBeNaN();
  });
});
