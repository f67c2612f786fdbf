import { describe, expect, it } from 'vitest';
import { fallingRoot } from '../../../core/numeric/bracket-root';
import { smoothFallingRoot } from '../../../core/numeric/false-position';
import { assertRelative } from '../helpers/asserts';

// Check values are hand derivations: the roots of simple falling functions whose zero is known in
// closed form, and the same crossing as the bisection of bracket-root.ts.
const counted = (f: (x: number) => number) => {
  let calls = 0;
  return { f: (x: number) => (calls++, f(x)), calls: () => calls };
};

describe('smoothFallingRoot (Illinois false position)', () => {
  it('finds sqrt(2) as the zero of 2 - x^2 to the stated 1e-10 relative width', () => {
    // 2 - x^2 = 0 at x = sqrt 2 = 1.41421356237... (hand derivation)
    assertRelative(smoothFallingRoot((v) => 2 - v * v, 0.1, 0.3, 100), Math.SQRT2, 2e-10, 'root');
  });

  it('finds the zero of a convex falling function, where plain false position keeps one end (10/x - 3 at 10/3)', () => {
    // 10/x - 3 = 0 at x = 10/3 (hand derivation). Plain false position would move only the low end and
    // never meet the width; the Illinois halving makes both ends close in.
    const a = counted((v) => 10 / v - 3);
    assertRelative(smoothFallingRoot(a.f, 0.5, 1, 100), 10 / 3, 1e-10, 'root');
    expect(a.calls()).toBeLessThan(20);
  });

  it('widens the upper bracket by doubling until the function is negative', () => {
    // 1000 - x is zero at 1000, far right of the first bracket end 1 (hand derivation).
    assertRelative(smoothFallingRoot((v) => 1000 - v, 0.5, 1, 1e6), 1000, 1e-9, 'root');
  });

  it('stops the widening at maxHigh: NaN when the zero lies beyond it, found when between the last doubling and maxHigh', () => {
    expect(smoothFallingRoot((v) => 3 - v, 0.5, 1, 2.5)).toBeNaN();
    assertRelative(smoothFallingRoot((v) => 2.4 - v, 0.5, 1, 2.5), 2.4, 1e-9, 'root');
  });

  it('bisects where the not-yet-reached side is not a number: Infinity or NaN below the crossing', () => {
    // Infinity below 1 (no solution there, as a run that never accelerates), then 1/x - 0.5, zero at 2.
    assertRelative(smoothFallingRoot((v) => (v < 1 ? Infinity : 1 / v - 0.5), 0.01, 0.3, 100), 2, 1e-10, 'root');
    // NaN below 1.5, -1 from 1.5 on: the crossing is x = 1.5.
    assertRelative(smoothFallingRoot((v) => (v < 1.5 ? NaN : -1), 0.25, 0.5, 8), 1.5, 1e-9, 'root');
  });

  it('counts zero as reached: the first x where a clipped function is zero', () => {
    // max(0, 1 - x) is positive below 1 and zero from 1 on: the crossing is x = 1.
    assertRelative(smoothFallingRoot((v) => Math.max(0, 1 - v), 0.25, 0.5, 8), 1, 1e-9, 'root');
  });

  it('is NaN when already non-positive at the low end, or for an empty bracket', () => {
    expect(smoothFallingRoot((v) => 1 - v, 2, 4, 8)).toBeNaN();
    expect(smoothFallingRoot((v) => 1 - v, 1, 4, 8)).toBeNaN();
    expect(smoothFallingRoot((v) => 5 - v, 2, 2, 8)).toBeNaN();
    expect(smoothFallingRoot((v) => 5 - v, 3, 2, 8)).toBeNaN();
  });

  it('takes at most 0.7 times the evaluations of bisection on smooth falling functions, with or without a region of no value', () => {
    // Roots by hand: sqrt 2, 10/3, ln 10, e^3, 50^(1/3), 2.
    const cases: Array<[(v: number) => number, number, number, number, number]> = [
      [(v) => 2 - v * v, 0.1, 0.3, 100, Math.SQRT2],
      [(v) => 10 / v - 3, 0.5, 1, 100, 10 / 3],
      [(v) => Math.exp(-v) - 0.1, 1e-3, 0.3, 100, Math.log(10)],
      [(v) => 3 - Math.log(v), 0.5, 1, 1e3, Math.exp(3)],
      [(v) => 50 / v ** 3 - 1, 0.1, 0.3, 1e3, Math.cbrt(50)],
      [(v) => (v < 1 ? Infinity : 1 / v - 0.5), 0.01, 0.3, 100, 2],
    ];
    for (const [f, low, high, most, root] of cases) {
      const fast = counted(f);
      const slow = counted(f);
      assertRelative(smoothFallingRoot(fast.f, low, high, most), root, 1e-9, `root ${root}`);
      fallingRoot(slow.f, low, high, most);
      expect(fast.calls(), `evaluations for the root ${root}`).toBeLessThanOrEqual(0.7 * slow.calls());
    }
  });

  it('closes the bracket at once when a chord lands on the root, as in a take-off mass balance', () => {
    // The mission balance 780/m + 1.02 m^-0.06 + 0.32 - 1 (payload and crew 780 kg, an empty-mass power law,
    // fuel fraction 0.32; core/methods.md section 12): the chords reach the root to the last digit, and the
    // next step, a quarter width inside, brackets it (without that, the other end would be halved in: 28 calls).
    const balance = (m: number) => 780 / m + 1.02 * m ** -0.06 + 0.32 - 1;
    const fast = counted(balance);
    const root = smoothFallingRoot(fast.f, 780, 1560, 1e6);
    assertRelative(root, fallingRoot(balance, 780, 1560, 1e6), 1e-9, 'the bisection root');
    expect(Math.abs(balance(root))).toBeLessThan(1e-12);
    expect(fast.calls()).toBeLessThanOrEqual(16);
  });

  it('takes the first x where the function is zero or less, across a flat zero before it falls below', () => {
    // 1 - x up to 1, then 0 up to 2, then -1: zero is reached at x = 1 (hand derivation), not 2. From the
    // bracket [0.25, 3] the first chord lands in the flat part, at 1.43.
    assertRelative(smoothFallingRoot((v) => (v < 1 ? 1 - v : v < 2 ? 0 : -1), 0.25, 3, 8), 1, 1e-9, 'root');
    assertRelative(smoothFallingRoot((v) => (v < 1 ? 1 - v : v < 2 ? 0 : -1), 0.25, 0.5, 8), 1, 1e-9, 'root');
  });

  it('bisects when the reached side is -Infinity (the chord gives no point inside)', () => {
    // 2 - x up to 2, -Infinity from 2 on: the crossing is x = 2 (hand derivation).
    assertRelative(smoothFallingRoot((v) => (v < 2 ? 2 - v : -Infinity), 0.25, 0.5, 8), 2, 1e-9, 'root');
  });

  it('agrees with bisection to 1e-9 on falling exponentials, logarithms and powers', () => {
    // e^-x - a (zero at -ln a), b - ln x (zero at e^b), c / x^3 - 1 (zero at c^(1/3)): hand derivations.
    for (const a of [0.9, 0.5, 0.1, 1e-3]) assertRelative(smoothFallingRoot((v) => Math.exp(-v) - a, 1e-3, 0.3, 100), -Math.log(a), 1e-9, `e^-x = ${a}`);
    for (const b of [0.5, 1, 3]) assertRelative(smoothFallingRoot((v) => b - Math.log(v), 0.5, 1, 1e3), Math.exp(b), 1e-9, `ln x = ${b}`);
    for (const c of [2, 50, 1e4]) {
      const f = (v: number) => c / v ** 3 - 1;
      assertRelative(smoothFallingRoot(f, 0.1, 0.3, 1e3), Math.cbrt(c), 1e-9, `x^3 = ${c}`);
      assertRelative(smoothFallingRoot(f, 0.1, 0.3, 1e3), fallingRoot(f, 0.1, 0.3, 1e3), 1e-9, `bisection, x^3 = ${c}`);
    }
  });
});
