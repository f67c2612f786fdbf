// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { RHO0 } from '../../../core/atmosphere';
import { evaluateDesign } from '../../../core/diagram';
import type { CurveBoundaryJson, Evaluation } from '../../../core/evaluation';
import type { Design } from '../../../core/model';
import { G0 } from '../../../core/units/factors';
import { BUSINESS_JET, DEMO_DESIGNS, TRAINER } from '../helpers/demo-designs';
import { aircraft, cruise, design, stall, takeoffRoll } from '../helpers/design';
import { assertRelative, numbersIn } from '../helpers/asserts';

function curves(e: Evaluation): CurveBoundaryJson[] {
  return e.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    Object.values(value).forEach(deepFreeze);
    Object.freeze(value);
  }
  return value;
}

describe('evaluateDesign', () => {
  it('writes the format, the axis and a power-to-weight optimum for a propeller design', () => {
    const e = evaluateDesign(TRAINER);
    expect(e.format).toBe('loftpoint-evaluation/1');
    expect(e.axis).toBe('powerToWeight');
    expect(e.optimum).toHaveProperty('powerToWeight');
    expect(e.optimum).not.toHaveProperty('thrustToWeight');
    expect(e.sizing).toHaveProperty('power');
  });

  it('says thrustToWeight and thrust instead for a turbofan design', () => {
    const e = evaluateDesign(BUSINESS_JET);
    expect(e.axis).toBe('thrustToWeight');
    expect(e.optimum).toHaveProperty('thrustToWeight');
    expect(e.optimum).not.toHaveProperty('powerToWeight');
    expect(e.sizing).toHaveProperty('thrust');
    expect(e.sizing).not.toHaveProperty('power');
  });

  it('gives each curve the requested samples over the requested range', () => {
    const e = evaluateDesign(TRAINER);
    for (const c of curves(e)) {
      expect(c.points.length).toBe(131);
      expect(c.points[0][0]).toBe(200);
      expect(c.points[130][0]).toBe(1500);
    }
  });

  it('writes null, never a number, where a curve cannot be met', () => {
    // 50 m/s at sea level with C_Lmax 1.5 stalls above w = 1/2 x 1.225 x 2500 x 1.5 = 2297 Pa.
    const d = design({ requirements: [cruise(50)], rangePa: [500, 4000], samples: 36 });
    const points = curves(evaluateDesign(d))[0].points;
    for (const [w, y] of points) {
      if (w > 2300) expect(y).toBeNull();
      if (w < 2290) expect(typeof y).toBe('number');
    }
  });

  it('has no NaN or Infinity anywhere in any demo', () => {
    for (const d of DEMO_DESIGNS) {
      for (const [path, x] of numbersIn(evaluateDesign(d))) expect(Number.isFinite(x), path).toBe(true);
    }
  });

  it('gives every enabled requirement a margin, zero for those that bind at the optimum', () => {
    const e = evaluateDesign(TRAINER);
    const optimum = e.optimum!;
    expect(optimum.margins.map((m) => m.id)).toEqual(TRAINER.requirements.map((r) => r.id));
    for (const m of optimum.margins) {
      expect(m.margin).toBeGreaterThanOrEqual(-1e-9);
      if (optimum.active.includes(m.id)) expect(Math.abs(m.margin)).toBeLessThan(1e-3);
    }
    expect(optimum.active.length).toBeGreaterThan(0);
  });

  it('leaves disabled requirements out of boundaries and margins', () => {
    const d: Design = { ...TRAINER, requirements: TRAINER.requirements.map((r) => (r.id === 'cruise' ? { ...r, enabled: false } : r)) };
    const e = evaluateDesign(d);
    expect(e.boundaries.map((b) => b.id)).not.toContain('cruise');
    expect(e.optimum!.margins.map((m) => m.id)).not.toContain('cruise');
    expect(e.designPoint!.margins.map((m) => m.id)).not.toContain('cruise');
  });

  it('sizes wing area and power at the design point from the take-off weight', () => {
    // S = W_TO/w, P = (P/W) W_TO, W_TO = m g0 (core/methods.md section 7); 750 kg, 600 N/m^2, 9 W/N.
    const e = evaluateDesign(TRAINER);
    const weight = 750 * G0;
    assertRelative(e.sizing!.takeoffWeight!, 7354.9875, 1e-12);
    assertRelative(e.sizing!.wingArea, weight / 600, 1e-12);
    assertRelative(e.sizing!.power!, 9 * weight, 1e-12);
    assertRelative(e.sizing!.perEngine!, 9 * weight, 1e-12);
  });

  it('sizes at the optimum when there is no design point, per engine for a twin', () => {
    // Worked by hand: a twin jet with a 40 m/s clean stall (C_Lmax 1.5) and a 100 m/s sea-level cruise.
    // Stall: w = 0.5 x 1.225 x 40^2 x 1.5 = 1470 Pa. Cruise at 1470 Pa: q = 0.5 x 1.225 x 100^2 = 6125 Pa,
    // C_L = 0.24, below C_L,md = sqrt(C_D0/K) = 0.75, so T/W = C_D/C_L falls with w and the optimum is the
    // stall limit; K = 1/(pi 0.8 7.5) = 0.053052, C_D = 0.03 + 0.053052 x 0.0576 = 0.033056, T/W = 0.13773.
    // S = m g0/w = 5000 x 9.80665/1470 = 33.356 m^2; T = 0.137732 x 49033.25 = 6753.47 N, 3376.73 N per engine.
    const jet = aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 5000 });
    const e = evaluateDesign(design({ aircraft: jet, requirements: [stall(40, { configuration: 'clean' }), cruise(100)], rangePa: [500, 3000] }));
    // rho0 = 1.2250 kg/m^3 to 5 figures (U.S. Standard Atmosphere 1976).
    assertRelative(e.optimum!.wingLoading, 1470, 1e-6);
    assertRelative(e.optimum!.thrustToWeight as number, 0.13773, 1e-4);
    assertRelative(e.sizing!.wingArea, 33.3560, 1e-5);
    assertRelative(e.sizing!.thrust!, 6753.47, 1e-5);
    assertRelative(e.sizing!.perEngine!, 3376.73, 1e-5);
  });

  it('reports sea-level EAS speeds at the design point wing loading, with the approach at 1.3 V_s landing', () => {
    // V_s = sqrt(2w/(rho0 C_Lmax)); V_app = 1.3 V_s,L (14 CFR 23.73).
    const e = evaluateDesign(TRAINER);
    assertRelative(e.speeds.stall, Math.sqrt((2 * 600) / (RHO0 * 1.5)), 1e-12);
    assertRelative(e.speeds.approach!, 1.3 * Math.sqrt((2 * 600) / (RHO0 * 2.1)), 1e-12);
    expect(Object.keys(e.speeds.stallByConfiguration!)).toEqual(['clean', 'takeoff', 'landing']);
    expect(e.speeds.minimumDrag).toBeGreaterThan(e.speeds.minimumPower);
  });

  it('marks the design point feasible only when every margin is met', () => {
    // The trainer's design point, 600 Pa and 9 W/N, is below its 110 kt cruise at 6,000 ft (the demo's
    // starting point before sizing): the cruise margin is negative, so the point is not feasible.
    const trainerPoint = evaluateDesign(TRAINER).designPoint!;
    expect(trainerPoint.margins.find((m) => m.id === 'cruise')!.margin).toBeLessThan(0);
    expect(trainerPoint.feasible).toBe(false);
    // Hand-worked limits (stall 1470 Pa as above, cruise T/W 0.13773 there): 1 % inside both is feasible,
    // 1 % outside either is not.
    const jet = aircraft({ kind: 'turbofan', engines: 2, takeoffMassKg: 5000 });
    const at = (wingLoadingPa: number, loading: number) =>
      evaluateDesign(design({ aircraft: jet, requirements: [stall(40, { configuration: 'clean' }), cruise(100)], rangePa: [500, 3000], designPoint: { wingLoadingPa, loading } })).designPoint!;
    expect(at(1470 * 0.99, 0.145).feasible).toBe(true);
    expect(at(1470 * 1.01, 0.145).feasible).toBe(false);
    expect(at(1470 * 0.99, 0.13).feasible).toBe(false);
  });

  it('gives a curve margin of -1 where the curve cannot be met', () => {
    const d = design({ requirements: [cruise(50)], rangePa: [500, 4000], designPoint: { wingLoadingPa: 3000, loading: 50 } });
    expect(evaluateDesign(d).designPoint!.margins[0].margin).toBe(-1);
  });

  it('returns a null optimum, a warning and null sizing when nothing is feasible', () => {
    // A 20 m/s stall limit (about 367 Pa) is left of a range starting at 400 Pa.
    const d = design({ requirements: [stall(20, { configuration: 'clean' }), takeoffRoll(300)], rangePa: [400, 1500] });
    const e = evaluateDesign(d);
    expect(e.optimum).toBeNull();
    expect(e.sizing).toBeNull();
    expect(e.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['limit-below-range', 'no-feasible-point']));
    expect(e.warnings.find((w) => w.code === 'limit-below-range')!.field).toBe('requirements[0]');
  });

  it('leaves its input untouched', () => {
    const frozen = deepFreeze(structuredClone(TRAINER));
    expect(() => evaluateDesign(frozen)).not.toThrow();
    expect(frozen).toEqual(TRAINER);
  });

  it('gives the same answer twice', () => {
    expect(evaluateDesign(BUSINESS_JET)).toEqual(evaluateDesign(BUSINESS_JET));
  });

  it('writes labels through to the boundaries', () => {
    const d = design({ requirements: [cruise(50, { label: 'Cruise at 50 m/s' })], rangePa: [200, 1500] });
    expect(evaluateDesign(d).boundaries[0].label).toBe('Cruise at 50 m/s');
  });

  it('puts the optimum at the stall limit and cruise for the trainer', () => {
    const e = evaluateDesign(TRAINER);
    expect(e.optimum!.active).toEqual(['stall', 'cruise']);
    const limit = e.boundaries.find((b) => b.id === 'stall');
    expect(limit && 'wingLoadingMax' in limit ? limit.wingLoadingMax : NaN).toBe(e.optimum!.wingLoading);
  });

  it('falls back to the clean polar for a configuration the aircraft does not define, and warns', () => {
    // By hand for the clean polar (C_D0 0.03, e 0.8, AR 7.5) at 50 m/s, sea level, w = 1000 Pa:
    // q = 1531.25 Pa, C_L = 0.65306, C_D = 0.03 + 0.053052 x 0.42649 = 0.052626, T/W = 0.080584,
    // shaft P/W = T/W x V/eta = 0.080584 x 50/0.8 = 5.0365 W/N.
    const d = design({ aircraft: aircraft(), requirements: [cruise(50, { configuration: 'ferry' })], rangePa: [1000, 1500], samples: 11 });
    const e = evaluateDesign(d);
    const [curve] = curves(e);
    // rho0 = 1.2250 kg/m^3 to 5 figures (U.S. Standard Atmosphere 1976).
    assertRelative(curve.points[0][1] as number, 5.0365, 1e-4);
    expect(e.warnings.some((w) => w.field.startsWith('requirements[0]'))).toBe(true);
  });
});

describe('evaluateDesign with no enabled requirement', () => {
  it('has no optimum and says why', () => {
    const e = evaluateDesign(design({ requirements: [cruise(50, { enabled: false })] }));
    expect(e.boundaries).toEqual([]);
    expect(e.optimum).toBeNull();
    expect(e.sizing).toBeNull();
    expect(e.warnings.map((w) => w.code)).toEqual(['no-requirements']);
  });
});
