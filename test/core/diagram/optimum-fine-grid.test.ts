/**
 * The optimum search is at least as fine as a 4000-point grid over the span
 * near every candidate minimum (core/methods.md section 7): a dip wider than
 * that grid's spacing, next to a coarse minimum, is found wherever it sits,
 * and refined to its bottom. The envelopes are built here with their minimum
 * in closed form.
 */
import { describe, expect, it } from 'vitest';
import { envelopeAt, findOptimum, sampleWingLoadings, type RequiredLoading } from '../../../core/diagram';
import { assertRelative } from '../helpers/asserts';

const LO = 100;
const HI = 1500;
/** Point k of the even 250-point coarse grid over [LO, HI] (no plotted samples given). */
const coarse = (k: number): number => LO + ((HI - LO) * k) / 249;
/** Spacing of a 4000-point grid over the span: 1400/3999 = 0.3501 Pa. */
const FINE = (HI - LO) / 3999;

/**
 * A broad V, 1 + 0.001 |w - c124|, whose least coarse value is at coarse point
 * 124 (797.19 Pa), with a dip 0.9 + 0.4 |w - wd| (per Pa) that reaches below
 * the V only within about 0.25 Pa of wd: 0.5 Pa wide, more than the 0.35 Pa
 * spacing, so a 4000-point grid always has a point in it. The least loading is
 * 0.9 at wd, exactly.
 */
function dipBeside(wd: number): RequiredLoading {
  const c124 = coarse(124);
  return (w) => Math.min(1 + 0.001 * Math.abs(w - c124), 0.9 + 0.4 * Math.abs(w - wd));
}

describe('findOptimum: a narrow dip next to a coarse minimum', () => {
  it('is wider than a 4000-point grid spacing and narrower than two coarse steps', () => {
    // Where the dip meets the V (about 1.0), 0.9 + 0.4 d = 1 gives d = 0.25 Pa: a width of 0.5 Pa.
    expect(2 * 0.25).toBeGreaterThan(FINE);
    expect(2 * 0.25).toBeLessThan(coarse(1) - coarse(0));
  });

  it('is found and refined to its bottom at each of 60 places across the two coarse steps around that minimum', () => {
    // The dip is kept 0.3 Pa clear of coarse points 123 and 125, the ends of the span searched again.
    const from = coarse(123) + 0.3;
    const to = coarse(125) - 0.3;
    const missed: number[] = [];
    for (let k = 0; k <= 59; k++) {
      const wd = from + ((to - from) * k) / 59;
      const found = findOptimum([dipBeside(wd)], Infinity, [LO, HI])!;
      // Golden section stops at 1e-7 relative width (Kiefer 1953): within 1e-4 Pa of wd, 0.4e-4 in loading.
      if (!(Math.abs(found.wingLoadingPa - wd) <= 1e-3 && Math.abs(found.loading - 0.9) <= 1e-3)) missed.push(wd);
    }
    expect(missed).toEqual([]);
  });

  it('gives the closed-form bottom to golden-section precision', () => {
    // Dip at 800.5 Pa, 3.3 Pa right of coarse point 124 and 2.3 Pa left of 125.
    const found = findOptimum([dipBeside(800.5)], Infinity, [LO, HI])!;
    // Golden section's last bracket is 1e-7 x 800.5 = 8e-5 Pa wide (1e-7 relative of wd); times the dip's
    // slope 0.4 per Pa, at most 3.2e-5 in loading (3.6e-5 of 0.9).
    assertRelative(found.wingLoadingPa, 800.5, 1e-7);
    assertRelative(found.loading, 0.9, 3.6e-5);
    expect(found.unbounded).toBe(false);
  });
});

describe('findOptimum: the fine grid ends on the end of its span', () => {
  it('stops exactly on the cap when the refined span runs from the first plotted sample to the cap', () => {
    // 81.739 + (358.388 - 81.739) is 358.38800000000003 in double precision (IEEE 754 rounding; found by
    // trying values): a fine grid whose last point is computed rather than set would end 5.7e-14 past the cap.
    expect(81.739 + (358.388 - 81.739)).toBeGreaterThan(358.388);
    // Plotted at 81.739, 2040.87 and 4000 Pa; 1000/w falls all the way, so the optimum is the cap.
    const curves: RequiredLoading[] = [(w) => 1000 / w];
    const ws = sampleWingLoadings([81.739, 4000], 3);
    const samples = { wingLoadingsPa: ws, envelope: Float64Array.from(ws, (w) => envelopeAt(curves, w)) };
    const found = findOptimum(curves, 358.388, [81.739, 4000], samples)!;
    expect(found.wingLoadingPa).toBe(358.388);
  });
});
