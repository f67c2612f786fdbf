/**
 * The working mix of knots and feet, and the three-figure and margin
 * formats, against conversions worked by hand with the NIST SP 811 factors
 * (1 ft = 0.3048 m, 1 kt = 1852/3600 m/s, exact).
 */
import { describe, expect, it } from 'vitest';
import { formatMargin, formatQuantity, fromDisplay, threeFigures, toDisplay } from '../../../core/units/display';

describe("formatQuantity in 'kt-ft'", () => {
  it('writes an altitude of whole hundreds of feet from 3,000 ft as a flight level', () => {
    // 37,000 ft = 11,277.6 m; 3,000 ft = 914.4 m (common practice: FL from the transition altitude).
    expect(formatQuantity(11277.6, 'altitude', 'kt-ft')).toBe('FL370');
    expect(formatQuantity(914.4, 'altitude', 'kt-ft')).toBe('FL030');
  });

  it('writes other altitudes in whole feet', () => {
    // 2,900 ft = 883.92 m (below 3,000 ft); 3,050 ft = 929.64 m (not whole hundreds);
    // 100,000 ft = 30,480 m (FL1000 would need four digits).
    expect(formatQuantity(883.92, 'altitude', 'kt-ft')).toBe('2,900 ft');
    expect(formatQuantity(929.64, 'altitude', 'kt-ft')).toBe('3,050 ft');
    expect(formatQuantity(30480, 'altitude', 'kt-ft')).toBe('100,000 ft');
  });

  it('writes speeds, lengths and climb rates as whole knots, feet and ft/min from 10 on', () => {
    // 100 kt = 51.4444 m/s; 1,500 ft = 457.2 m; 1,000 ft/min = 5.08 m/s.
    expect(formatQuantity(100 * (1852 / 3600), 'speed', 'kt-ft')).toBe('100 kt');
    expect(formatQuantity(457.2, 'length', 'kt-ft')).toBe('1,500 ft');
    expect(formatQuantity(5.08, 'climbRate', 'kt-ft')).toBe('1,000 ft/min');
    // Below 10 the three-figure rule keeps the decimals: 5 kt = 2.5722 m/s.
    expect(formatQuantity(5 * (1852 / 3600), 'speed', 'kt-ft')).toBe('5.00 kt');
  });

  it('keeps SI for wing loading, power and thrust, to three figures', () => {
    expect(formatQuantity(1234.5, 'wingLoading', 'kt-ft')).toBe('1,230 N/m²');
    expect(formatQuantity(80_900, 'power', 'kt-ft')).toBe('80.9 kW');
    expect(formatQuantity(0.3104, 'thrustToWeight', 'kt-ft')).toBe('0.310');
    expect(toDisplay(812, 'wingLoading', 'kt-ft')).toBe(812);
  });

  it('converts speeds to knots and back (1 kt = 1852/3600 m/s, NIST SP 811)', () => {
    expect(toDisplay(1852 / 3600, 'speed', 'kt-ft')).toBeCloseTo(1, 12);
    expect(fromDisplay(1, 'speed', 'kt-ft')).toBeCloseTo(1852 / 3600, 12);
    expect(fromDisplay(1000, 'climbRate', 'kt-ft')).toBeCloseTo(5.08, 12);
  });
});

describe('threeFigures', () => {
  it('rounds to three significant figures with separators and no exponent', () => {
    expect(threeFigures(0)).toBe('0');
    expect(threeFigures(1234.5)).toBe('1,230');
    expect(threeFigures(0.012345)).toBe('0.0123');
    expect(threeFigures(-45.67)).toBe('-45.7');
    expect(threeFigures(9.996)).toBe('10.0');
    expect(threeFigures(1.5e-9)).toBe('0.000000');
  });
});

describe('formatMargin', () => {
  it('signs margins beyond +/-0.05 % and shows smaller ones unsigned', () => {
    expect(formatMargin(0.0004)).toBe('0.0 %');
    expect(formatMargin(-0.0004)).toBe('0.0 %');
    expect(formatMargin(0.0006)).toBe('+0.1 %');
    expect(formatMargin(-0.0006)).toBe('−0.1 %');
    expect(formatMargin(-0.25)).toBe('−25.0 %');
  });
});

describe('formatQuantity in SI and US: decimals', () => {
  it('caps the decimals at six for tiny values', () => {
    // 1e-9 W/N has no significant figure within six decimals.
    expect(formatQuantity(1e-9, 'powerToWeight', 'si')).toBe('0.000000 W/N');
  });
  it('shows a negative value with its sign and the usual decimals', () => {
    expect(formatQuantity(-812.3, 'wingLoading', 'si')).toBe('-812 N/m²');
  });
});
