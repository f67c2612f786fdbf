/**
 * A linear drag term that makes the polar's least drag negative is refused on
 * its own field, and only that problem is reported (the required loadings are
 * not looked at on a polar that is already impossible).
 *
 * Hand derivation (parabolic polar with a linear term, C_D = C_D0 + K1 C_L + K C_L^2,
 * least at C_L = -K1/(2K): C_D,min = C_D0 - K1^2/(4K); K = 1/(pi e AR), common practice):
 * C_D0 0.03, e 0.8, AR 7.5 give K = 1/(pi x 6) = 0.0530516; K1 = -0.1 gives
 * K1^2/(4K) = 0.01/0.2122066 = 0.0471239, so C_D,min = 0.03 - 0.0471239 = -0.0171239.
 */
import { describe, expect, it } from 'vitest';
import { impossibleInputs } from '../../../core/diagram';
import { aircraft, cruise, design, stall } from '../helpers/design';

describe('a linear drag term that makes the least drag negative', () => {
  it('is refused once, on aircraft.aero.cdLinear, with the least drag worked out', () => {
    // The cruise at 60 m/s would also need negative power at low loadings with this polar: not reported on top.
    const found = impossibleInputs(design({ aircraft: aircraft({ cdLinear: -0.1 }), requirements: [stall(30), cruise(60)], rangePa: [100, 2000] }));
    expect(found).toHaveLength(1);
    expect(found[0].field).toBe('aircraft.aero.cdLinear');
    const least = Number(/least drag C_D0 - K1\^2\/\(4K\) = (-?[0-9.]+), not positive/.exec(found[0].message)?.[1]);
    expect(least).toBeCloseTo(-0.0171239, 4);
    expect(found[0].message).toMatch(/^-0\.1 makes the clean polar's least drag .* not positive; use a linear term closer to zero$/);
  });

  it('is not refused where the least drag stays positive (K1 = -0.05: 0.03 - 0.0117810 = 0.0182190)', () => {
    expect(impossibleInputs(design({ aircraft: aircraft({ cdLinear: -0.05 }), requirements: [stall(30)], rangePa: [100, 2000] }))).toEqual([]);
  });
});
