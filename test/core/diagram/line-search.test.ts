/**
 * The one-dimensional searches under the optimum, against functions whose
 * minimum or crossing is known in closed form (hand derivations).
 */
import { describe, expect, it } from 'vitest';
import { goldenMinimum, lastWithin, tieBand } from '../../../core/diagram/line-search';
import { assertInDelta } from '../helpers/asserts';

describe('tieBand', () => {
  it('is y + |y| x relative, above y for negative values too', () => {
    expect(tieBand(2, 0.5)).toBe(3);
    expect(tieBand(-2, 0.5)).toBe(-1);
    expect(tieBand(0, 0.5)).toBe(0);
  });
});

describe('goldenMinimum (Kiefer 1953)', () => {
  it('finds the vertex of (x - 2)^2 + 1 on [0, 5] to the stated 1e-7 relative width', () => {
    const [x, y] = goldenMinimum((v) => (v - 2) ** 2 + 1, 0, 5);
    assertInDelta(x, 2, 1e-6, 'x');
    assertInDelta(y, 1, 1e-12, 'y');
  });

  it('finds a minimum near the left end and near the right end', () => {
    // (x - 0.3)^2 on [0, 10] and (x - 9.6)^2 on [0, 10]: vertices at 0.3 and 9.6.
    assertInDelta(goldenMinimum((v) => (v - 0.3) ** 2, 0, 10)[0], 0.3, 1e-5, 'left');
    assertInDelta(goldenMinimum((v) => (v - 9.6) ** 2, 0, 10)[0], 9.6, 1e-5, 'right');
  });

  it('returns f at the point it returns', () => {
    const [x, y] = goldenMinimum((v) => Math.abs(v - 4.25) + 7, 1, 9);
    expect(y).toBe(Math.abs(x - 4.25) + 7);
    assertInDelta(x, 4.25, 1e-5, 'x');
  });

  it('counts NaN as +Infinity: the minimum right of a region that cannot be met', () => {
    // NaN below 3, (x - 2)^2 from 3 on: the least finite value is at x = 3 (the function's edge).
    const [x, y] = goldenMinimum((v) => (v < 3 ? NaN : (v - 2) ** 2), 0, 10);
    assertInDelta(x, 3, 1e-5, 'x');
    expect(Number.isFinite(y)).toBe(true);
  });
});

describe('lastWithin', () => {
  it('bisects to the end of a plateau: f <= limit up to 10, above after', () => {
    const f = (v: number) => (v <= 10 ? 1 : 2);
    assertInDelta(lastWithin(f, 5, 20, 1), 10, 1e-7, 'end');
  });

  it('returns `from` when the point just right of it is already above the limit (a strict minimum)', () => {
    expect(lastWithin((v) => v, 5, 20, 5)).toBe(5);
  });

  it('returns `to` when the whole interval is within the limit', () => {
    expect(lastWithin(() => 1, 5, 20, 1)).toBe(20);
  });

  it('finds a crossing close right of `from`: the probe 1e-4 x from must not overshoot it', () => {
    // f = v is within 5.0002 up to 5.0002; from 5 the probe is 5.0005, above the limit: from is returned.
    expect(lastWithin((v) => v, 5, 20, 5.0002)).toBe(5);
    // Within up to 12 (probe 5.0005 qualifies): the bisection finds 12.
    assertInDelta(lastWithin((v) => v, 5, 20, 12), 12, 1e-7, 'crossing');
  });

  it('never returns more than `to` even when the probe would pass it', () => {
    // to = 5.0001 < probe 5.0005; the whole interval qualifies.
    expect(lastWithin(() => 0, 5, 5.0001, 0)).toBe(5.0001);
  });

describe('line searches at small scales (relative stopping rules)', () => {
  it('goldenMinimum stops at 1e-7 of b, also when b is much below 1', () => {
    // (x - 0.004)^2 on [0, 0.01]: vertex 0.004; width 1e-7 x 0.01 = 1e-9 at the end (hand derivation).
    assertInDelta(goldenMinimum((v) => (v - 0.004) ** 2, 0, 0.01)[0], 0.004, 1e-8, 'x');
  });

  it('goldenMinimum counts NaN right of the minimum as +Infinity too', () => {
    // Finite (x - 4)^2 up to 3, NaN beyond: the least finite value is at the edge x = 3.
    assertInDelta(goldenMinimum((v) => (v > 3 ? NaN : (v - 4) ** 2), 0, 10)[0], 3, 1e-5, 'x');
  });

  it('lastWithin bisects to 1e-9 of the upper end, also when it is much below 1', () => {
    // Within the limit up to 0.004 on [0.001, 0.01]: final width 1e-9 x 0.004 (hand derivation).
    assertInDelta(lastWithin((v) => (v <= 0.004 ? 1 : 2), 0.001, 0.01, 1), 0.004, 1e-10, 'end');
  });
});
});
