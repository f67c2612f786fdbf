// @ts-nocheck
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import * as factors from '../../../core/units/factors';

// Each constant against NIST SP 811 (2008) Appendix B as tabulated in
// core/methods.md section 10, and against js-quantities (a general-purpose units
// library on npm), which stores some factors to 7-9 significant figures.
const TABLE: Array<[name: keyof typeof factors, nist: number, library: () => number]> = [
  ['FOOT_M', 0.3048, () => Qty('1 ft').to('m').scalar],
  ['POUND_KG', 0.45359237, () => Qty('1 lb').to('kg').scalar],
  ['POUND_FORCE_N', 4.4482216152605, () => Qty('1 lbf').to('N').scalar],
  ['KNOT_MPS', 1852 / 3600, () => Qty('1 kt').to('m/s').scalar],
  ['NAUTICAL_MILE_M', 1852, () => Qty('1 nmi').to('m').scalar],
  ['MILE_PER_HOUR_MPS', 0.44704, () => Qty('1 mph').to('m/s').scalar],
  ['FOOT_PER_MINUTE_MPS', 0.00508, () => Qty('1 ft/min').to('m/s').scalar],
  ['HORSEPOWER_W', 745.69987158227022, () => Qty('1 hp').to('W').scalar],
  // Metric horsepower: 75 kilogram-force metres per second.
  ['METRIC_HORSEPOWER_W', 735.49875, () => Qty('75 kg').mul(Qty('9.80665 m/s^2')).mul(Qty('1 m/s')).to('W').scalar],
  ['PSF_PA', 47.880258980335843, () => Qty('1 lbf/ft^2').to('Pa').scalar],
  ['RANKINE_K', 1 / 1.8, () => Qty('1 degR').to('degK').scalar],
];

describe('unit factors', () => {
  it.each(TABLE)('%s is the NIST SP 811 value', (name, nist) => {
    expect(Math.abs((factors[name] as number) / nist - 1)).toBeLessThan(1e-14);
  });

  it.each(TABLE)('%s agrees with js-quantities to 1e-6', (name, _nist, library) => {
    expect(Math.abs((factors[name] as number) / library() - 1)).toBeLessThan(1e-6);
  });

  it('standard gravity is 9.80665 m/s^2 exactly (3rd CGPM, 1901)', () => {
    expect(factors.G0).toBe(9.80665);
  });

  it('slug and slug/ft^3 follow from lbf and ft (NIST SP 811: 14.593902937206 kg, 515.3788184 kg/m^3)', () => {
    const slug = factors.POUND_FORCE_N / factors.FOOT_M;
    expect(slug).toBeCloseTo(14.593902937206, 10);
    expect(slug / factors.FOOT_M ** 3).toBeCloseTo(515.3788184, 6);
    // psi = lbf/in^2 (NIST SP 811: 6894.757293168 Pa).
    expect(factors.POUND_FORCE_N / 0.0254 ** 2).toBeCloseTo(6894.757293168, 8);
  });
});
