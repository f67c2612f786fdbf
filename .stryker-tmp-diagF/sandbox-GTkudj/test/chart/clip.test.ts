// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { clipToBand, valueAt } from '../../app/chart/clip';

describe('clipToBand', () => {
  it('keeps a series that stays inside the band unchanged', () => {
    expect(clipToBand([[0, 1], [1, 2], [2, 3]], 0, 10)).toEqual([[[0, 1], [1, 2], [2, 3]]]);
  });

  it('cuts a series where it leaves the band, at the exact crossing', () => {
    // y = 20 - 10x crosses y = 10 at x = 1 (plain line geometry).
    expect(clipToBand([[0, 20], [2, 0]], 0, 10)).toEqual([[[1, 10], [2, 0]]]);
  });

  it('splits at gaps and where the series leaves and comes back', () => {
    const runs = clipToBand([[0, 5], [1, 15], [2, 5], [3, null], [4, 5], [5, 6]], 0, 10);
    expect(runs).toEqual([
      [[0, 5], [0.5, 10]],
      [[1.5, 10], [2, 5]],
      [[4, 5], [5, 6]],
    ]);
  });

  it('drops a series entirely above the band', () => {
    expect(clipToBand([[0, 50], [1, 40]], 0, 10)).toEqual([]);
  });
});

describe('valueAt', () => {
  it('interpolates linearly between samples and is null next to a gap or outside', () => {
    const samples: Array<[number, number | null]> = [[0, 0], [10, 10], [20, null]];
    expect(valueAt(samples, 2.5)).toBe(2.5);
    expect(valueAt(samples, 10)).toBe(10);
    expect(valueAt(samples, 15)).toBeNull();
    expect(valueAt(samples, -1)).toBeNull();
    expect(valueAt(samples, 25)).toBeNull();
  });
});
