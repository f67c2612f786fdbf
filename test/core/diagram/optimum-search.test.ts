/**
 * The optimum search on its own, through findOptimum's inputs and outputs:
 * the coarse grid and its candidate minima, the fine refinement, the tie rule
 * (largest wing loading among equal least loadings, core/methods.md section 7),
 * the caller's plotted samples and the wing-loading cap. Every expected value
 * is a hand derivation written beside it.
 */
import { describe, expect, it } from 'vitest';
import { envelopeAt, findOptimum, sampleWingLoadings, type EnvelopeSamples, type RequiredLoading } from '../../../core/diagram';
import { assertRelative } from '../helpers/asserts';

/** The envelope evaluated at `count` plotted wing loadings, as the evaluation hands it over. */
function plotted(curves: readonly RequiredLoading[], range: [number, number], count: number): EnvelopeSamples {
  const wingLoadingsPa = sampleWingLoadings(range, count);
  return { wingLoadingsPa, envelope: Float64Array.from(wingLoadingsPa, (w) => envelopeAt(curves, w)) };
}

/** Coarse-grid point k of [lo, hi] without samples: 250 even points (COARSE_GRID_POINTS). */
const coarsePoint = (lo: number, hi: number, k: number): number => lo + ((hi - lo) * k) / 249;

describe('findOptimum: where the least loading is at an end of what can be met', () => {
  it('puts a rising envelope\'s optimum exactly on the left end of the range, not flagged unbounded', () => {
    // y = 0.002 w rises everywhere: its least value on [100, 1500] is at w = 100, y = 0.2.
    const found = findOptimum([(w) => 0.002 * w], Infinity, [100, 1500])!;
    expect(found.wingLoadingPa).toBe(100);
    assertRelative(found.loading, 0.2, 1e-12);
    expect(found.unbounded).toBe(false);
  });

  it('finds the left end of the region a curve can meet, when it cannot be met at lower wing loadings', () => {
    // Not met (NaN) below 400 Pa, y = w/400 above: least where it starts, w = 400, y = 1.
    const found = findOptimum([(w) => (w < 400 ? NaN : w / 400)], Infinity, [100, 1500])!;
    expect(found.wingLoadingPa).toBeGreaterThanOrEqual(400);
    assertRelative(found.wingLoadingPa, 400, 1e-6);
    assertRelative(found.loading, 1, 1e-6);
  });

  it('does not flag an interior optimum as unbounded', () => {
    // max(40/w, 1.07e-4 w) crosses at sqrt(40/1.07e-4) = 611.4 Pa, far inside [100, 1500].
    const found = findOptimum([(w) => 40 / w, (w) => 1.07e-4 * w], Infinity, [100, 1500])!;
    assertRelative(found.wingLoadingPa, Math.sqrt(40 / 1.07e-4), 1e-5);
    expect(found.unbounded).toBe(false);
  });
});

describe('findOptimum: the wing-loading cap', () => {
  it('gives the single point when the cap falls exactly on the left end, and null when nothing is met there', () => {
    // Only w = 100 is allowed: y = 1000/100 = 10.
    expect(findOptimum([(w) => 1000 / w], 100, [100, 1500])).toEqual({ wingLoadingPa: 100, loading: 10, unbounded: false });
    expect(findOptimum([() => NaN], 100, [100, 1500])).toBeNull();
  });

  it('treats a cap a hair inside the right edge as a limit, not an open edge', () => {
    // 1000/w falls all the way, so the optimum is the cap, 1500 (1 - 1e-7) = 1499.99985 Pa; the edge test
    // (w within 1e-6 of the plot's right end) must not fire, since a requirement bounds the wing loading there.
    const cap = 1500 * (1 - 1e-7);
    const found = findOptimum([(w) => 1000 / w], cap, [100, 1500])!;
    expect(found.wingLoadingPa).toBe(cap);
    expect(found.unbounded).toBe(false);
  });

  it('stops exactly on the cap with a falling envelope, where the even grid\'s last step rounds past it', () => {
    // lo + (cap - lo) x 249/249 is 5.7e-14 above cap = 304.6854 when lo = 169.87 (IEEE 754 rounding, found
    // by trying values); an optimum that far right would break its own limit (margin below zero).
    const cap = 304.6854;
    const found = findOptimum([(w) => 1000 / w], cap, [169.87, 1000])!;
    expect(found.wingLoadingPa).toBeLessThanOrEqual(cap);
    expect(found.wingLoadingPa).toBe(cap);
  });

  it('stops exactly on the cap when refining between sparse plotted samples', () => {
    // Plotted at 167.13, 583.565 and 1000 Pa, capped at 315.2892: the search runs from 167.13 to the cap, where
    // a + (b - a) x 3999/3999 rounds 5.7e-14 above b (IEEE 754 rounding, found by trying values).
    const cap = 315.2892;
    const curves: RequiredLoading[] = [(w) => 1000 / w];
    const found = findOptimum(curves, cap, [167.13, 1000], plotted(curves, [167.13, 1000], 3))!;
    expect(found.wingLoadingPa).toBeLessThanOrEqual(cap);
    expect(found.wingLoadingPa).toBe(cap);
  });

  it('ignores plotted samples right of the cap, even where the envelope is lower there', () => {
    // 1000/w keeps falling to the plot's right end, but the cap 733.3 Pa bounds it: the optimum is the cap.
    const curves: RequiredLoading[] = [(w) => 1000 / w];
    const found = findOptimum(curves, 733.3, [100, 1500], plotted(curves, [100, 1500], 15))!;
    expect(found.wingLoadingPa).toBe(733.3);
    assertRelative(found.loading, 1000 / 733.3, 1e-12);
  });
});

describe('findOptimum: the coarse grid and its candidate minima', () => {
  it('finds a deep dip that only the plotted samples see, never returning more than their lowest value', () => {
    // A broad bowl 1 + 0.5 ((w - 800)/700)^2 with a dip 0.2 deep and 0.5 Pa wide at 523.3 Pa: between two
    // points of an even 250-point grid over [100, 1100] (521.7, 525.7) it reads within 1e-4 of the bowl, but
    // 2001 plotted samples (0.5 Pa apart) see it. There the bowl is 1.0781, the dip's bottom near 0.878 < 1.
    const curves: RequiredLoading[] = [(w) => 1 + 0.5 * ((w - 800) / 700) ** 2 - 0.2 * Math.exp(-(((w - 523.3) / 0.5) ** 2))];
    const samples = plotted(curves, [100, 1100], 2001);
    const lowestPlotted = Math.min(...samples.envelope);
    const found = findOptimum(curves, Infinity, [100, 1100], samples)!;
    expect(found.loading).toBeLessThanOrEqual(lowestPlotted);
    assertRelative(found.wingLoadingPa, 523.3, 1e-3);
    expect(found.loading).toBeLessThan(0.9);
  });

  it('refines a narrow valley beside a broad shallow one whose gentle sides read lower on the coarse grid', () => {
    // min(1.001 + ((w - 700)/2000)^2, 1 + ((w - 300)/30)^2): the narrow valley is deeper (1 at 300 Pa), but its
    // nearest coarse point (3.6 Pa apart) reads up to 1.0036, above some 50 points on the broad valley's sides.
    // Only local minima are candidates, so both valleys are refined and 300 Pa wins.
    const curve: RequiredLoading = (w) => Math.min(1.001 + ((w - 700) / 2000) ** 2, 1 + ((w - 300) / 30) ** 2);
    const found = findOptimum([curve], Infinity, [100, 1000])!;
    assertRelative(found.wingLoadingPa, 300, 1e-6);
    assertRelative(found.loading, 1, 1e-9);
  });

  it('refines the lowest local minima first, wherever they sit: eleven valleys, the deepest ninth from the left', () => {
    // 1 + 0.002 sin^2(pi w/100) + 1e-8 (w - 900)^2 has minima at every 100 Pa of [100, 1100]; the bowl term
    // makes w = 900 the least (y = 1 exactly), 800 and 1000 next (1 + 1e-4). The coarse grid reads each within
    // 0.002 sin^2(pi 2.008/100) = 8e-6 of its minimum, so the ranking holds there.
    const curve: RequiredLoading = (w) => 1 + 0.002 * Math.sin((Math.PI * w) / 100) ** 2 + 1e-8 * (w - 900) ** 2;
    const found = findOptimum([curve], Infinity, [100, 1100])!;
    assertRelative(found.wingLoadingPa, 900, 1e-6);
    assertRelative(found.loading, 1, 1e-9);
  });
});

describe('findOptimum: the tie rule (largest wing loading among equal least loadings)', () => {
  it('takes the far end of a flat stretch shorter than one coarse step', () => {
    // max(1, 1 + 0.01 (502 - w), 1 + 0.01 (w - 505)) is exactly 1 on [502, 505] Pa, which lies between the
    // coarse points 501.6 and 505.6 of [100, 1100]: every w in it ties, and the rule takes 505.
    const found = findOptimum([() => 1, (w) => 1 + 0.01 * (502 - w), (w) => 1 + 0.01 * (w - 505)], Infinity, [100, 1100])!;
    assertRelative(found.wingLoadingPa, 505, 1e-6);
    expect(found.loading).toBe(1);
  });

  // Two valleys of equal depth, 1 + min(((w - L)/50)^2, ((w - R)/50)^2): both minima are 1, so R wins.
  const twin = (left: number, right: number): RequiredLoading => (w) => 1 + Math.min(((w - left) / 50) ** 2, ((w - right) / 50) ** 2);

  it('takes the right one of two equal valleys when the coarse grid reads the left one lower', () => {
    // L on coarse point 75 of [100, 1100] (401.2 Pa) reads exactly 1; R = 800 falls 1.2 Pa from its nearest point.
    const left = coarsePoint(100, 1100, 75);
    assertRelative(findOptimum([twin(left, 800)], Infinity, [100, 1100])!.wingLoadingPa, 800, 1e-6);
  });

  it('takes the right one of two equal valleys when the coarse grid reads the right one lower', () => {
    // R on coarse point 175 (802.8 Pa) reads exactly 1; L = 400 falls 1.2 Pa from its nearest point.
    const right = coarsePoint(100, 1100, 175);
    assertRelative(findOptimum([twin(400, right)], Infinity, [100, 1100])!.wingLoadingPa, right, 1e-6);
  });

  it('keeps the right one of two equal valleys, refined first, when neither sits on a coarse point', () => {
    // R 0.3 Pa right of coarse point 175 reads 1 + (0.3/50)^2 = 1.000036, L = 400 reads 1 + (1.2/50)^2 = 1.00058:
    // R is refined first, L then ties with it from the left, and no coarse point ties for the sweep to find.
    const right = coarsePoint(100, 1100, 175) + 0.3;
    assertRelative(findOptimum([twin(400, right)], Infinity, [100, 1100])!.wingLoadingPa, right, 1e-6);
  });

  it('takes the last of more equal flat bottoms than it refines (eight): the sweep over the whole span', () => {
    // 1 + 0.01 max(0, sin(2 pi w/100)) is exactly 1 on [150, 200], [250, 300], ..., [1050, 1100]: ten flat
    // bottoms of equal depth on [100, 1130], which ends on a bump. The largest wing loading among the least
    // loadings is 1100, where the sine turns positive (within 1.6e-6 Pa, the 1e-9 tie band over its slope).
    const comb: RequiredLoading = (w) => 1 + 0.01 * Math.max(0, Math.sin((2 * Math.PI * w) / 100));
    const found = findOptimum([comb], Infinity, [100, 1130])!;
    assertRelative(found.wingLoadingPa, 1100, 1e-8);
    expect(found.loading).toBeLessThanOrEqual(1 + 1e-9);
    expect(found.unbounded).toBe(false);
  });

  it('takes the far end of a flat jet boundary whose rounding wobbles, up to where a rising curve crosses it', () => {
    // A jet flown at its best lift-to-drag speed, q = w sqrt(K/C_D0), needs T/W = q C_D0/w + K w/q = 2 sqrt(K C_D0)
    // at every wing loading (Anderson, Introduction to Flight, from memory): flat, but computed through q it
    // wobbles by a few 1e-16, making many grid-scale local minima. A curve 2 sqrt(K C_D0) (w/1000)^2 rises
    // through it at exactly 1000 Pa, so every w <= 1000 ties and the rule takes 1000.
    const cd0 = 0.018;
    const k = 1 / (Math.PI * 0.82 * 8.4);
    const flat: RequiredLoading = (w) => {
      const q = w * Math.sqrt(k / cd0);
      return (q * cd0) / w + (k * w) / q;
    };
    const level = 2 * Math.sqrt(k * cd0);
    const rising: RequiredLoading = (w) => level * (w / 1000) ** 2;
    const found = findOptimum([flat, rising], Infinity, [200, 1500])!;
    assertRelative(found.wingLoadingPa, 1000, 1e-8);
    assertRelative(found.loading, level, 1e-9);
  });
});
