/**
 * impossibleInputs looks for a non-positive required loading at the samples
 * the diagram is drawn with (core/diagram/impossible-inputs.ts): the design's
 * own count when it is a whole number of at least 2, else the default 201.
 *
 * Hand derivation, a descent of 5 m/s at a given 50 m/s (sea level ISA,
 * rho = 1.225 kg/m^3, U.S. Standard Atmosphere 1976) by a jet with clean
 * C_D0 0.03 and K = 1/(pi e AR) = 1/(pi x 0.8 x 7.5) = 0.0530516:
 * the master equation (Mattingly, Aircraft Engine Design, from memory) with
 * n = 1 and P_s = -5 m/s gives T/W = q C_D0/w + K w/q + P_s/V, q = 1531.25 Pa:
 * 45.9375/w + 3.46460e-5 w - 0.1. It is negative between the roots
 * w = (0.1 -+ sqrt(0.01 - 4 x 3.46460e-5 x 45.9375)) / (2 x 3.46460e-5)
 * = (0.1 -+ 0.060281) / 6.92920e-5 = 573.2 Pa and 2313 Pa (and the curve
 * stalls above w = q C_Lmax = 2297 Pa). On [100, 3000] the 201 default
 * samples are 14.5 Pa apart: 564 Pa (i = 32) is positive, 578.5 Pa (i = 33)
 * the first negative one. With 2 samples (100 and 3000 Pa) none is negative.
 */
import { describe, expect, it } from 'vitest';
import { impossibleInputs } from '../../../core/diagram';
import { aircraft, climbRate, design } from '../helpers/design';

const jet = aircraft({ kind: 'turbofan', engines: 2 });
const descent = (samples: number) => design({ aircraft: jet, requirements: [climbRate(-5, { speedMps: 50 })], rangePa: [100, 3000], samples });
const negativeAt578 = {
  field: 'requirements[0]',
  message: 'makes requirement "climb" need negative thrust at 578.5 Pa wing loading, which no aircraft can; check its values',
};

describe('impossible inputs at the plotted samples', () => {
  it('uses the default 201 samples when the count is not a whole number of at least 2', () => {
    for (const samples of [1, 0, 1.5, 2.5, Number.NaN]) expect(impossibleInputs(descent(samples))).toEqual([negativeAt578]);
  });

  it('uses the design\'s own count: 201 finds the band, 2 samples fall outside it', () => {
    expect(impossibleInputs(descent(201))).toEqual([negativeAt578]);
    expect(impossibleInputs(descent(2))).toEqual([]);
  });
});
