// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { characteristicSpeeds, speedForLiftCoefficient, stallSpeed } from '../../../core/aero/speeds';
import { KNOT_MPS, PSF_PA } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';

describe('stallSpeed', () => {
  it('gives 61 kt at 25.195 lb/ft^2 with C_Lmax 2.0 (worked in US customary units)', () => {
    // 61 kt CAS (14 CFR 23.49(c), pre-Amdt 23-64, confirmed) with C_Lmax 2.0, worked in US units by hand:
    // rho0 = 0.0023769 slug/ft^3 (Anderson, Introduction to Flight, App. B, standard sea level),
    // 61 kt = 102.956 ft/s, W/S = 0.5 x 0.0023769 x 102.956^2 x 2.0 = 25.195 lb/ft^2.
    assertRelative(stallSpeed(25.195 * PSF_PA, 1.225, 2.0), 61 * KNOT_MPS, 1e-4);
  });

  it('gives 40 m/s at 1470 Pa with C_Lmax 1.5 at sea level, and 40/sqrt(0.5) m/s at half the density', () => {
    // By hand: V_s = sqrt(2 x 1470 / (1.225 x 1.5)) = sqrt(1600) = 40 m/s; V scales as 1/sqrt(rho).
    assertRelative(stallSpeed(1470, 1.225, 1.5), 40, 1e-12);
    assertRelative(stallSpeed(1470, 0.6125, 1.5), 40 / Math.sqrt(0.5), 1e-12);
  });
});

describe('speedForLiftCoefficient', () => {
  it('carries the weight: 1/2 rho V^2 C_L = W/S', () => {
    // Level flight, lift = weight (Anderson, Introduction to Flight).
    const v = speedForLiftCoefficient(1800, 0.9, 0.6);
    assertRelative(0.5 * 0.9 * v * v * 0.6, 1800, 1e-12);
  });
});

describe('characteristicSpeeds', () => {
  it('orders stall < minimum power < minimum drag for a typical light aircraft', () => {
    // C_L,md < C_L,mp < C_Lmax for C_D0 0.03, e 0.8, AR 7.5, C_Lmax 1.5 (common practice).
    const s = characteristicSpeeds({ cd0: 0.03, k1: 0, k: 1 / (Math.PI * 0.8 * 7.5), clMax: 1.5 }, 700, 1.225);
    expect(s.stall).toBeLessThan(s.minimumPower);
    expect(s.minimumPower).toBeLessThan(s.minimumDrag);
  });
});
