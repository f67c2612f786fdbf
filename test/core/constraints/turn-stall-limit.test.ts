/**
 * The stall line of a sustained turn, read from the boundary itself: the wing
 * loading where the lift coefficient the turn needs reaches C_Lmax. In a level
 * turn L = n W, so C_L = n beta w / q (Anderson, Introduction to Flight, turning
 * flight), and C_L = C_Lmax at w = q C_Lmax / (n beta).
 */
import { describe, expect, it } from 'vitest';
import { sustainedTurnBoundary } from '../../../core/constraints/sustained-turn';
import { aircraft, sustainedTurn } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

/**
 * Standard troposphere by hand (U.S. Standard Atmosphere 1976): T = 288.15 - 0.0065 h,
 * rho = 1.2250 (T/288.15)^(g0/(R L) - 1), exponent 9.80665/(287.05287 x 0.0065) - 1 = 4.25588.
 */
const troposphereDensity = (h: number): number => 1.225 * Math.pow((288.15 - 0.0065 * h) / 288.15, 4.25588);

const jet = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, clean: { cd0: 0.022, oswaldEfficiency: 0.8, clMax: 1.5 } });

describe('the sustained turn stall line', () => {
  it('is 7598.6 Pa for 150 m/s, n 2.5, beta 0.85, C_Lmax 1.5 at 2500 m (worked by hand)', () => {
    // rho(2500 m) = 1.225 (271.9/288.15)^4.25588 = 0.95686 kg/m^3 (USSA 1976 table: 0.95686, from memory);
    // q = 0.5 x 0.95686 x 150^2 = 10764.66 Pa; w = 10764.66 x 1.5 / (2.5 x 0.85) = 7598.58 Pa.
    const boundary = curveOf(sustainedTurnBoundary(sustainedTurn(150, 2.5, { altitudeM: 2500, massFraction: 0.85 }), jet));
    expect(troposphereDensity(2500)).toBeCloseTo(0.95686, 5);
    assertRelative(boundary.stallLimitPa ?? NaN, 7598.58, 1e-5); // rho0 and the lapse exponent to 5-6 figures
  });

  it('moves as q C_Lmax / (n beta): with V^2, with density, against n and beta', () => {
    const at = (speed: number, n: number, extra: { altitudeM?: number; massFraction?: number }) =>
      curveOf(sustainedTurnBoundary(sustainedTurn(speed, n, extra), jet)).stallLimitPa ?? NaN;
    for (const [speed, n, altitudeM, massFraction] of [
      [100, 1.5, 0, 1],
      [180, 3, 4000, 0.9],
      [70, 1.2, 1000, 0.7],
    ]) {
      const q = 0.5 * troposphereDensity(altitudeM) * speed * speed;
      // 1.2250 and 4.25588 to 5-6 figures: 1e-5.
      assertRelative(at(speed, n, { altitudeM, massFraction }), (q * 1.5) / (n * massFraction), 1e-5, `V ${speed}, n ${n}, h ${altitudeM}, beta ${massFraction}`);
    }
  });

  it('is where the turn stops being flyable: thrust is found just below it, none just above', () => {
    // Above the line C_L exceeds C_Lmax and no thrust can hold the turn (core/methods.md section 7).
    const boundary = curveOf(sustainedTurnBoundary(sustainedTurn(130, 2, { altitudeM: 3000, massFraction: 0.9 }), jet));
    const line = boundary.stallLimitPa ?? NaN;
    expect(boundary.required(line * (1 - 1e-9))).toBeGreaterThan(0);
    expect(boundary.required(line * (1 + 1e-9))).toBeNaN();
  });
});
