/**
 * The evaluation's own envelope of the plotted curves, which the optimum
 * search starts from: the upper of two curves wherever it is listed, and a
 * smooth minimum inside the range, against the closed form.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import { cruise, design } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

describe('evaluateDesign: the optimum of a cruise curve, listed first above a lower one', () => {
  // Piston cruise at sea level (lapse 1, beta 1, K1 = 0): P/W = (V/eta) (1/alpha) (q C_D0/w + K w/q), least at
  // w* = q sqrt(C_D0/K) with P/W* = (V/eta) 2 sqrt(K C_D0)/alpha (d/dw = 0, hand derivation; master equation,
  // Mattingly). q = 1/2 x 1.225 x 60^2 = 2205 Pa (rho0 U.S. Standard Atmosphere 1976), C_D0 0.03,
  // K = 1/(pi 0.8 7.5), eta 0.8, alpha = power setting 0.5.
  // The 50 m/s cruise at full power is below it everywhere it can be flown (up to C_Lmax 1.5 x q50 = 2297 Pa,
  // right of the range): the difference is C_D0/w (120 q60 - 50 q50) + K w (120/q60 - 50/q50), both terms
  // positive since q60 = 1.44 q50.
  const k = 1 / (Math.PI * 0.8 * 7.5);
  const q = 0.5 * 1.225 * 60 * 60;

  it('finds w* = q sqrt(C_D0/K) and the upper curve\'s loading there', () => {
    const e = evaluateDesign(design({ requirements: [cruise(60, { id: 'half', powerSetting: 0.5 }), cruise(50, { id: 'slow' })], rangePa: [200, 2200] }));
    assertRelative(e.optimum!.wingLoading, q * Math.sqrt(0.03 / k), 1e-4);
    assertRelative(e.optimum!.powerToWeight as number, ((60 / 0.8) * 2 * Math.sqrt(k * 0.03)) / 0.5, 1e-6);
    expect(e.optimum!.active).toEqual(['half']);
    expect(e.optimum).not.toHaveProperty('unbounded');
  });
});
