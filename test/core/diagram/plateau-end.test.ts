/**
 * The end of a plateau just right of where the search stands: lastWithin must
 * find it by bisection, not stop at its first probe (1e-4 x from to the right).
 * The optimum's tie rule (core/methods.md section 7: ties go to the largest
 * wing loading) rests on it.
 */
import { describe, expect, it } from 'vitest';
import { lastWithin } from '../../../core/diagram/line-search';
import { assertInDelta } from '../helpers/asserts';

describe('lastWithin on a plateau', () => {
  it('bisects to a plateau end closer to `from` than its first probe', () => {
    // f = 1 up to 10.0005, 2 after; from 10 the probe is 10.001, beyond the end, but f is level left of 10
    // (9.999 gives 1): the largest w with f <= 1 is 10.0005, to the bisection's 1e-9 x 10.001.
    const f = (v: number) => (v <= 10.0005 ? 1 : 2);
    assertInDelta(lastWithin(f, 10, 20, 1), 10.0005, 1e-7, 'end');
  });

  it('bisects to the plateau end when the interval is shorter than the probe step', () => {
    // to = 10.0008 < probe 10.001 and above the limit; the plateau ends at 10.0003.
    const f = (v: number) => (v <= 10.0003 ? 1 : 2);
    assertInDelta(lastWithin(f, 10, 10.0008, 1), 10.0003, 1e-7, 'end');
  });

  it('still stops at a strict minimum, rising on both sides', () => {
    // (v - 10)^2 + 1 with limit 1 + 1e-9: only |v - 10| <= 3.2e-5 qualifies; the probes 1e-3 either side do not.
    expect(lastWithin((v) => (v - 10) ** 2 + 1, 10, 20, 1 + 1e-9)).toBe(10);
  });

  it('still stops where f falls to the left of `from` (the left end of a rising envelope)', () => {
    // f = v from 5 with limit 5 (1 + 1e-9): left of 5 is lower, not level, so `from` is the answer's start and
    // the right probe 5.0005 is above the limit.
    expect(lastWithin((v) => v, 5, 20, 5 * (1 + 1e-9))).toBe(5);
  });
});
