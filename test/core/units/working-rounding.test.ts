/**
 * How the working unit mix (knots, feet, ft/min) rounds what it shows, at the
 * edges of its rules, and the sign of a margin that rounds to a tenth of a per cent.
 */
import { describe, expect, it } from 'vitest';
import { formatMargin, formatQuantity } from '../../../core/units/display';

// 1 kt = 1852/3600 m/s, 1 ft = 0.3048 m (NIST SP 811, Appendix B).
const KT = 1852 / 3600;
const FT = 0.3048;

describe("formatQuantity in 'kt-ft' at the edges of its rounding", () => {
  it('shows whole knots from 10 kt up, and three figures below', () => {
    expect(formatQuantity(10 * KT, 'speed', 'kt-ft')).toBe('10 kt');
    expect(formatQuantity(9.5 * KT, 'speed', 'kt-ft')).toBe('9.50 kt');
  });

  it('shows a length of many feet to the foot, not to three figures', () => {
    // 12,345 ft = 3,762.756 m.
    expect(formatQuantity(12345 * FT, 'length', 'kt-ft')).toBe('12,345 ft');
    expect(formatQuantity(12345 * FT, 'altitude', 'kt-ft')).toBe('12,345 ft');
  });

  it('writes flight levels for altitudes only: a 3,000 ft runway is not FL030', () => {
    // A flight level is a pressure altitude (ICAO Annex 2; common practice); lengths stay in feet.
    expect(formatQuantity(3000 * FT, 'length', 'kt-ft')).toBe('3,000 ft');
    expect(formatQuantity(3000 * FT, 'altitude', 'kt-ft')).toBe('FL030');
  });
});

describe('formatMargin: a margin shown as non-zero always carries its sign', () => {
  it('a margin of 0.05 % rounds to 0.1 % and is signed like every other', () => {
    // 0.0005 x 100 is the double just above 0.05, which toFixed(1) rounds to "0.1" (ECMA-262 Number.prototype.toFixed).
    expect((0.0005 * 100).toFixed(1)).toBe('0.1');
    expect(formatMargin(0.0005)).toBe('+0.1 %');
    expect(formatMargin(-0.0005)).toBe('−0.1 %');
  });

  it('a margin that rounds to zero has no sign', () => {
    expect(formatMargin(0.00049)).toBe('0.0 %');
    expect(formatMargin(-0.00049)).toBe('0.0 %');
    expect(formatMargin(0)).toBe('0.0 %');
  });
});
