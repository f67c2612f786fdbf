import { describe, expect, it } from 'vitest';
import { takeoffGroundRollBoundary } from '../../../core/constraints/takeoff-ground-roll';
import { G0 } from '../../../core/units/factors';
import { aircraft, takeoffRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

/** A twin jet at sea level ISA, where sigma^1 lapse is 1. */
function jet(cd0Increment: number, clMax: number) {
  return aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 7.5, increments: { takeoff: { cd0Increment, oswaldEfficiency: 0.76, clMax } } });
}

/**
 * Raymer's closed-form constant-thrust ground roll (Aircraft Design, 4th ed., eq. 17.102, from memory):
 * S_G = ln[(K_T + K_A V_LOF^2)/K_T]/(2 g0 K_A), K_T = T/W - mu, K_A = rho(mu C_L,g - C_D,g)/(2w).
 */
function raymerGroundRoll(thrustToWeight: number, w: number, rho: number, mu: number, clg: number, cdg: number, liftoffSpeed: number): number {
  const kT = thrustToWeight - mu;
  const kA = (rho * (mu * clg - cdg)) / (2 * w);
  return Math.log((kT + kA * liftoffSpeed * liftoffSpeed) / kT) / (2 * G0 * kA);
}

describe('takeoffGroundRollBoundary', () => {
  it('is linear in wing loading for a jet', () => {
    // qbar/w is constant, so T/W = A + B w (core/methods.md section 6, take-off notes).
    const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(900), jet(0.02, 1.9)));
    const [a, b, c] = [1500, 3000, 4500].map(curve.required);
    assertRelative(b - a, c - b, 1e-12);
    expect(c).toBeGreaterThan(a);
  });

  // Typical jet take-off cases (core/methods.md section 9 ranges); the mean-acceleration form at 0.7 V_LOF
  // is within about 1 % of Raymer's closed form (core/methods.md section 6; ref.py): checked here to 2 %.
  const cases: Array<{ dcd0: number; clMax: number; mu: number; distance: number; w: number }> = [
    { dcd0: 0.015, clMax: 1.8, mu: 0.04, distance: 600, w: 1500 },
    { dcd0: 0.015, clMax: 1.8, mu: 0.04, distance: 600, w: 5000 },
    { dcd0: 0.03, clMax: 2.0, mu: 0.02, distance: 1200, w: 3000 },
    { dcd0: 0.035, clMax: 1.85, mu: 0.03, distance: 900, w: 3000 },
    { dcd0: 0.02, clMax: 1.6, mu: 0.1, distance: 400, w: 1500 },
  ];
  for (const t of cases) {
    it(`rolls ${t.distance} m by Raymer's closed form within 2 % (mu ${t.mu}, C_Lmax ${t.clMax}, w ${t.w})`, () => {
      const ac = jet(t.dcd0, t.clMax);
      const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(t.distance, { rollingFriction: t.mu }), ac));
      const tw = curve.required(t.w);
      const k = 1 / (Math.PI * 0.76 * 7.5);
      const cdg = ac.configurations.takeoff.cd0 + k * 0.25;
      const liftoff = 1.1 * Math.sqrt((2 * t.w) / (1.225 * t.clMax));
      assertRelative(curve.speedAt(t.w), liftoff, 1e-4);
      assertRelative(raymerGroundRoll(tw, t.w, 1.225, t.mu, 0.5, cdg, liftoff), t.distance, 0.02);
    });
  }

  it('multiplies a propeller boundary by 0.7 V_LOF / eta', () => {
    // core/methods.md section 6: prop x 0.7 V_LOF / eta_TO; at sea level ISA both lapses are 1.
    const increments = { takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.8 } };
    const thrust = curveOf(takeoffGroundRollBoundary(takeoffRoll(300), aircraft({ kind: 'turbofan', increments })));
    const power = curveOf(takeoffGroundRollBoundary(takeoffRoll(300), aircraft({ kind: 'electric', increments })));
    const w = 700;
    const liftoff = thrust.speedAt(w);
    assertRelative(power.required(w), (thrust.required(w) * 0.7 * liftoff) / 0.55, 1e-12);
  });

  it('needs more on a higher or hotter strip', () => {
    const ac = aircraft();
    const at = (altitudeM: number, temperatureOffsetK: number) =>
      curveOf(takeoffGroundRollBoundary(takeoffRoll(300, { altitudeM, temperatureOffsetK }), ac)).required(700);
    expect(at(1500, 0)).toBeGreaterThan(at(0, 0));
    expect(at(0, 25)).toBeGreaterThan(at(0, 0));
  });

  it('cannot be met with no power left (NaN)', () => {
    const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(300, { powerSetting: 0 }), aircraft()));
    expect(curve.required(700)).toBeNaN();
  });
});
