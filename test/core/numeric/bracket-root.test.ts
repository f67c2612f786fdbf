import { describe, expect, it } from 'vitest';
import { fallingRoot } from '../../../core/numeric/bracket-root';
import { assertRelative } from '../helpers/asserts';

// Check values are hand derivations: the roots of simple falling functions
// whose zero is known in closed form.
describe('fallingRoot', () => {
  it('finds sqrt(2) as the zero of 2 - x^2 to the stated 1e-10 relative width', () => {
    // 2 - x^2 = 0 at x = sqrt 2 = 1.41421356237... (hand derivation)
    const x = fallingRoot((v) => 2 - v * v, 0.1, 0.3, 100);
    assertRelative(x, Math.SQRT2, 2e-10, 'root');
  });

  it('widens the upper bracket by doubling until the function is negative', () => {
    // 1000 - x is zero at 1000, far right of the first bracket end 1 (hand derivation).
    assertRelative(fallingRoot((v) => 1000 - v, 0.5, 1, 1e6), 1000, 1e-9, 'root');
  });

  it('stops the widening at maxHigh: NaN when the zero lies beyond it', () => {
    // 3 - x is zero at 3; the bracket 1 -> 2 -> min(2.5, 4) = 2.5 never reaches it.
    expect(fallingRoot((v) => 3 - v, 0.5, 1, 2.5)).toBeNaN();
  });

  it('tries maxHigh itself as the last upper end: a zero between the last doubling and maxHigh is found', () => {
    // 2.4 - x: the bracket 1 -> 2 -> 2.5 (maxHigh) brackets the zero at 2.4.
    assertRelative(fallingRoot((v) => 2.4 - v, 0.5, 1, 2.5), 2.4, 1e-9, 'root');
  });

  it('counts zero as reached: the first x where a clipped function is zero', () => {
    // max(0, 1 - x) is positive below 1 and zero from 1 on, never negative: the crossing is x = 1.
    assertRelative(fallingRoot((v) => Math.max(0, 1 - v), 0.25, 0.5, 8), 1, 1e-9, 'root');
  });

  it('counts NaN as not yet reached: the crossing is where the function first becomes a non-positive number', () => {
    // NaN below 1.5, -1 from 1.5 on: the crossing is x = 1.5.
    assertRelative(fallingRoot((v) => (v < 1.5 ? NaN : -1), 0.25, 0.5, 8), 1.5, 1e-9, 'root');
  });

  it('is NaN when the function is already non-positive at the low end', () => {
    expect(fallingRoot((v) => 1 - v, 2, 4, 8)).toBeNaN();
    // Zero at the low end counts as reached already.
    expect(fallingRoot((v) => 1 - v, 1, 4, 8)).toBeNaN();
  });

  it('is NaN for an empty bracket (low not below high)', () => {
    expect(fallingRoot((v) => 5 - v, 2, 2, 8)).toBeNaN();
    expect(fallingRoot((v) => 5 - v, 3, 2, 8)).toBeNaN();
  });

  it('returns a crossing inside (low, high] without widening when high already brackets it', () => {
    // 0.3 - x on [0.1, 1]: zero at 0.3 (hand derivation).
    assertRelative(fallingRoot((v) => 0.3 - v, 0.1, 1, 1), 0.3, 1e-9, 'root');
  });

  it('bisects to 1e-10 of the upper end, also when the root is much below 1', () => {
    // 0.003 - x on [1e-4, 1e-3], widened to 2e-3 then 4e-3: zero at 0.003 (hand derivation).
    assertRelative(fallingRoot((v) => 0.003 - v, 1e-4, 1e-3, 1), 0.003, 1e-9, 'root');
  });
});
