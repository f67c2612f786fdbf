// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { atmosphere } from '../../../core/atmosphere';
import { landingGroundRollBoundary, touchdownSpeedForRoll } from '../../../core/constraints/landing-ground-roll';
import { G0 } from '../../../core/units/factors';
import { aircraft, landingRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { limitOf } from './curve';

describe('touchdownSpeedForRoll', () => {
  it('stops in the distance at constant deceleration: S = V^2 / (2 mu_B g0)', () => {
    // Uniform deceleration kinematics: 2 x 0.3 x 9.80665 x 500 = 2941.995 -> V_TD = 54.240 m/s.
    assertRelative(touchdownSpeedForRoll(500, 0.3, 0), Math.sqrt(2941.995), 1e-12);
  });

  it('accounts for a free roll: S = V t_fr + V^2 / (2a)', () => {
    // Kinematics: free roll at V_TD for t_fr, then braking at a = mu_B g0.
    const v = touchdownSpeedForRoll(500, 0.3, 2);
    assertRelative(v * 2 + (v * v) / (2 * 0.3 * G0), 500, 1e-12);
  });
});

describe('landingGroundRollBoundary', () => {
  it('gives the wing loading whose 1.15 V_s touchdown stops in the distance', () => {
    // k_TD 1.15 (Raymer, from memory), mu_B 0.3 (Raymer Table 17.1, from memory), kinematics as above.
    const requirement = landingRoll(450, { altitudeM: 600, temperatureOffsetK: 10 });
    const w = limitOf(landingGroundRollBoundary(requirement, aircraft()));
    const rho = atmosphere(600, 10).densityKgM3;
    const stallSpeed = Math.sqrt((2 * w) / (rho * 2.1));
    const touchdown = 1.15 * stallSpeed;
    assertRelative((touchdown * touchdown) / (2 * 0.3 * G0), 450, 1e-12);
  });

  it('falls on a higher, hotter strip and with landing weight above take-off fraction', () => {
    const base = limitOf(landingGroundRollBoundary(landingRoll(450), aircraft()));
    expect(limitOf(landingGroundRollBoundary(landingRoll(450, { altitudeM: 1500 }), aircraft()))).toBeLessThan(base);
    expect(limitOf(landingGroundRollBoundary(landingRoll(450, { temperatureOffsetK: 20 }), aircraft()))).toBeLessThan(base);
    assertRelative(limitOf(landingGroundRollBoundary(landingRoll(450, { massFraction: 0.9 }), aircraft())), base / 0.9, 1e-15);
  });
});

describe('landingGroundRollBoundary with a free roll', () => {
  it('leaves room for t_fr of free roll: V_TD t_fr + V_TD^2/(2 mu_B g0) = S at the limit', () => {
    // Kinematics: free roll at V_TD for t_fr, then braking at a = mu_B g0; V_TD = 1.15 V_s (Raymer, from memory).
    const w = limitOf(landingGroundRollBoundary(landingRoll(450, { freeRollTimeS: 3 }), aircraft()));
    const touchdown = 1.15 * Math.sqrt((2 * w) / (1.225 * 2.1));
    // rho0 = 1.2250 kg/m^3 to 5 figures (U.S. Standard Atmosphere 1976): 1e-4 on a distance.
    assertRelative(touchdown * 3 + (touchdown * touchdown) / (2 * 0.3 * G0), 450, 1e-4);
  });

  it('is 1830.4 Pa for 450 m, mu_B 0.3, 3 s free roll, C_Lmax 2.1 at sea level (worked by hand)', () => {
    // a = 2.941995 m/s^2, a t = 8.825985; V_TD = -8.825985 + sqrt(77.8980 + 2647.7955) = 43.3822 m/s;
    // V_s = 43.3822/1.15 = 37.7236 m/s; w = 0.5 x 1.225 x 2.1 x 37.7236^2 = 1830.43 Pa.
    const w = limitOf(landingGroundRollBoundary(landingRoll(450, { freeRollTimeS: 3 }), aircraft()));
    const noFreeRoll = limitOf(landingGroundRollBoundary(landingRoll(450), aircraft()));
    assertRelative(w, 1830.43, 1e-5);
    expect(w).toBeLessThan(noFreeRoll);
  });
});
