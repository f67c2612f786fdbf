/**
 * Requirements flown at part power or thrust: alpha = lapse x power setting,
 * and the boundaries scale to the sea-level rating by beta/alpha (Mattingly,
 * Aircraft Engine Design, master equation; core/methods.md sections 5 and 6).
 */
import { describe, it } from 'vitest';
import { flightCondition } from '../../../core/constraints';
import { takeoffGroundRollBoundary } from '../../../core/constraints/takeoff-ground-roll';
import { aircraft, cruise, takeoffRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

describe('a Mach-aware lapse at part thrust', () => {
  it('is the lapse at the flight Mach number times the power setting: 0.9 x 0.20149 at M 0.8, 35,000 ft', () => {
    // Mattingly, Heiser and Pratt, Aircraft Engine Design, eq. 2.54a (high bypass, theta0 below TR = 1):
    // alpha = delta0 (1 - 0.49 sqrt(M0)); at M0 0.8, 35,000 ft (T 218.81 K, p 23,842 Pa, USSA 1976, from memory):
    // delta0 = 0.235303 x 1.128^3.5 = 0.358685, alpha = 0.358685 x (1 - 0.49 x 0.894427) = 0.20149 (by hand);
    // a = sqrt(1.4 x 287.053 x 218.81) = 296.54 m/s. At 90 % thrust: 0.181341.
    const jet = aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 20000 });
    jet.propulsion = { ...jet.propulsion, lapseModel: 'high-bypass', throttleRatio: 1 };
    const c = flightCondition(cruise(0.8 * 296.54, { altitudeM: 35000 * 0.3048, powerSetting: 0.9 }), jet);
    assertRelative(c.alphaAt(0.8 * 296.54), 0.9 * 0.20149, 2e-4);
    // Static: 0.9 x delta = 0.9 x 0.235303.
    assertRelative(c.alphaAt(0), 0.9 * 0.235303, 2e-4);
  });
});

describe('the take-off ground roll at part thrust', () => {
  it('needs 1/alpha times the full-thrust loading: T_SL/W_TO = (beta/alpha)[...] with alpha 0.8', () => {
    // Mean-acceleration form (Raymer ch. 17; core/methods.md section 6) with V_s^2 = 2 beta w/(rho C_Lmax), by hand:
    //   T_SL/W_TO = (beta/alpha)[k^2 beta w/(rho C_Lmax g0 S_G) + 0.49 k^2 C_D,g/C_Lmax + mu (1 - 0.49 k^2 C_L,g/C_Lmax)].
    // The test twin jet: take-off C_D0 0.03 + 0.015, e 0.76, A 7.5, C_Lmax 1.8; k 1.1, C_L,g 0.5, mu 0.04, S_G 900 m,
    // beta 0.9, sea level ISA (sigma^1 = 1, so alpha = the power setting 0.8); rho0 1.2250 (USSA 1976), g0 9.80665.
    const ac = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 7.5, increments: { takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.8 } } });
    const curve = curveOf(takeoffGroundRollBoundary(takeoffRoll(900, { massFraction: 0.9, powerSetting: 0.8 }), ac));
    const bigK = 1 / (Math.PI * 0.76 * 7.5);
    const cdg = 0.045 + bigK * 0.25;
    for (const w of [1500, 3000, 4500]) {
      const acceleration = (1.21 * 0.9 * w) / (1.225 * 1.8 * 9.80665 * 900);
      const drag = (0.49 * 1.21 * cdg) / 1.8;
      const friction = 0.04 * (1 - (0.49 * 1.21 * 0.5) / 1.8);
      assertRelative(curve.required(w), (0.9 / 0.8) * (acceleration + drag + friction), 1e-6, `w ${w}`); // rho0 to 5 figures
    }
  });
});
