// @ts-nocheck
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
  // is within about 1 % of Raymer's closed form (core/methods.md section 6, take-off notes): checked here to 2 %.
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

describe('takeoffGroundRollBoundary with a linear drag term and a take-off mass fraction', () => {
  // Hand derivation of the mean-acceleration form (core/methods.md section 6) with V_s^2 = 2 beta w/(rho C_Lmax):
  //   V_LOF^2/(2 g0 S_G) = k^2 beta w/(rho C_Lmax g0 S_G),
  //   qbar/(beta w) = 0.7^2 k^2 / C_Lmax (independent of w),
  //   T_SL/W_TO = beta [k^2 beta w/(rho C_Lmax g0 S_G) + 0.49 k^2 C_D,g/C_Lmax + mu (1 - 0.49 k^2 C_L,g/C_Lmax)],
  //   C_D,g = C_D0 + K1 C_L,g + K C_L,g^2 (the polar with its linear term).
  // A turbofan at sea level ISA has alpha = sigma^1 = 1; rho0 = 1.225 kg/m^3 (U.S. Standard Atmosphere 1976).
  const k = 1.1;
  const clMax = 1.8;
  const clg = 0.5;
  const mu = 0.04;
  const cd0 = 0.03 + 0.015;
  const bigK = 1 / (Math.PI * 0.76 * 7.5);
  const byHand = (w: number, beta: number, k1: number): number => {
    const cdg = cd0 + k1 * clg + bigK * clg * clg;
    return (
      beta *
      ((k * k * beta * w) / (1.225 * clMax * G0 * 900) + (0.49 * k * k * cdg) / clMax + mu * (1 - (0.49 * k * k * clg) / clMax))
    );
  };
  const linearJet = (cdLinear: number) => aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 7.5, cdLinear });

  it('counts K1 C_L,g in the ground-run drag: 0.2016 at w 3000 Pa, beta 0.9, K1 0.02', () => {
    const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.9 }), linearJet(0.02)));
    // Worked: C_D,g = 0.045 + 0.01 + 0.25 K = 0.068961; terms 0.167872 + 0.022715 + 0.033412; x 0.9 = 0.201599.
    assertRelative(curve.required(3000), 0.201599, 1e-5);
    assertRelative(curve.required(3000), byHand(3000, 0.9, 0.02), 1e-6); // rho0 to 5 figures
  });

  it('adds exactly beta K1 C_L,g 0.49 k^2 / C_Lmax for the linear term, at every wing loading', () => {
    // The K1 term enters only through C_D,g, and qbar/(beta w) does not depend on w.
    const without = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.9 }), linearJet(0)));
    const withK1 = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.9 }), linearJet(0.02)));
    const expected = (0.9 * 0.02 * clg * 0.49 * k * k) / clMax; // 0.0029645
    for (const w of [1500, 3000, 6000]) assertRelative(withK1.required(w) - without.required(w), expected, 1e-9);
  });

  it('scales with the take-off mass fraction: beta^2 on the acceleration term, beta on the rest', () => {
    for (const beta of [1, 0.9, 0.75]) {
      const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: beta }), linearJet(0.01)));
      assertRelative(curve.required(2500), byHand(2500, beta, 0.01), 1e-6, `beta ${beta}`); // rho0 to 5 figures
    }
    const full = curveOf(takeoffGroundRollBoundary(takeoffRoll(900), linearJet(0.01))).required(2500);
    const light = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.8 }), linearJet(0.01))).required(2500);
    expect(light).toBeLessThan(0.8 * full);
  });

  it('lifts off at k_LOF times the stall speed at the take-off weight: V = 1.1 sqrt(2 beta w/(rho C_Lmax))', () => {
    const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.9 }), linearJet(0)));
    assertRelative(curve.speedAt(3000), 1.1 * Math.sqrt((2 * 0.9 * 3000) / (1.225 * 1.8)), 1e-4);
  });
});
