import { describe, expect, it } from 'vitest';
import { columnsOf, evaluateDesign } from '../../../core/diagram';
import type { CurveBoundaryJson, Evaluation } from '../../../core/evaluation';
import { DEMO_DESIGNS } from '../helpers/demo-designs';
import { aircraft, cruise, design, stall } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

function curves(e: Evaluation): CurveBoundaryJson[] {
  return e.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
}

describe('the curves as columns', () => {
  it('agree with the JSON points point for point in every demo: same wing loadings, NaN exactly where the JSON has null', () => {
    for (const d of DEMO_DESIGNS) {
      const e = evaluateDesign(d);
      const columns = columnsOf(e)!;
      const json = curves(e);
      expect(columns.ids).toEqual(json.map((c) => c.id));
      json.forEach((curve, j) => {
        expect(columns.curves[j].length).toBe(curve.points.length);
        curve.points.forEach(([w, y], i) => {
          expect(columns.wingLoadingsPa[i]).toBe(w);
          if (y === null) expect(columns.curves[j][i]).toBeNaN();
          else expect(columns.curves[j][i]).toBe(y);
        });
      });
    }
  });

  it('leave a NaN gap where a curve cannot be met, and the envelope with it', () => {
    // A 50 m/s sea-level cruise with C_Lmax 1.5 stalls above w = 1/2 x 1.225 x 50^2 x 1.5 = 2297 N/m^2
    // (lift equation; rho0 = 1.225 kg/m^3, U.S. Standard Atmosphere 1976), so it has no value there.
    const d = design({ requirements: [cruise(50)], rangePa: [500, 4000], samples: 36 });
    const columns = columnsOf(evaluateDesign(d))!;
    const [column] = columns.curves;
    let gaps = 0;
    columns.wingLoadingsPa.forEach((w, i) => {
      if (w > 2300) {
        expect(column[i]).toBeNaN();
        expect(columns.envelope[i]).toBeNaN();
        gaps++;
      }
      if (w < 2290) expect(Number.isFinite(column[i])).toBe(true);
    });
    expect(gaps).toBeGreaterThan(10);
  });

  it('hold the cruise requirement worked by hand, and the envelope is the largest curve there', () => {
    // Twin jet, clean C_D0 0.03, AR 7.5, e 0.8, 100 m/s at sea level, w = 1470 N/m^2 (worked by hand):
    // q = 0.5 x 1.225 x 100^2 = 6125 Pa, C_L = 0.24, K = 1/(pi 0.8 7.5) = 0.053052,
    // T/W = q C_D0/w + K w/q = 0.125000 + 0.012732 = 0.13773 (master equation, n = 1, P_s = 0).
    const jet = aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 5000 });
    const d = design({ aircraft: jet, requirements: [stall(40, { configuration: 'clean' }), cruise(100)], rangePa: [470, 2470], samples: 5 });
    const columns = columnsOf(evaluateDesign(d))!;
    const at = Array.from(columns.wingLoadingsPa).indexOf(1470);
    expect(at).toBe(2);
    assertRelative(columns.curves[0][at], 0.13773, 1e-4);
    assertRelative(columns.envelope[at], 0.13773, 1e-4);
  });

  it('are not known for an evaluation read back from JSON, whose points carry the same numbers', () => {
    const e = evaluateDesign(DEMO_DESIGNS[0]);
    const back = JSON.parse(JSON.stringify(e)) as Evaluation;
    expect(columnsOf(back)).toBeUndefined();
    expect(curves(back).map((c) => c.points)).toEqual(curves(e).map((c) => c.points));
  });
});
