import { describe, expect, it } from 'vitest';
import { flightCondition } from '../../../core/constraints';
import { assertRelative } from '../helpers/asserts';
import { aircraft, cruise } from '../helpers/design';

// ISA at 35,000 ft (10,668 m): T = 218.81 K, p = 23,842 Pa; at 10,000 ft (3,048 m): sigma = 0.7385 to 4 figures
// (U.S. Standard Atmosphere 1976, tables; from memory). Sea level: T0 = 288.15 K, p0 = 101,325 Pa.
const FT = 0.3048;

describe('flightCondition: the available fraction at a flight speed', () => {
  it('reads the flight Mach number for a Mach-aware turbofan lapse, from the requirement\'s own air', () => {
    // Mattingly, Heiser and Pratt, Aircraft Engine Design, eq. 2.54a (high bypass, theta0 below TR = 1):
    // alpha = delta0 (1 - 0.49 sqrt(M0)), delta0 = (p/p0)(1 + 0.2 M0^2)^3.5. At M0 = 0.8, 35,000 ft, by hand:
    // 1 + 0.2 x 0.64 = 1.128; theta0 = 218.81/288.15 x 1.128 = 0.8566 (below 1); delta0 = 0.235303 x 1.52434 = 0.358685;
    // alpha = 0.358685 x (1 - 0.49 x 0.894427) = 0.20149. The speed of sound there is sqrt(1.4 x 287.053 x 218.81) = 296.54 m/s.
    const jet = { ...aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 20000 }) };
    jet.propulsion = { ...jet.propulsion, lapseModel: 'high-bypass', throttleRatio: 1 };
    const c = flightCondition(cruise(0.8 * 296.54, { altitudeM: 35000 * FT }), jet);
    assertRelative(c.alphaAt(0.8 * 296.54), 0.20149, 2e-4);
    // Static (M0 = 0): alpha = delta = 0.235303, the condition's own alpha.
    assertRelative(c.alphaAt(0), 0.235303, 2e-4);
    assertRelative(c.alpha, 0.235303, 2e-4);
  });

  it('is the static sigma^m at any speed for a density lapse, times the power setting', () => {
    // Turboprop, m = 0.75 at 10,000 ft, 90 % power: alpha = 0.7385^0.75 x 0.9 = 0.71695 (by hand).
    const prop = aircraft({ kind: 'turboprop', lapseExponent: 0.75 });
    const c = flightCondition(cruise(120, { altitudeM: 10000 * FT, powerSetting: 0.9 }), prop);
    for (const speed of [0, 60, 120, 240]) assertRelative(c.alphaAt(speed), 0.71695, 2e-4);
    assertRelative(c.alpha, 0.71695, 2e-4);
  });
});
