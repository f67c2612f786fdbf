import { describe, expect, it } from 'vitest';
import type { Propulsion } from '../../../core/model';
import { lapseAt } from '../../../core/propulsion/available-fraction';
import { assertRelative } from '../helpers/asserts';

// Sea level, ISA, Mach 0.3: theta0 = 1 + 0.2 x 0.3^2 = 1.018 and delta0 = 1.018^3.5 (isentropic total ratios,
// gamma = 1.4). High-bypass lapse, Mattingly, Heiser and Pratt, Aircraft Engine Design, 2nd ed., eq. 2.54a
// (from memory): alpha = delta0 [1 - 0.49 sqrt(M0) - 3 (theta0 - TR)/(1.5 + M0)], the last term only when
// theta0 > TR.
const air = { temperatureK: 288.15, pressurePa: 101325, mach: 0.3 };
const theta0 = 1.018;
const delta0 = Math.pow(1.018, 3.5);
const turbofan = (throttleRatio?: number): Propulsion => ({ kind: 'turbofan', engines: 2, lapseExponent: 0.8, lapseModel: 'high-bypass', throttleRatio });

describe('the throttle ratio of a Mach-aware turbine lapse', () => {
  it('a flat-rated engine (TR 1.05) keeps the full lapse up to theta0 = 1.05', () => {
    assertRelative(lapseAt(turbofan(1.05), 0.9, air), delta0 * (1 - 0.49 * Math.sqrt(0.3)), 1e-12);
  });

  it('without a throttle ratio the break is at theta0 = 1 (the sea-level standard day)', () => {
    assertRelative(lapseAt(turbofan(), 0.9, air), delta0 * (1 - 0.49 * Math.sqrt(0.3) - (3 * (theta0 - 1)) / 1.8), 1e-12);
  });

  it('gives no number when a Mach-aware model is asked without the flight air', () => {
    expect(lapseAt(turbofan(1.05), 0.9)).toBeNaN();
  });
});
