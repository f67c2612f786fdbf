// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { minimumPowerLiftCoefficient } from '../../../core/aero/lift-coefficients';
import { speedForLiftCoefficient, stallSpeed } from '../../../core/aero/speeds';
import { bestRateSpeed, flightCondition, jetBestRateSpeed, loadingRequired } from '../../../core/constraints';
import { climbRateBoundary } from '../../../core/constraints/climb-rate';
import { aircraft, climbRate } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

// C_Lmax 3 keeps the 1.2 V_s floor out of the way where the unfloored speed is under test.
const highLift = { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 3 };
const jet = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, clean: highLift });
const prop = aircraft({ kind: 'electric', aspectRatio: 8, clean: highLift });

/** Required loading minimised over speed on a fine scan: an independent check of the best-rate speed. */
function scanBestSpeed(f: (v: number) => number, from: number, to: number): number {
  let best = Infinity;
  let at = NaN;
  for (let v = from; v <= to; v += 0.001) {
    const y = f(v);
    if (y < best) [best, at] = [y, v];
  }
  return at;
}

describe('best-rate speed', () => {
  it("equals Anderson's closed form V_(R/C)max for a jet (K1 = 0)", () => {
    // Anderson, Introduction to Flight, maximum rate of climb of a jet (core/methods.md section 6):
    // V = {(w/(3 rho C_D0))[T/W + sqrt((T/W)^2 + 12 C_D0 K)]}^(1/2), T/W the thrust that just gives RC at best.
    const rc = 15;
    const c = flightCondition(climbRate(rc), jet);
    for (const w of [2000, 4000, 6000]) {
      const v = bestRateSpeed(c, w, rc, 1.2);
      const tw = loadingRequired(c, w, v, 1, rc);
      const k = c.polar.k;
      const anderson = Math.sqrt((w / (3 * 1.225 * 0.02)) * (tw + Math.sqrt(tw * tw + 12 * 0.02 * k)));
      assertRelative(v, anderson, 1e-7); // rho0 = 1.2250 kg/m^3 (USSA 1976) to 5 figures
    }
  });

  it('minimises the required thrust over speed (jet), as a scan confirms', () => {
    const c = flightCondition(climbRate(15), jet);
    const v = bestRateSpeed(c, 4000, 15, 1.2);
    assertRelative(v, scanBestSpeed((s) => loadingRequired(c, 4000, s, 1, 15), 40, 300), 1e-4);
  });

  it('equals the minimum-power speed for a propeller', () => {
    // With eta constant the best-rate speed is V_mp (Anderson, Introduction to Flight; core/methods.md section 6).
    const c = flightCondition(climbRate(5), prop);
    const v = bestRateSpeed(c, 700, 5, 1.2);
    assertRelative(v, speedForLiftCoefficient(700, 1.225, minimumPowerLiftCoefficient(c.polar)), 1e-7); // rho0 1.2250 (USSA 1976)
    assertRelative(v, scanBestSpeed((s) => loadingRequired(c, 700, s, 1, 5), 10, 80), 1e-4);
  });

  it('is the jet quartic root for zero rate: V_md', () => {
    // 2aV^4 - 2b = 0 gives V^4 = b/a, the minimum-drag speed (core/methods.md section 6).
    assertRelative(jetBestRateSpeed(2e-6, 300, 0), Math.pow(300 / 2e-6, 0.25), 1e-12);
  });

  it('is floored at 1.2 V_s for a typical light aircraft, whose C_L,mp exceeds C_Lmax/1.44', () => {
    // 14 CFR 23.65/23.67 climb-speed minimum 1.2 V_s; core/methods.md section 6 notes the floor is usually active for propellers.
    const light = aircraft({ aspectRatio: 7.5, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const c = flightCondition(climbRate(3.5), light);
    expect(minimumPowerLiftCoefficient(c.polar)).toBeGreaterThan(1.5 / 1.44);
    assertRelative(bestRateSpeed(c, 700, 3.5, 1.2), 1.2 * stallSpeed(700, 1.225, 1.5), 1e-7); // rho0 1.2250 (USSA 1976)
  });
});

describe('climbRateBoundary', () => {
  it('uses a given speed when there is one, and NaN below the stall speed', () => {
    const curve = curveOf(climbRateBoundary(climbRate(5, { speedMps: 40 }), aircraft()));
    expect(curve.speedAt(700)).toBe(40);
    const wStall = 0.5 * 1.225 * 1600 * 1.5;
    expect(curve.required(wStall * 1.01)).toBeNaN();
  });

  it('needs more with a higher rate', () => {
    const ac = aircraft();
    expect(curveOf(climbRateBoundary(climbRate(6), ac)).required(700)).toBeGreaterThan(curveOf(climbRateBoundary(climbRate(3), ac)).required(700));
  });
});
