/**
 * The bound messages of a field with a unit, for limits other than zero: the
 * limit is shown in SI with six significant figures, and what was written
 * beside its SI value. Conversions: 1 kt = 1852/3600 m/s, 1 ft = 0.3048 m
 * (NIST SP 811).
 */
import { describe, expect, it } from 'vitest';
import { quantityProblem } from '../../../core/concept/quantity-field';

describe('quantityProblem with a limit other than zero', () => {
  it('"greater than" a speed: 10 kt is 5.14444 m/s, not above 20 m/s', () => {
    // 10 x 1852 / 3600 = 5.144444... m/s.
    expect(quantityProblem('10 kt', 'speed', { above: 20 })).toBe('must be greater than 20 m/s (got "10 kt" = 5.14444 m/s)');
    expect(quantityProblem('40 kt', 'speed', { above: 20 })).toBeUndefined();
  });

  it('"greater than 0" when the limit is zero', () => {
    expect(quantityProblem('0 kt', 'speed', { above: 0 })).toBe('must be greater than 0 (got "0 kt" = 0 m/s)');
  });

  it('"at least" a length: 100 ft is 30.48 m', () => {
    expect(quantityProblem('100 ft', 'length', { from: 50 })).toBe('must be at least 50 m (got "100 ft" = 30.48 m)');
  });
});
