import { describe, expect, it } from 'vitest';
import { largerRoot } from '../../../core/numeric/quadratic';

describe('the larger root of a quadratic (Numerical Recipes, 3rd ed., section 5.6)', () => {
  it('gives the roots of quadratics with known roots', () => {
    // (x - 1)(x - 2), (x + 1)(x + 2), 2(x - 2)(x + 2) with b = 0, (x - 3)^2 twice over: worked by hand.
    expect(largerRoot(1, -3, 2)).toBeCloseTo(2, 14);
    expect(largerRoot(1, 3, 2)).toBeCloseTo(-1, 14);
    expect(largerRoot(2, 0, -8)).toBeCloseTo(2, 14);
    expect(largerRoot(1, -6, 9)).toBeCloseTo(3, 14);
    // Roots of opposite sign (c < 0): the positive one, with b either way.
    expect(largerRoot(1, 1, -6)).toBeCloseTo(2, 14);
    expect(largerRoot(1, -1, -6)).toBeCloseTo(3, 14);
  });

  it('keeps its digits when b^2 is much larger than 4ac', () => {
    // x^2 + 1e8 x - 1 = 0: the small root is 1/(1e8 + 1e-8) to 16 figures; the schoolbook formula
    // (-b + sqrt(b^2 - 4ac))/2a cancels to about 7.45e-9 here, 25 % off.
    expect(largerRoot(1, 1e8, -1)).toBeCloseTo(1e-8, 22);
    expect(Math.abs(largerRoot(1, 1e8, -1) - 1e-8) / 1e-8).toBeLessThan(1e-12);
    // Mirrored: x^2 - 1e8 x - 1 = 0, larger root 1e8 + 1e-8.
    expect(largerRoot(1, -1e8, -1) / 1e8 - 1).toBeLessThan(1e-15);
  });

  it('is NaN when the roots are not real', () => {
    expect(largerRoot(1, 0, 1)).toBeNaN();
    expect(largerRoot(1, 1, 1)).toBeNaN();
    expect(largerRoot(1, NaN, -1)).toBeNaN();
  });
});
