/**
 * Numbers as the requirement summaries print them: plain figures rounded to
 * a few decimals, fractions as per cent, and a dash, never "NaN", for a value
 * that is not a number (the product's rule for anything on a screen).
 */
import { describe, expect, it } from 'vitest';
import { percent, plain } from '../../../core/requirements/fields';

describe('number text of the summaries', () => {
  it('prints plain figures to two decimals unless told, without trailing zeros', () => {
    expect(plain(1.2)).toBe('1.2');
    expect(plain(1.23456)).toBe('1.23');
    expect(plain(0.0251, 3)).toBe('0.025');
    expect(plain(2)).toBe('2');
  });

  it('prints a fraction as per cent to two decimals', () => {
    // 14 CFR 25.121(b): 2.4 % for twins is the fraction 0.024.
    expect(percent(0.024)).toBe('2.4 %');
    expect(percent(0.08333)).toBe('8.33 %');
    expect(percent(1)).toBe('100 %');
  });

  it('prints a dash for what is not a finite number', () => {
    for (const value of [NaN, Infinity, -Infinity]) {
      expect(plain(value)).toBe('—');
      expect(percent(value)).toBe('—');
    }
  });
});
