// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { stallBoundary } from '../../../core/constraints/stall';
import { KNOT_MPS, PSF_PA } from '../../../core/units/factors';
import { aircraft, stall } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { limitOf } from './curve';

const twoPointOh = aircraft({ increments: { landing: { cd0Increment: 0.06, clMax: 2.0 } } });

describe('stallBoundary', () => {
  it('caps wing loading at 1/2 rho0 V^2 C_Lmax: 1206.35 Pa for 61 kt and C_Lmax 2.0', () => {
    // w <= 1/2 rho0 V_E^2 C_Lmax (core/methods.md section 6) with 61 kt CAS (14 CFR 23.49(c), pre-Amdt 23-64, confirmed).
    // By hand: 61 kt = 61 x 1852/3600 = 31.3811 m/s; 0.5 x 1.2250 x 31.3811^2 x 2.0 = 1206.35 Pa
    // (rho0 = 1.2250 kg/m^3, U.S. Standard Atmosphere 1976).
    assertRelative(limitOf(stallBoundary(stall(61 * KNOT_MPS), twoPointOh)), 1206.35, 1e-5);
  });

  it('agrees with the same limit worked in US customary units: 25.195 lb/ft^2', () => {
    // rho0 = 0.0023769 slug/ft^3 (Anderson, Introduction to Flight, App. B); 61 kt = 102.956 ft/s; C_Lmax 2.0.
    assertRelative(limitOf(stallBoundary(stall(61 * KNOT_MPS), twoPointOh)) / PSF_PA, 25.195, 1e-4);
  });

  it('ignores altitude and temperature, since the speed is calibrated (CAS = EAS)', () => {
    // core/methods.md section 2: stall limits use V_E = V_C at rho0.
    const atField = stall(25, { altitudeM: 1500, temperatureOffsetK: 20 });
    expect(limitOf(stallBoundary(atField, twoPointOh))).toBe(limitOf(stallBoundary(stall(25), twoPointOh)));
  });

  it('divides by the mass fraction', () => {
    assertRelative(limitOf(stallBoundary(stall(25, { massFraction: 0.8 }), twoPointOh)), limitOf(stallBoundary(stall(25), twoPointOh)) / 0.8, 1e-15);
  });

  it('uses the named configuration', () => {
    const clean = limitOf(stallBoundary(stall(25, { configuration: 'clean' }), twoPointOh));
    // By hand: 0.5 x 1.2250 x 25^2 x 1.5 = 574.22 Pa (clean C_Lmax 1.5; rho0 to 5 figures).
    assertRelative(clean, 574.22, 1e-5);
  });
});
