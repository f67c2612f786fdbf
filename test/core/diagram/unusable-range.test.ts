/**
 * A wing-loading range that cannot be used (ends reversed) is replaced by the
 * default one, worked out here by its rules (core/diagram/default-range.ts,
 * core/methods.md section 7) for a design whose every input counts: a stall
 * limit sets the upper end, the design point widens it, and the steep left
 * branch of a cruise curve raises the lower end.
 *
 * Stall at 20 m/s in the landing configuration (C_Lmax 2.1), sea level ISA
 * (rho = 1.225 kg/m^3, U.S. Standard Atmosphere 1976): w_max = rho V^2 C_Lmax / 2
 * = 0.5 x 1.225 x 400 x 2.1 = 514.5 Pa.
 * Cruise at 60 m/s, piston at sea level (full power, lapse 1), eta 0.8, clean
 * C_D0 0.03, K = 1/(pi e AR) = 1/(pi 0.8 7.5) = 0.0530516, q = rho V^2/2 = 2205 Pa:
 * P/W = (V/eta)(q C_D0 / w + K w / q) (the master equation in level flight,
 * Gudmundsson, General Aviation Aircraft Design, from memory), least at
 * sqrt(q^2 C_D0/K) = 1658 Pa, so it falls over the whole range drawn.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../core/diagram';
import { cruise, design, stall } from '../helpers/design';

function rangeOf(e: ReturnType<typeof evaluateDesign>): [number, number] {
  const curve = e.boundaries.find((b) => 'points' in b);
  if (!curve || !('points' in curve)) throw new Error('no curve');
  return [curve.points[0][0], curve.points[curve.points.length - 1][0]];
}

describe('an unusable wing-loading range', () => {
  it('is replaced by the default range of the limits, the curves and the design point, with a warning', () => {
    // Upper end: 1.3 x 514.5 = 668.85 Pa, widened to 1.1 x 920 = 1012 Pa by the design point at 920 Pa.
    // Lower end: a tenth of 668.85, 66.885 Pa; on the 81 points from there to 668.85 (7.52456 Pa apart) the
    // cruise curve is least at the right end, 75 x (66.15/668.85 + 2.40597e-5 x 668.85) = 8.6245 W/N, and first
    // within 5 x 8.6245 = 43.12 at point 7 (119.56 Pa: 41.71; point 6, 112.03 Pa: 44.49). The lower end is the
    // point before, 112.03 Pa (0.9 x 920 = 828 Pa does not lower it); both rounded outwards to two figures: [110, 1100].
    const e = evaluateDesign(
      design({ requirements: [stall(20), cruise(60)], rangePa: [1500, 200], designPoint: { wingLoadingPa: 920, loading: 20 } }),
    );
    expect(rangeOf(e)).toEqual([110, 1100]);
    expect(e.warnings.filter((w) => w.code === 'range-invalid')).toEqual([
      {
        code: 'range-invalid',
        field: 'diagram.wingLoading',
        message: 'The wing-loading range needs two positive values, the first smaller; a range that shows every boundary is used.',
      },
    ]);
  });
});
