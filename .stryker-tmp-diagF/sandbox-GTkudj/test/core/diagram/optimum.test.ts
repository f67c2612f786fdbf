// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { evaluateDesign, findOptimum, sampleWingLoadings, envelopeAt, type RequiredLoading } from '../../../core/diagram';
import { aircraft, ceiling, design, stall } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

// Analytic envelopes whose minimum is known in closed form; 0.1 % in wing loading is the spec (DESIGN.md).
describe('findOptimum', () => {
  it('finds the crossing of a falling and a rising curve, between samples', () => {
    // max(A/w, B w) is least where A/w = B w: w = sqrt(A/B), y = sqrt(AB).
    const a = 40;
    const b = 1.07e-4; // w0 = sqrt(40/1.07e-4) = 611.4 Pa
    const curves: RequiredLoading[] = [(w) => a / w, (w) => b * w];
    const found = findOptimum(curves, Infinity, [100, 1500]);
    const w0 = Math.sqrt(a / b);
    expect(found).not.toBeNull();
    assertRelative(found!.wingLoadingPa, w0, 1e-5);
    assertRelative(found!.loading, Math.sqrt(a * b), 1e-5);
    expect(Array.from(sampleWingLoadings([100, 1500], 201))).not.toContain(found!.wingLoadingPa);
  });

  it('finds the smooth minimum of A/w + B w at sqrt(A/B)', () => {
    // d/dw (A/w + B w) = 0 at w = sqrt(A/B).
    const curves: RequiredLoading[] = [(w) => 5000 / w + 0.0123 * w];
    assertRelative(findOptimum(curves, Infinity, [50, 3000])!.wingLoadingPa, Math.sqrt(5000 / 0.0123), 1e-3);
  });

  it('stops at the tightest wing-loading limit when the envelope still falls there', () => {
    const found = findOptimum([(w) => 1000 / w], 733.3, [100, 1500]);
    expect(found!.wingLoadingPa).toBe(733.3);
    expect(found!.unbounded).toBe(false);
  });

  it('breaks a tie towards the largest wing loading', () => {
    // Flat at 1 up to w = 700, where (w/700)^4 rises above it: every w <= 700 ties; core/methods.md section 7 takes the largest.
    const curves: RequiredLoading[] = [() => 1, (w) => Math.pow(w / 700, 4)];
    assertRelative(findOptimum(curves, Infinity, [100, 1000])!.wingLoadingPa, 700, 1e-4);
  });

  it('finds the right end of a region where a curve is met, next to where it cannot be', () => {
    // A cruise-like curve that falls until C_L reaches C_Lmax at w = 812.5, then cannot be met.
    const curves: RequiredLoading[] = [(w) => (w <= 812.5 ? 3000 / w : NaN)];
    const found = findOptimum(curves, Infinity, [100, 1500])!;
    expect(found.wingLoadingPa).toBeLessThanOrEqual(812.5);
    assertRelative(found.wingLoadingPa, 812.5, 1e-3);
  });

  it('flags an optimum on the right edge of the plot as unbounded', () => {
    const found = findOptimum([(w) => 1000 / w], Infinity, [100, 1500])!;
    expect(found.wingLoadingPa).toBe(1500);
    expect(found.unbounded).toBe(true);
  });

  it('picks the deeper of two valleys even when the coarse grid ranks them the other way', () => {
    // Valley at 300 is 0.1 % deeper but narrow: on the 3.6 Pa coarse grid it reads up to 1.0036, above the broad
    // valley's 1.001 at 700. Both lie within 1 % of the lowest coarse value, so both are refined.
    const curve: RequiredLoading = (w) => Math.min(1.001 + ((w - 700) / 200) ** 2, 1 + ((w - 300) / 30) ** 2);
    assertRelative(findOptimum([curve], Infinity, [100, 1000])!.wingLoadingPa, 300, 1e-3);
  });

  it('gives the same optimum from the plotted samples as from its own grid', () => {
    const curves: RequiredLoading[] = [(w) => 4e4 / w, (w) => 2.2e-4 * w, () => 0.5];
    const ws = sampleWingLoadings([100, 1500], 21);
    const envelope = ws.map((w) => envelopeAt(curves, w));
    const own = findOptimum(curves, 1400, [100, 1500])!;
    const fromSamples = findOptimum(curves, 1400, [100, 1500], { wingLoadingsPa: ws, envelope })!;
    assertRelative(fromSamples.wingLoadingPa, own.wingLoadingPa, 1e-6);
  });

  it('is null when nothing can be met, or every limit is left of the range', () => {
    expect(findOptimum([() => NaN], Infinity, [100, 1500])).toBeNull();
    expect(findOptimum([(w) => 1000 / w], 80, [100, 1500])).toBeNull();
  });

  it('sits on the tightest limit with zero loading when no curve is given', () => {
    expect(findOptimum([], 900, [100, 1500])).toEqual({ wingLoadingPa: 900, loading: 0, unbounded: false });
  });
});

describe('the optimum on a flat jet boundary against a stall limit', () => {
  // A jet's absolute ceiling (RC = 0) needs T_SL/W = 2 sqrt(K C_D0)/sigma at every wing loading
  // (Anderson, Introduction to Flight, from memory): a flat boundary, which rounding makes wobble by
  // about 1e-16. The tie rule (core/methods.md section 7: ties go to the largest wing loading) puts the
  // optimum on the stall limit, w = 1/2 rho0 V^2 C_Lmax = 0.5 x 1.225 x 40^2 x 3 = 2940 Pa.
  const jet = aircraft({ kind: 'turbofan', engines: 2, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 3 } });
  for (const samples of [101, 333, 400]) {
    it(`sits on the stall limit with ${samples} samples`, () => {
      const d = design({ aircraft: jet, requirements: [stall(40, { configuration: 'clean' }), ceiling(11000, { rateMps: 0 })], rangePa: [200, 6000], samples });
      const e = evaluateDesign(d);
      // rho0 = 1.2250 kg/m^3 to 5 figures (U.S. Standard Atmosphere 1976).
      assertRelative(e.optimum!.wingLoading, 2940, 1e-6);
      const limit = e.boundaries.find((b) => b.id === 'stall');
      expect(limit && 'wingLoadingMax' in limit ? limit.wingLoadingMax : NaN).toBe(e.optimum!.wingLoading);
      // sigma at 11 km = 0.29708 (U.S. Standard Atmosphere 1976 table, from memory); K = 1/(pi 0.8 7.5).
      const k = 1 / (Math.PI * 0.8 * 7.5);
      assertRelative(e.optimum!.thrustToWeight as number, (2 * Math.sqrt(k * 0.02)) / 0.29708, 1e-4);
    });
  }
});
