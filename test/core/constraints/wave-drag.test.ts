/**
 * Wave drag in the flight condition and the master equation, worked by hand
 * at 11,000 m ISA for a swept wing: t/c 0.12, quarter-chord sweep 25 deg,
 * Korn factor 0.95 (supercritical sections, from memory).
 *
 * Korn equation with simple sweep theory (Korn; Mason's configuration-aerodynamics
 * notes, from memory): M_dd = kappa/cos L - (t/c)/cos^2 L - C_L/(10 cos^3 L);
 * M_crit = M_dd - (0.1/80)^(1/3); Lock's fourth-power law: Delta C_D = 20 (M - M_crit)^4 above M_crit.
 *
 * Air at 11,000 m (U.S. Standard Atmosphere 1976, table values from memory): T = 216.65 K,
 * rho = 0.36392 kg/m^3, sigma = 0.29708, a = sqrt(1.4 x 287.053 x 216.65) = 295.07 m/s.
 * At M 0.84: V = 247.858 m/s, q = 0.5 x 0.36392 x 247.858^2 = 11178.5 Pa.
 */
import { describe, expect, it } from 'vitest';
import { flightCondition, thrustLoadingRequired } from '../../../core/constraints';
import { aircraft, cruise } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

const plain = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 9, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 } });
const swept = { ...plain, compressibility: { thicknessRatio: 0.12, quarterChordSweepRad: (25 * Math.PI) / 180, kornFactor: 0.95 } };
const speed = 0.84 * 295.07;

describe('the flight condition wave-drag increment', () => {
  it('is 20 (M - M_crit)^4 at the flight Mach number V/a: 0.0022236 at M 0.84, C_L 0.42492', () => {
    // cos 25 deg = 0.906308; M_dd = 0.95/0.906308 - 0.12/0.821394 - 0.42492/7.44434 = 1.048209 - 0.146093 - 0.057079
    // = 0.845037; M_crit = 0.845037 - 0.107722 = 0.737315; 20 x (0.84 - 0.737315)^4 = 20 x 1.11182e-4 = 0.0022236.
    const c = flightCondition(cruise(speed, { altitudeM: 11000 }), swept);
    // a to 5 figures moves M by 2e-5 and the fourth power by under 1e-3.
    assertRelative(c.waveDragAt(0.42492, speed), 0.0022236, 1e-3);
  });

  it('is zero below the critical Mach number and without the wing data', () => {
    // At M 0.70 and C_L 0.42492, M_crit = 0.737315 (above): no wave drag.
    expect(flightCondition(cruise(0.7 * 295.07, { altitudeM: 11000 }), swept).waveDragAt(0.42492, 0.7 * 295.07)).toBe(0);
    expect(flightCondition(cruise(speed, { altitudeM: 11000 }), plain).waveDragAt(0.42492, speed)).toBe(0);
  });
});

describe('the master equation with wave drag', () => {
  it('adds q Delta C_D/(alpha w) to T_SL/W_TO: 0.016735 at M 0.84, w 5000 Pa, beta 0.95, 11,000 m', () => {
    // Mattingly's master equation with C_D0 + Delta C_D: the increment adds (beta/alpha) q Delta C_D/(beta w).
    // C_L = beta w/q = 4750/11178.5 = 0.42492 (the case above); alpha = sigma^1 = 0.29708 for a turbofan's density lapse;
    // 11178.5 x 0.0022236 / (0.29708 x 5000) = 0.016735.
    const requirement = cruise(speed, { altitudeM: 11000, massFraction: 0.95 });
    const withWave = thrustLoadingRequired(flightCondition(requirement, swept), 5000, speed, 1, 0);
    const without = thrustLoadingRequired(flightCondition(requirement, plain), 5000, speed, 1, 0);
    assertRelative(withWave - without, 0.016735, 2e-3);
    expect(withWave).toBeGreaterThan(without);
  });
});
