// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { takeoffGroundRollBoundary } from '../../../core/constraints/takeoff-ground-roll';
import { takeoffDistanceBoundary, takeoffDistanceSegments } from '../../../core/requirements/takeoff-distance';
import { dragCoefficient, polarOf, type Polar } from '../../../core/aero/drag-polar';
import { G0 } from '../../../core/units/factors';
import { aircraft, takeoffDistance, takeoffRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from '../constraints/curve';

const jet = () => aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
const single = () => aircraft({ kind: 'piston', engines: 1, aspectRatio: 7.4, increments: { takeoff: { cd0Increment: 0.014, oswaldEfficiency: 0.76, clMax: 1.75 } } });

/**
 * Newton's second law along the runway, m dV/dt = T - D - mu (W - L), integrated
 * step by step (classical Runge-Kutta on V(s) in the form dV^2/ds), independent of
 * the closed form the engine uses. Jet thrust constant.
 */
function integratedRoll(tw: number, w: number, rho: number, mu: number, cl: number, polar: Polar, vEnd: number): number {
  const cd = dragCoefficient(polar, cl);
  // d(V^2)/ds = 2 g0 [T/W - mu - rho V^2 (C_D - mu C_L) / (2 w)]
  const f = (v2: number) => 2 * G0 * (tw - mu - (rho * v2 * (cd - mu * cl)) / (2 * w));
  let s = 0;
  let v2 = 0;
  const ds = 0.01;
  while (v2 < vEnd * vEnd) {
    const k1 = f(v2);
    const k2 = f(v2 + 0.5 * ds * k1);
    const k3 = f(v2 + 0.5 * ds * k2);
    const k4 = f(v2 + ds * k3);
    const next = v2 + (ds / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    if (next >= vEnd * vEnd) return s + (ds * (vEnd * vEnd - v2)) / (next - v2);
    v2 = next;
    s += ds;
  }
  return s;
}

describe('take-off distance over an obstacle (Raymer ch. 17)', () => {
  it('has segments that add up to the required distance at the required loading', () => {
    // The boundary's loading is the one whose four segments sum to the distance (root found to 1e-10 relative).
    for (const [ac, d, w] of [
      [jet(), 1200, 3500],
      [jet(), 1800, 5000],
      [single(), 450, 650],
    ] as const) {
      const r = takeoffDistance(d);
      const y = curveOf(takeoffDistanceBoundary(r, ac)).required(w);
      const s = takeoffDistanceSegments(r, ac, w, y);
      assertRelative(s.groundRoll + s.rotation + s.transition + s.climb, d, 1e-6);
      for (const part of Object.values(s)) expect(part).toBeGreaterThanOrEqual(0);
    }
  });

  it('rolls the distance Newton\'s second law gives, integrated step by step (within 0.1 %)', () => {
    // Independent check of the ground-roll segment: Runge-Kutta on d(V^2)/ds, 1 cm steps.
    const ac = jet();
    const polar = polarOf(ac, 'takeoff') as Polar;
    const r = takeoffDistance(1500);
    const w = 4000;
    const y = curveOf(takeoffDistanceBoundary(r, ac)).required(w);
    const s = takeoffDistanceSegments(r, ac, w, y);
    const vLof = 1.1 * Math.sqrt((2 * w) / (1.225 * 1.9));
    assertRelative(s.groundRoll, integratedRoll(y, w, 1.225, 0.04, 0.5, polar, vLof), 1e-3);
    assertRelative(s.rotation, 3 * vLof, 1e-6); // ISA sea-level density 1.225 kg/m^3 (ISO 2533) to four figures
  });

  it('reduces to the ground roll with no obstacle and no rotation (within 2 % of the ground-roll kind)', () => {
    // The ground-roll kind uses the mean-acceleration form, within about 2 % of Raymer's closed form (its own test).
    const ac = jet();
    for (const w of [2500, 4000, 6000]) {
      const over = curveOf(takeoffDistanceBoundary(takeoffDistance(900, { obstacleHeightM: 0, rotationTimeS: 0 }), ac)).required(w);
      const roll = curveOf(takeoffGroundRollBoundary(takeoffRoll(900), ac)).required(w);
      assertRelative(over, roll, 0.02);
    }
  });

  it('puts a light single\'s distance over 50 ft at 1.3 to 2.2 times its ground roll', () => {
    // Common practice (light single-engine flight-manual tables put the 50 ft distance near 1.5-1.9 x the roll; from memory).
    const ac = single();
    // Rotation 1 s for a small aircraft (Raymer ch. 17, from memory).
    const r = takeoffDistance(500, { rotationTimeS: 1 });
    const w = 650;
    const s = takeoffDistanceSegments(r, ac, w, curveOf(takeoffDistanceBoundary(r, ac)).required(w));
    const ratio = 500 / s.groundRoll;
    expect(ratio).toBeGreaterThan(1.3);
    expect(ratio).toBeLessThan(2.2);
  });

  it('demands more when higher, hotter, shorter, taller obstacle or heavier', () => {
    const ac = jet();
    const at = (extra: Parameters<typeof takeoffDistance>[1], d = 1200) => curveOf(takeoffDistanceBoundary(takeoffDistance(d, extra), ac)).required(4000);
    const base = at({});
    expect(at({ altitudeM: 1500 })).toBeGreaterThan(base);
    expect(at({ temperatureOffsetK: 20 })).toBeGreaterThan(base);
    expect(at({}, 1000)).toBeGreaterThan(base);
    expect(at({ obstacleHeightM: 25 })).toBeGreaterThan(base);
    // Heavier at the same wing area: the same requirement at a higher wing loading.
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(1200), ac)).required(4400)).toBeGreaterThan(base);
  });

  it('is undefined (NaN) where the distance is shorter than the rotation alone, or with no power', () => {
    const ac = jet();
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(50), ac)).required(4000)).toBeNaN();
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(1200, { powerSetting: 0 }), ac)).required(4000)).toBeNaN();
  });
});
