/**
 * The landing limit with aerodynamic lift and drag in the braking roll is
 * found by a search for the largest wing loading whose roll stays within the
 * distance. Checked here against the braking roll integrated from the
 * equation of motion, and the search against distances whose answer is known.
 */
import { describe, expect, it } from 'vitest';
import { landingGroundRollBoundary, largestWingLoading } from '../../../core/constraints/landing-ground-roll';
import { G0 } from '../../../core/units/factors';
import { aircraft, landingRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { limitOf } from './curve';

/**
 * Free roll at V_TD for t_fr, then braking with idle thrust taken as zero (Raymer ch. 17, from memory):
 * dV/dt = -g0 [mu + rho (C_D - mu C_L) V^2/(2 w)], S = V_TD t_fr + integral_0^V_TD V/(-dV/dt) dV (Simpson's rule).
 */
function landingRollByIntegration(w: number, touchdown: number, freeRollS: number, mu: number, rho: number, cl: number, cd: number): number {
  const f = (v: number): number => v / (G0 * (mu + (rho * (cd - mu * cl) * v * v) / (2 * w)));
  const n = 2000;
  const h = touchdown / n;
  let sum = f(0) + f(touchdown);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(i * h);
  return touchdown * freeRollS + (sum * h) / 3;
}

describe('the landing ground-roll limit with aerodynamic terms', () => {
  // The test aircraft's landing polar: C_D0 0.03 + 0.06, e 0.72, A 7.5, C_Lmax 2.1; K = 1/(pi e A) (Oswald; Anderson).
  const cl = 0.3;
  const cd = 0.09 + (cl * cl) / (Math.PI * 0.72 * 7.5);
  const touchdownAt = (w: number): number => 1.15 * Math.sqrt((2 * w) / (1.225 * 2.1)); // V_TD = 1.15 V_s; rho0 1.2250 (USSA 1976)

  it('is the wing loading whose integrated roll, free roll included, is the distance', () => {
    const w = limitOf(landingGroundRollBoundary(landingRoll(450, { clGround: cl, freeRollTimeS: 2 }), aircraft()));
    // rho0 = 1.2250 kg/m^3 to 5 figures: 1e-5 on a distance.
    assertRelative(landingRollByIntegration(w, touchdownAt(w), 2, 0.3, 1.225, cl, cd), 450, 1e-5);
  });

  it('allows more wing loading than the roll without aerodynamic terms, since drag helps the brakes more than lift hurts them', () => {
    // Here C_D - mu C_L = 0.09 + 0.0059 - 0.09 > 0: the aerodynamic force adds to the braking.
    expect(cd - 0.3 * cl).toBeGreaterThan(0);
    const withAero = limitOf(landingGroundRollBoundary(landingRoll(450, { clGround: cl }), aircraft()));
    const without = limitOf(landingGroundRollBoundary(landingRoll(450), aircraft()));
    expect(withAero).toBeGreaterThan(without);
  });
});

describe('largestWingLoading', () => {
  it('finds where a distance growing with wing loading reaches the allowed one: S = w/10 m, 450 m at 4500 Pa', () => {
    assertRelative(largestWingLoading((w) => w / 10, 450), 4500, 1e-9);
  });

  it('counts a distance equal to the allowed one as within it', () => {
    // The distance is exactly 450 m up to 4500 Pa and longer above: every wing loading up to 4500 Pa meets 450 m.
    assertRelative(largestWingLoading((w) => Math.max(450, w / 10), 450), 4500, 1e-9);
    // A distance of exactly the allowed one at every wing loading: none is ruled out.
    expect(largestWingLoading(() => 450, 450)).toBeGreaterThanOrEqual(1e6);
  });

  it('rules nothing out where the distance is met at every wing loading', () => {
    expect(largestWingLoading(() => 300, 450)).toBeGreaterThanOrEqual(1e6);
  });

  it('is 0 where no wing loading meets the distance', () => {
    expect(largestWingLoading(() => 600, 450)).toBe(0);
    expect(largestWingLoading(() => Infinity, 450)).toBe(0);
  });
});
