// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { landingDistanceBoundary, landingDistanceSegments } from '../../../core/requirements/landing-distance';
import { approachSpeedBoundary } from '../../../core/requirements/approach-speed';
import { landingGroundRollBoundary } from '../../../core/constraints/landing-ground-roll';
import { dragCoefficient, polarOf, type Polar } from '../../../core/aero/drag-polar';
import { G0, KNOT_MPS } from '../../../core/units/factors';
import { aircraft, approachSpeed, landingDistance, landingRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { limitOf } from '../constraints/curve';

const jet = () => aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8.6, increments: { landing: { cd0Increment: 0.07, oswaldEfficiency: 0.7, clMax: 2.25 } } });

/** Braking from V to rest, m dV/dt = -D - mu (W - L), integrated on d(V^2)/ds by classical Runge-Kutta (1 cm steps). */
function integratedBraking(w: number, rho: number, mu: number, cl: number, polar: Polar, v0: number): number {
  const cd = dragCoefficient(polar, cl);
  const f = (v2: number) => 2 * G0 * (-mu - (rho * v2 * (cd - mu * cl)) / (2 * w));
  let s = 0;
  let v2 = v0 * v0;
  const ds = 0.01;
  for (;;) {
    const k1 = f(v2);
    const k2 = f(v2 + 0.5 * ds * k1);
    const k3 = f(v2 + 0.5 * ds * k2);
    const k4 = f(v2 + ds * k3);
    const next = v2 + (ds / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    if (next <= 0) return s + (ds * v2) / (v2 - next);
    v2 = next;
    s += ds;
  }
}

describe('landing distance over an obstacle (Raymer ch. 17)', () => {
  it('fits its segments exactly in the allowed distance at the limit', () => {
    for (const r of [landingDistance(1000), landingDistance(1500, { fieldLengthFactor: 0.6, liftDumping: true }), landingDistance(500, { altitudeM: 800, massFraction: 0.9 })]) {
      const ac = jet();
      const w = limitOf(landingDistanceBoundary(r, ac));
      const s = landingDistanceSegments(r, ac, w);
      assertRelative(s.approach + s.flare + s.freeRoll + s.braking, r.distanceM * r.fieldLengthFactor, 1e-6);
    }
  });

  it('gives a factored landing field length the limit of the unfactored distance over the factor', () => {
    // Field length = landing distance / 0.6 (the factored landing field length's definition).
    const ac = jet();
    for (const d of [600, 900, 1300]) {
      const factored = limitOf(landingDistanceBoundary(landingDistance(d / 0.6, { fieldLengthFactor: 0.6 }), ac));
      const unfactored = limitOf(landingDistanceBoundary(landingDistance(d), ac));
      assertRelative(factored, unfactored, 1e-8);
    }
  });

  it('brakes over the distance Newton\'s second law gives with lift and drag (within 0.1 %)', () => {
    const ac = jet();
    const polar = polarOf(ac, 'landing') as Polar;
    for (const liftDumping of [false, true]) {
      const r = landingDistance(1000, { liftDumping });
      const w = limitOf(landingDistanceBoundary(r, ac));
      const vTd = 1.15 * Math.sqrt((2 * w) / (1.225 * 2.25));
      const s = landingDistanceSegments(r, ac, w);
      assertRelative(s.braking, integratedBraking(w, 1.225, 0.3, liftDumping ? 0 : 0.5, polar, vTd), 1e-3);
      assertRelative(s.freeRoll, 2 * vTd, 1e-6);
    }
  });

  it('lets the air distance alone set the limit to 0 when the distance is shorter than it', () => {
    // 50 ft on a 3 degree path needs at least about 291 m (15.24 m / tan 3 deg) before any flare: geometry.
    expect(limitOf(landingDistanceBoundary(landingDistance(250), jet()))).toBe(0);
  });

  it('allows less wing loading when higher, hotter, shorter or heavier', () => {
    const ac = jet();
    const at = (extra: Parameters<typeof landingDistance>[1], d = 1000) => limitOf(landingDistanceBoundary(landingDistance(d, extra), ac));
    const base = at({ massFraction: 0.85 });
    expect(at({ massFraction: 0.85, altitudeM: 1500 })).toBeLessThan(base);
    expect(at({ massFraction: 0.85, temperatureOffsetK: 20 })).toBeLessThan(base);
    expect(at({ massFraction: 0.85 }, 900)).toBeLessThan(base);
    expect(at({ massFraction: 0.95 })).toBeLessThan(base);
  });
});

describe('landing ground roll with aerodynamic terms', () => {
  it('keeps today\'s meaning without clGround or liftDumping', () => {
    // Kinematics: V_TD^2 = 2 mu g0 S with no free roll; w = 1/2 rho C_Lmax (V_TD/1.15)^2.
    const ac = jet();
    const v = Math.sqrt(2 * 0.3 * G0 * 600) / 1.15;
    assertRelative(limitOf(landingGroundRollBoundary(landingRoll(600), ac)), 0.5 * 1.225 * 2.25 * v * v, 1e-4);
  });

  it('brakes over the distance Newton\'s second law gives (within 0.1 %), longer with a lifting wing, shorter with lift dumped', () => {
    const ac = jet();
    const polar = polarOf(ac, 'landing') as Polar;
    const plain = limitOf(landingGroundRollBoundary(landingRoll(600), ac));
    const lifting = limitOf(landingGroundRollBoundary(landingRoll(600, { clGround: 1.2 }), ac));
    const dumped = limitOf(landingGroundRollBoundary(landingRoll(600, { liftDumping: true }), ac));
    // mu C_L > C_D at C_L 1.2 for this polar: lift costs more braking than its drag gives back.
    expect(0.3 * 1.2).toBeGreaterThan(dragCoefficient(polar, 1.2));
    expect(lifting).toBeLessThan(plain);
    expect(dumped).toBeGreaterThan(plain);
    for (const [w, cl] of [[lifting, 1.2], [dumped, 0]] as const) {
      const vTd = 1.15 * Math.sqrt((2 * w) / (1.225 * 2.25));
      assertRelative(integratedBraking(w, 1.225, 0.3, cl, polar, vTd), 600, 1e-3);
    }
  });
});

describe('approach speed', () => {
  it('limits the wing loading by the approach speed over its factor (hand-worked, Anderson stall-speed relation)', () => {
    // 120 kt CAS at 1.23 V_SR0 (14 CFR 25.125, from memory), C_Lmax 2.25, 85 % of take-off mass:
    // V_s = 61.733 / 1.23 = 50.19 m/s; w = 0.5 x 1.225 x 50.19^2 x 2.25 / 0.85 = 4084.1 Pa (by hand, 5 figures).
    const w = limitOf(approachSpeedBoundary(approachSpeed(120 * KNOT_MPS, { speedFactor: 1.23, massFraction: 0.85 }), jet()));
    assertRelative(w, 4084.1, 1e-5);
  });

  it('allows less wing loading at a slower approach, a larger factor or a heavier landing', () => {
    const ac = jet();
    const at = (v: number, extra: Parameters<typeof approachSpeed>[1] = {}) => limitOf(approachSpeedBoundary(approachSpeed(v, extra), ac));
    expect(at(55)).toBeLessThan(at(60));
    expect(at(60, { speedFactor: 1.3 })).toBeLessThan(at(60, { speedFactor: 1.23 }));
    expect(at(60, { massFraction: 1 })).toBeLessThan(at(60, { massFraction: 0.85 }));
  });
});
