/**
 * The edges of the boundaries: where a requirement cannot be met the engine
 * says NaN (core/methods.md section 7: "cannot be met"), never a number made
 * from a division by zero or a negative wing loading, speed or engine count.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { jetBestRateSpeed, propellerBestRateSpeed } from '../../../core/constraints/best-rate-speed';
import { climbGradientBoundary } from '../../../core/constraints/climb-gradient';
import { climbRateBoundary } from '../../../core/constraints/climb-rate';
import { engineOutFactor } from '../../../core/constraints/engine-out';
import { flightCondition, thrustLoadingRequired, type FlightCondition } from '../../../core/constraints';
import { sustainedTurnBoundary } from '../../../core/constraints/sustained-turn';
import { takeoffGroundRollBoundary } from '../../../core/constraints/takeoff-ground-roll';
import { aircraft, climbGradient, climbRate, cruise, sustainedTurn, takeoffRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

const jet = aircraft({ kind: 'turbofan', engines: 2 });

/** A condition with round numbers: q = rho V^2 / 2 = V^2 at rho = 2. */
const round: FlightCondition = {
  densityKgM3: 2,
  beta: 1,
  alpha: 1,
  alphaAt: () => 1,
  polar: { cd0: 0.02, k1: 0, k: 0.05, clMax: 1 },
  waveDragAt: () => 0,
  propeller: false,
  propellerEfficiency: 1,
};

describe('master equation at its edges', () => {
  it('is NaN at zero or negative wing loading or speed, and with no thrust available', () => {
    const c = flightCondition(cruise(100), jet);
    expect(thrustLoadingRequired(c, 0, 100, 1, 0)).toBeNaN();
    expect(thrustLoadingRequired(c, -500, 100, 1, 0)).toBeNaN();
    expect(thrustLoadingRequired(c, 3000, -100, 1, 0)).toBeNaN();
    expect(thrustLoadingRequired({ ...c, alpha: 0, alphaAt: () => 0 }, 3000, 100, 1, 0)).toBeNaN();
    expect(thrustLoadingRequired({ ...c, alpha: -0.1, alphaAt: () => -0.1 }, 3000, 100, 1, 0)).toBeNaN();
  });

  it('can be met at exactly C_Lmax (the stall itself), not above it', () => {
    // q = 0.5 x 2 x 10^2 = 100 Pa; w = 100 Pa gives C_L = 1 = C_Lmax exactly.
    // T/W = q C_D0/w + K C_L = 0.02 + 0.05 = 0.07 (Mattingly's master equation, n = 1, by hand).
    assertRelative(thrustLoadingRequired(round, 100, 10, 1, 0), 0.07, 1e-12);
    expect(thrustLoadingRequired(round, 100.0001, 10, 1, 0)).toBeNaN();
  });
});

describe('speeds at the edges', () => {
  it('has no lift-off, climb or gradient speed at zero wing loading', () => {
    expect(curveOf(takeoffGroundRollBoundary(takeoffRoll(900), jet)).speedAt(0)).toBeNaN();
    expect(curveOf(climbGradientBoundary(climbGradient(0.024), jet)).speedAt(0)).toBeNaN();
    expect(curveOf(climbRateBoundary(climbRate(10), jet)).speedAt(0)).toBeNaN();
  });

  it('turns at the given true airspeed', () => {
    expect(curveOf(sustainedTurnBoundary(sustainedTurn(120, 2), jet)).speedAt(3000)).toBe(120);
  });

  it('climbs a propeller aircraft at the minimum-power speed of the polar with its linear term', () => {
    // Power per weight in level flight, D V/W = a V^3 + K1 V + b/V (a = rho C_D0/(2 beta w), b = 2 K beta w/rho),
    // is least where its derivative 3 a V^2 + K1 - b/V^2 is zero (hand derivation).
    for (const k1 of [-0.02, 0, 0.03]) {
      const a = 0.0006;
      const b = 900;
      const v = propellerBestRateSpeed(a, b, k1);
      expect(Math.abs(3 * a * v * v + k1 - b / (v * v))).toBeLessThan(1e-12 * (b / (v * v)));
    }
  });
});

describe('engineOutFactor', () => {
  it('is N/(N - k), and NaN for a negative count or no engine left', () => {
    // f_N = N/(N - k) (core/methods.md section 6): a twin with one out needs twice the installed thrust.
    expect(engineOutFactor(2, 1)).toBe(2);
    expect(engineOutFactor(4, 1)).toBeCloseTo(4 / 3, 15);
    expect(engineOutFactor(2, -1)).toBeNaN();
    expect(engineOutFactor(2, 2)).toBeNaN();
  });
});

describe('jetBestRateSpeed at a steep climb', () => {
  it('finds the positive root of 2aV^4 - RC V - 2b = 0 even where Newton from V_md would head the wrong way', () => {
    // The jet's best-rate speed maximises (T/W - D/W) V; d/dV of D V/W = a V^3 + b/V with a = rho C_D0/(2 w),
    // b = 2 K w/rho gives the quartic (hand derivation, core/methods.md section 6). With a = 4.08e-6, b = 245
    // (C_D0 0.02, K 0.05, w 3000 Pa, sea level) V_md = (b/a)^(1/4) = 88 m/s, and at 2^(1/4) V_md the quartic's
    // slope 8 a V^3 - RC is negative for RC = 50 m/s: a start there would run left, to no positive root.
    const a = (1.225 * 0.02) / (2 * 3000);
    const b = (2 * 0.05 * 3000) / 1.225;
    for (const rate of [0, 10, 50, 120]) {
      const v = jetBestRateSpeed(a, b, rate);
      expect(v).toBeGreaterThan(0);
      expect(Math.abs(2 * a * v ** 4 - rate * v - 2 * b)).toBeLessThan(1e-9 * 2 * b);
    }
  });
});
