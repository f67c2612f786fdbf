/**
 * Values so large or so small that the methods would overflow to Infinity or
 * vanish are refused as input, naming the value. Double precision holds
 * magnitudes up to about 1.8e308 (Number.MAX_VALUE, ECMAScript 2024 §21.1.2.7;
 * IEEE 754 binary64); 1e308 lb is 4.5e307 kg, whose weight (times 9.81 m/s^2)
 * is already past it.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { parseQuantity } from '../../../core/units/quantity';

describe('quantities too large or too small to compute with', () => {
  it('refuses 1e308 lb (its weight in newtons overflows double precision)', () => {
    expect(1e308 * 0.45359237 * 9.80665).toBe(Infinity);
    const parsed = parseQuantity('1e308 lb', 'mass');
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toMatch(/^"1e308 lb" is too large a number to compute with/);
  });

  it('refuses a subnormal wing loading (5e-324 is the smallest positive double)', () => {
    const parsed = parseQuantity('5e-324 N/m^2', 'wingLoading');
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toMatch(/too small a number/);
  });

  it('refuses a huge bare ratio as well', () => {
    expect(parseQuantity(1e200, 'thrustToWeight').ok).toBe(false);
  });

  it('still accepts ordinary values and zero', () => {
    // 750 kg (common practice: a two-seat trainer) and a zero increment.
    expect(parseQuantity('750 kg', 'mass')).toEqual({ ok: true, value: 750 });
    expect(parseQuantity('0 %', 'fraction')).toEqual({ ok: true, value: 0 });
  });
});
