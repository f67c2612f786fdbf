/**
 * The default wing-loading range, rule by rule (the rules are stated at the
 * top of core/diagram/default-range.ts; core/methods.md section 7). Every
 * expected range is worked out by hand in the comment beside it.
 */
import { describe, expect, it } from 'vitest';
import { defaultWingLoadingRange } from '../../../core/diagram/default-range';

describe('defaultWingLoadingRange, by hand', () => {
  it('a limit alone: 1.3 x the largest limit, a tenth of that below, rounded to two figures', () => {
    // hi = 1.3 x 1000 = 1300; lo = 130 (no curve to steepen); both already two figures.
    expect(defaultWingLoadingRange([], [1000])).toEqual([130, 1300]);
    // hi = 1.3 x 1234 = 1604.2 -> up to 1700; lo = 160.42 -> down to 160.
    expect(defaultWingLoadingRange([], [1234, 900])).toEqual([160, 1700]);
  });

  it('ignores limits that are not finite and positive', () => {
    // No usable limit and no curve: the envelope is 0 everywhere, its lowest point ties to the
    // largest searched wing loading 10 kPa, hi = min(max(2 x 10000, 250), 20000) = 20000, lo = 2000.
    expect(defaultWingLoadingRange([], [Infinity, 0, -5])).toEqual([2000, 20000]);
  });

  it('nothing can be met anywhere: 150 psf above (1 psf = 47.880259 Pa, NIST SP 811)', () => {
    // hi = 150 x 47.880259 = 7182.04 -> up to 7200; lo = 718.204 -> down to 710.
    expect(defaultWingLoadingRange([() => NaN], [])).toEqual([710, 7200]);
  });

  it('a rising curve: twice its lowest point at 50 Pa is raised to the 250 Pa floor', () => {
    // lowest at 50 Pa: hi = max(100, 250) = 250; lo = 25, where y = 25 <= 5 x 25 already.
    expect(defaultWingLoadingRange([(w) => w], [])).toEqual([25, 250]);
  });

  it('a falling curve: capped at 20 kPa, the lower end raised to where it has climbed to 5 x its lowest', () => {
    // y = 1e6/w lowest at 10 kPa: hi = min(20000, 20000); lo = 2000 with 81 points 225 Pa apart.
    // Lowest y = 1e6/20000 = 50; y <= 250 from w = 4000, first at point 9 (4025 Pa); one point
    // back: 2000 + 8 x 225 = 3800.
    expect(defaultWingLoadingRange([(w) => 1e6 / w], [])).toEqual([3800, 20000]);
  });

  it('a valley: twice the lowest point of the 61-point log grid over 50 Pa to 10 kPa', () => {
    // y = w/1000 + 1000/w is least at 1000 Pa. Grid points w_i = 50 x 200^(i/60): i = 33 gives
    // 921.6 Pa (y = 2.0067), i = 34 gives 1006.7 Pa (y = 2.00004), the lower. hi = 2013.4 -> 2100;
    // lo = 201.3 with y = 5.17 <= 5 x 2.0 -> 200.
    expect(defaultWingLoadingRange([(w) => w / 1000 + 1000 / w], [])).toEqual([200, 2100]);
  });

  it('uses the curves that can be met when their envelope never can', () => {
    // Envelope of [NaN, w] is NaN everywhere; the defined envelope is w: as the rising curve.
    expect(defaultWingLoadingRange([() => NaN, (w) => w], [])).toEqual([25, 250]);
  });

  it('starts just left of where a curve begins to be met', () => {
    // y = w from 400 Pa, NaN below. Lowest on the log grid at i = 24: 50 x 200^0.4 = 416.4 Pa,
    // hi = 832.7 -> 840. lo = 83.27, points 9.368 Pa apart; the first point that is met is
    // number 34 (401.8 Pa); one back: 83.27 + 33 x 9.368 = 392.4 -> 390.
    expect(defaultWingLoadingRange([(w) => (w < 400 ? NaN : w)], [])).toEqual([390, 840]);
  });

  it('widens both ends to keep a design point inside: 1.1 x above, 0.9 x below', () => {
    // hi = max(250, 1.1 x 5000) = 5500.
    expect(defaultWingLoadingRange([(w) => w], [], 5000)).toEqual([25, 5500]);
    // lo = min(130, 0.9 x 10) = 9.
    expect(defaultWingLoadingRange([], [1000], 10)).toEqual([9, 1300]);
    // A design point inside changes nothing; one that is not finite and positive is ignored.
    expect(defaultWingLoadingRange([], [1000], 500)).toEqual([130, 1300]);
    expect(defaultWingLoadingRange([], [1000], NaN)).toEqual([130, 1300]);
    expect(defaultWingLoadingRange([], [1000], -5000)).toEqual([130, 1300]);
    expect(defaultWingLoadingRange([], [1000], 0)).toEqual([130, 1300]);
  });

  it('ignores an infinite design point', () => {
    expect(defaultWingLoadingRange([], [1000], Infinity)).toEqual([130, 1300]);
  });

  it('a curve whose lowest value is zero leaves the lower end at a tenth of the upper', () => {
    // y = max(0, 5000 - w): no limit; the log grid's lowest (0) ties to 10 kPa, hi = 20000, lo = 2000.
    // Lowest y on [2000, 20000] is 0, so there is no "5 x lowest" to climb to: lo stays 2000.
    expect(defaultWingLoadingRange([(w) => Math.max(0, 5000 - w)], [])).toEqual([2000, 20000]);
  });

  it('raises the lower end from the true lowest value of the curve, not the last one', () => {
    // Limit 1000 Pa: hi = 1300, lo = 130, points 14.625 Pa apart. y = (w - 650)^2/1000 + 1 is
    // least (about 1) near 650 Pa; y <= 5 x 1 where |w - 650| <= 63.2, i.e. from 586.8 Pa: first
    // at point 32 (598 Pa); one back: 130 + 31 x 14.625 = 583.4 -> 580.
    expect(defaultWingLoadingRange([(w) => (w - 650) ** 2 / 1000 + 1], [1000])).toEqual([580, 1300]);
  });

  it('on the log grid, ties (relative 1e-9) go to the largest wing loading, measured from the lowest value', () => {
    // A flat curve ties everywhere: 10 kPa, hi = 20000, lo = 2000.
    expect(defaultWingLoadingRange([() => 1], [])).toEqual([2000, 20000]);
    // y = 1 + 1e-9 ln(w/50) creeps up: it ties with y(50) = 1 while ln(w/50) <= 1, w <= 135.9 Pa.
    // Last grid point there: 50 x 200^(11/60) = 132.1 Pa; hi = 264.2 -> 270; lo = 26.42 -> 26.
    expect(defaultWingLoadingRange([(w) => 1 + 1e-9 * Math.log(w / 50)], [])).toEqual([26, 270]);
  });
});
