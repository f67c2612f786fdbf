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
