/**
 * The speeds that the wing-loading limits report (for the condition's Mach
 * number and the diagram's hover text): the stall speed of the stall limit and
 * the touchdown speed of the landing ground roll, as true airspeeds at the
 * requirement's own air and weight, and no speed at a wing loading of zero or less.
 */
import { describe, expect, it } from 'vitest';
import { landingGroundRollBoundary } from '../../../core/constraints/landing-ground-roll';
import { stallBoundary } from '../../../core/constraints/stall';
import { aircraft, landingRoll, stall } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

// rho(1500 m) = 1.225 (278.4/288.15)^4.25588 = 1.05807 kg/m^3 (standard troposphere, U.S. Standard
// Atmosphere 1976; its table gives 1.0581 at 1500 m, from memory).

const ac = aircraft({ increments: { landing: { cd0Increment: 0.06, clMax: 2.0 } } });

describe('the stall limit reports the stall speed', () => {
  it('as TAS at the requirement air and weight: V_s = sqrt(2 beta w/(rho C_Lmax)), 31.949 m/s worked by hand', () => {
    // V_s = sqrt(2 W/(rho S C_Lmax)) (Anderson, Introduction to Flight, stalling speed), W/S = beta w:
    // w 1200 Pa, beta 0.9, C_Lmax 2.0 at 1500 m: sqrt(2160/(1.05807 x 2.0)) = 31.949 m/s.
    const boundary = stallBoundary(stall(28, { altitudeM: 1500, massFraction: 0.9 }), ac);
    assertRelative(boundary.speedAt?.(1200) ?? NaN, 31.949, 1e-4);
    // Four times the wing loading, twice the speed.
    assertRelative(boundary.speedAt?.(4800) ?? NaN, 2 * 31.949, 1e-4);
  });

  it('has no speed at a wing loading of zero or less', () => {
    const boundary = stallBoundary(stall(28), ac);
    expect(boundary.speedAt?.(0)).toBeNaN();
    expect(boundary.speedAt?.(-500)).toBeNaN();
  });
});

describe('the landing ground-roll limit reports the touchdown speed', () => {
  it('as k_TD V_s at the requirement air and weight: 41.078 m/s for w 1500 Pa, beta 0.9, C_Lmax 2.0, 1500 m', () => {
    // V_TD = 1.15 V_s (Raymer ch. 17, from memory): 1.15 sqrt(2 x 0.9 x 1500/(1.05807 x 2.0)) = 41.078 m/s.
    const boundary = landingGroundRollBoundary(landingRoll(500, { altitudeM: 1500, massFraction: 0.9 }), ac);
    assertRelative(boundary.speedAt?.(1500) ?? NaN, 41.078, 1e-4);
    const faster = landingGroundRollBoundary(landingRoll(500, { altitudeM: 1500, massFraction: 0.9, touchdownSpeedFactor: 1.3 }), ac);
    assertRelative(faster.speedAt?.(1500) ?? NaN, (41.078 * 1.3) / 1.15, 1e-4);
  });

  it('has no speed at a wing loading of zero or less', () => {
    const boundary = landingGroundRollBoundary(landingRoll(500), ac);
    expect(boundary.speedAt?.(0)).toBeNaN();
    expect(boundary.speedAt?.(-500)).toBeNaN();
  });
});
