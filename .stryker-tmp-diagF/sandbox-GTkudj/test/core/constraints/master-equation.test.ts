// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { minimumDragLiftCoefficient, maximumLiftToDrag } from '../../../core/aero/lift-coefficients';
import { speedForLiftCoefficient } from '../../../core/aero/speeds';
import { flightCondition, thrustLoadingRequired } from '../../../core/constraints';
import { cruiseBoundary } from '../../../core/constraints/cruise';
import { sustainedTurnBoundary } from '../../../core/constraints/sustained-turn';
import { aircraft, cruise, sustainedTurn } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

const jet = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } });

describe('master equation', () => {
  it('needs T/W = 1/(L/D)max in level flight at the minimum-drag speed (sea level, beta = alpha = 1)', () => {
    // Level flight T = D, so T/W = C_D/C_L (Anderson, Introduction to Flight, thrust required).
    const c = flightCondition(cruise(100), jet);
    const w = 3000;
    const v = speedForLiftCoefficient(w, c.densityKgM3, minimumDragLiftCoefficient(c.polar));
    assertRelative(thrustLoadingRequired(c, w, v, 1, 0), 1 / maximumLiftToDrag(c.polar), 1e-12);
  });

  it('adds P_s / V for climb: T/W = D/W + RC/V', () => {
    // Anderson, Introduction to Flight, rate of climb: RC = V (T - D)/W.
    const c = flightCondition(cruise(100), jet);
    assertRelative(thrustLoadingRequired(c, 3000, 100, 1, 10) - thrustLoadingRequired(c, 3000, 100, 1, 0), 10 / 100, 1e-12);
  });

  it('scales to the sea-level rating and take-off weight by beta/alpha', () => {
    // Mattingly's master equation (core/methods.md section 6): T_SL/W_TO = (beta/alpha)(T/W at the condition).
    const c = flightCondition(cruise(200, { altitudeM: 10000, massFraction: 0.9 }), jet);
    const w = 4000;
    const bw = 0.9 * w;
    const q = 0.5 * c.densityKgM3 * 200 * 200;
    const cl = bw / q;
    const atCondition = (c.polar.cd0 + c.polar.k * cl * cl) / cl;
    assertRelative(thrustLoadingRequired(c, w, 200, 1, 0), (0.9 / c.alpha) * atCondition, 1e-12);
  });
});

describe('cruiseBoundary', () => {
  it('cannot be met where the cruise speed is below the stall speed (C_L > C_Lmax): NaN', () => {
    const curve = curveOf(cruiseBoundary(cruise(60), jet));
    const wAtClMax = 0.5 * 1.225 * 3600 * 1.5;
    expect(curve.required(wAtClMax * 0.999)).toBeGreaterThan(0);
    expect(curve.required(wAtClMax * 1.001)).toBeNaN();
  });

  it('gives shaft P/W = (T/W) V / eta for a propeller', () => {
    const piston = aircraft({ clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 }, aspectRatio: 8 });
    const t = curveOf(cruiseBoundary(cruise(60), jet)).required(900);
    const p = curveOf(cruiseBoundary(cruise(60, { propellerEfficiency: 0.8 }), piston)).required(900);
    assertRelative(p, (t * 60) / 0.8, 1e-12);
  });

  it('rises with more zero-lift drag', () => {
    const draggy = aircraft({ kind: 'turbofan', aspectRatio: 8, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } });
    expect(curveOf(cruiseBoundary(cruise(150), draggy)).required(3000)).toBeGreaterThan(curveOf(cruiseBoundary(cruise(150), jet)).required(3000));
  });

  it('reports the given true airspeed', () => {
    expect(curveOf(cruiseBoundary(cruise(150), jet)).speedAt(3000)).toBe(150);
  });
});

describe('sustainedTurnBoundary', () => {
  it('needs T/W = n C_D/C_L with C_L = n w/q in a 60 deg banked turn (n = 2)', () => {
    // Level turn: L = nW, T = D, n = 1/cos(bank) (Anderson, Introduction to Flight, turning flight).
    const n = 1 / Math.cos(Math.PI / 3);
    const curve = curveOf(sustainedTurnBoundary(sustainedTurn(120, n), jet));
    const w = 2500;
    const q = 0.5 * 1.225 * 120 * 120;
    const cl = (n * w) / q;
    const k = 1 / (Math.PI * 0.8 * 8);
    // rho0 = 1.2250 kg/m^3 (U.S. Standard Atmosphere 1976), to 5 figures: 1e-7.
    assertRelative(curve.required(w), (n * (0.022 + k * cl * cl)) / cl, 1e-7);
  });

  it('cannot be met where the turn needs more than C_Lmax: NaN', () => {
    const curve = curveOf(sustainedTurnBoundary(sustainedTurn(60, 2), jet));
    const wAtClMax = (0.5 * 1.225 * 3600 * 1.5) / 2;
    expect(curve.required(wAtClMax * 0.999)).toBeGreaterThan(0);
    expect(curve.required(wAtClMax * 1.001)).toBeNaN();
  });
});

describe('sustainedTurnBoundary with a linear drag term', () => {
  it('needs T/W = n C_D/C_L with C_D = C_D0 + K1 C_L + K C_L^2 at C_L = n w/q (n = 2, K1 = -0.01)', () => {
    // Level turn: L = nW, T = D, so T/W = n D/L = n C_D/C_L (Anderson, Introduction to Flight, turning flight);
    // the linear term therefore costs n K1 (Mattingly's master equation carries K1 n, not K1).
    const linear = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, cdLinear: -0.01, clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const n = 2;
    const curve = curveOf(sustainedTurnBoundary(sustainedTurn(120, n), linear));
    const k = 1 / (Math.PI * 0.8 * 8);
    for (const w of [1500, 2500, 3500]) {
      const q = 0.5 * 1.225 * 120 * 120;
      const cl = (n * w) / q;
      const cd = 0.022 - 0.01 * cl + k * cl * cl;
      // rho0 = 1.2250 kg/m^3 (U.S. Standard Atmosphere 1976), to 5 figures: 1e-6.
      assertRelative(curve.required(w), (n * cd) / cl, 1e-6, `w ${w}`);
    }
  });

  it('shifts the turn boundary by n K1 exactly', () => {
    const polar = (cdLinear: number) => aircraft({ kind: 'turbofan', aspectRatio: 8, cdLinear, clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const n = 2.5;
    const withK1 = curveOf(sustainedTurnBoundary(sustainedTurn(150, n), polar(-0.012))).required(2000);
    const without = curveOf(sustainedTurnBoundary(sustainedTurn(150, n), polar(0))).required(2000);
    assertRelative(withK1 - without, n * -0.012, 1e-9);
  });
});
