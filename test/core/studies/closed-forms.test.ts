/**
 * The studies' small pure pieces against closed forms and hand counts:
 * - nearest-rank percentiles: the ceil(pN)-th smallest value (NIST/SEMATECH
 *   e-Handbook of Statistical Methods, section 7.2.6.2, and common practice);
 * - the triangular distribution's inverse CDF on [a, b] with mode c:
 *   F^-1(u) = a + sqrt(u (b-a)(c-a)) for u < (c-a)/(b-a), else
 *   b - sqrt((1-u)(b-a)(b-c)) (Kotz and van Dorp, Beyond Beta, 2004, ch. 1);
 *   its median for c below the middle is b - sqrt((b-a)(b-c)/2);
 * - the uniform inverse CDF a + u (b - a);
 * - corners of a k-dimensional box: 2^k of them (common practice);
 * - linear interpolation of a probability contour between grid rows (by hand).
 */
import { describe, expect, it } from 'vitest';
import { cornerValues, MAX_CORNER_PARAMETERS, probabilityFrontier, quantile, spreadOf, triangularQuantile, uniformQuantile, type UncertainParameter } from '../../../core/studies';

describe('spreadOf: mean and nearest-rank percentiles', () => {
  it('1..20 shuffled: mean 10.5; ranks ceil(0.05 x 20) = 1, ceil(0.5 x 20) = 10, ceil(0.95 x 20) = 19', () => {
    const values = [7, 19, 3, 20, 1, 14, 10, 2, 16, 5, 11, 18, 4, 13, 8, 17, 6, 12, 9, 15];
    expect(spreadOf(values)).toEqual({ mean: 10.5, p5: 1, p50: 10, p95: 19 });
  });

  it('1..21: ranks ceil(1.05) = 2, ceil(10.5) = 11, ceil(19.95) = 20', () => {
    const values = Array.from({ length: 21 }, (_, i) => 21 - i);
    expect(spreadOf(values)).toEqual({ mean: 11, p5: 2, p50: 11, p95: 20 });
  });

  it('sorts numerically, not as text: 9 is below 10 and 100', () => {
    expect(spreadOf([100, 9, 10])).toEqual({ mean: 119 / 3, p5: 9, p50: 10, p95: 100 });
  });

  it('handles negative values and a single value', () => {
    expect(spreadOf([-3, -1, -2])).toEqual({ mean: -2, p5: -3, p50: -2, p95: -1 });
    expect(spreadOf([4.5])).toEqual({ mean: 4.5, p5: 4.5, p50: 4.5, p95: 4.5 });
  });

  it('leaves out NaN and infinities, and is NaN throughout with no finite value', () => {
    expect(spreadOf([NaN, 2, Infinity, 4, -Infinity, 6])).toEqual({ mean: 4, p5: 2, p50: 4, p95: 6 });
    const none = spreadOf([NaN, Infinity]);
    expect(none.mean).toBeNaN();
    expect(none.p5).toBeNaN();
    expect(none.p50).toBeNaN();
    expect(none.p95).toBeNaN();
    expect(spreadOf([]).mean).toBeNaN();
  });

  it('reads a Float64Array and leaves it unchanged', () => {
    const values = Float64Array.from([3, 1, 2]);
    expect(spreadOf(values)).toEqual({ mean: 2, p5: 1, p50: 2, p95: 3 });
    expect(Array.from(values)).toEqual([3, 1, 2]);
  });
});

describe('inverse CDFs', () => {
  it('uniform: a + u (b - a)', () => {
    expect(uniformQuantile(0.25, 2, 10)).toBe(4);
    expect(quantile(0.25, 'uniform', 2, 9, 10)).toBe(4);
  });

  it('triangular on [0, 4] with mode 1: below and above the split at 1/4, by the closed form', () => {
    // u = 0.1 < 0.25: 0 + sqrt(0.1 x 4 x 1) = sqrt(0.4).
    expect(triangularQuantile(0.1, 0, 1, 4)).toBeCloseTo(Math.sqrt(0.4), 14);
    // u = 0.25 is the mode itself.
    expect(triangularQuantile(0.25, 0, 1, 4)).toBeCloseTo(1, 14);
    // Median: 4 - sqrt(4 x 3 / 2) = 4 - sqrt(6).
    expect(triangularQuantile(0.5, 0, 1, 4)).toBeCloseTo(4 - Math.sqrt(6), 14);
    // u = 0.9: 4 - sqrt(0.1 x 4 x 3) = 4 - sqrt(1.2).
    expect(triangularQuantile(0.9, 0, 1, 4)).toBeCloseTo(4 - Math.sqrt(1.2), 14);
    expect(quantile(0.9, 'triangular', 0, 1, 4)).toBeCloseTo(4 - Math.sqrt(1.2), 14);
  });

  it('triangular with its mode at an end, and on a range of zero width', () => {
    // Mode at the low end: F^-1(u) = b - sqrt((1-u)(b-a)^2); u = 0.75 on [0, 2]: 2 - sqrt(0.25 x 4) = 1.
    expect(triangularQuantile(0.75, 0, 0, 2)).toBeCloseTo(1, 14);
    // Mode at the high end: F^-1(u) = a + sqrt(u (b-a)^2); u = 0.25 on [0, 2]: sqrt(0.25 x 4) = 1.
    expect(triangularQuantile(0.25, 0, 2, 2)).toBeCloseTo(1, 14);
    expect(triangularQuantile(0.3, 5, 5, 5)).toBe(5);
  });
});

const parameter = (field: string, low: number, nominal: number, high: number) =>
  ({ field, label: field, low, nominal, high, distribution: 'uniform', apply: (d: unknown) => d }) as unknown as UncertainParameter;

describe('cornerValues', () => {
  it('no parameters: only the nominal set', () => {
    expect(cornerValues([])).toEqual({ method: 'corners', sets: [[]] });
  });

  it('two parameters: the nominal set, then the 4 corners, first parameter varying fastest', () => {
    const p = [parameter('a', 1, 2, 3), parameter('b', 10, 20, 30)];
    expect(cornerValues(p)).toEqual({
      method: 'corners',
      sets: [
        [2, 20],
        [1, 10],
        [3, 10],
        [1, 30],
        [3, 30],
      ],
    });
  });

  it('8 parameters: all 2^8 = 256 corners, each once', () => {
    const p = Array.from({ length: MAX_CORNER_PARAMETERS }, (_, i) => parameter(`p${i}`, 0, 0.5, 1));
    const { method, sets } = cornerValues(p);
    expect(MAX_CORNER_PARAMETERS).toBe(8);
    expect(method).toBe('corners');
    expect(sets).toHaveLength(1 + 256);
    expect(new Set(sets.slice(1).map((s) => s.join(''))).size).toBe(256);
  });

  it('9 parameters: one at a time, 3 + 2 x 9 = 21 sets: nominal, all low, all high, then each end alone', () => {
    const p = Array.from({ length: 9 }, (_, i) => parameter(`p${i}`, i, i + 0.5, i + 1));
    const { method, sets } = cornerValues(p);
    expect(method).toBe('one-at-a-time');
    expect(sets).toHaveLength(21);
    expect(sets[0]).toEqual(p.map((q) => q.nominal));
    expect(sets[1]).toEqual(p.map((q) => q.low));
    expect(sets[2]).toEqual(p.map((q) => q.high));
    expect(sets[3]).toEqual([0, 1.5, 2.5, 3.5, 4.5, 5.5, 6.5, 7.5, 8.5]);
    expect(sets[4]).toEqual([1, 1.5, 2.5, 3.5, 4.5, 5.5, 6.5, 7.5, 8.5]);
    expect(sets[20]).toEqual([0.5, 1.5, 2.5, 3.5, 4.5, 5.5, 6.5, 7.5, 9]);
  });
});

describe('probabilityFrontier', () => {
  // Two columns (wing loadings 100 and 200), three rows (loadings 0, 10, 20); probability[j * nx + i].
  const map = {
    wingLoadings: [100, 200],
    loadings: [0, 10, 20],
    probability: [
      0.2, 0.95, // loading 0
      0.6, 0.97, // loading 10
      1.0, 0.99, // loading 20
    ],
  };

  it('interpolates linearly between the rows that straddle the level', () => {
    // Column 0, level 0.5: between 0.2 at 0 and 0.6 at 10: 0 + (0.5 - 0.2)/(0.6 - 0.2) x 10 = 7.5.
    // Column 0, level 0.9: between 0.6 at 10 and 1.0 at 20: 10 + 0.3/0.4 x 10 = 17.5.
    const half = probabilityFrontier(map, 0.5);
    expect(half[0]).toBeCloseTo(7.5, 12);
    const ninety = probabilityFrontier(map, 0.9);
    expect(ninety[0]).toBeCloseTo(17.5, 12);
  });

  it('is the first row where the first row already reaches the level, reached exactly too', () => {
    expect(probabilityFrontier(map, 0.5)[1]).toBe(0);
    expect(probabilityFrontier(map, 0.95)[1]).toBe(0);
    // 0.6 is reached exactly at row 1: 0 + (0.6 - 0.2)/(0.6 - 0.2) x 10 = 10.
    expect(probabilityFrontier(map, 0.6)[0]).toBeCloseTo(10, 12);
  });

  it('takes the first row that reaches the level exactly, even when the next row is equal', () => {
    // One column: 0.2, 0.5, 0.5, 1.0 at loadings 0, 10, 20, 30; level 0.5 is reached at row 1: 0 + (0.3/0.3) x 10 = 10.
    const flat = { wingLoadings: [100], loadings: [0, 10, 20, 30], probability: [0.2, 0.5, 0.5, 1.0] };
    expect(probabilityFrontier(flat, 0.5)[0]).toBeCloseTo(10, 12);
  });

  it('reads the row below in its own column', () => {
    // Column 1, level 0.96: between 0.95 at 0 and 0.97 at 10: (0.96 - 0.95)/(0.97 - 0.95) x 10 = 5.
    expect(probabilityFrontier(map, 0.96)[1]).toBeCloseTo(5, 9);
  });

  it('is NaN where the level is never reached', () => {
    const out = probabilityFrontier(map, 0.995);
    // Column 0: 10 + (0.995 - 0.6)/(1.0 - 0.6) x 10 = 19.875; column 1 tops out at 0.99.
    expect(out[0]).toBeCloseTo(19.875, 12);
    expect(out[1]).toBeNaN();
    expect(out).toHaveLength(2);
  });
});
