import fc from 'fast-check';
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import {
  displayUnit,
  fixedDecimals,
  formatMargin,
  formatQuantity,
  fromDisplay,
  toDisplay,
  type DisplayQuantity,
  type UnitSystem,
} from '../../../core/units/display';

const QUANTITIES: DisplayQuantity[] = [
  'wingLoading',
  'powerToWeight',
  'thrustToWeight',
  'area',
  'power',
  'thrust',
  'speed',
  'mass',
  'length',
  'altitude',
  'climbRate',
];
const SYSTEMS: UnitSystem[] = ['si', 'us'];

describe('display conversions', () => {
  it('round-trip SI -> display -> SI for every quantity and system', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...QUANTITIES),
        fc.constantFrom(...SYSTEMS),
        fc.double({ min: -1e7, max: 1e7, noNaN: true }),
        (quantity, system, value) => {
          const back = fromDisplay(toDisplay(value, quantity, system), quantity, system);
          expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(value)));
        },
      ),
    );
  });

  // US customary against js-quantities (a general-purpose units library on npm), to 1e-6.
  const US: Array<[DisplayQuantity, number, () => number]> = [
    ['wingLoading', 1000, () => Qty('1000 Pa').to('lbf/ft^2').scalar],
    ['powerToWeight', 10, () => Qty('10 W/N').to('hp/lbf').scalar],
    ['area', 10, () => Qty('10 m^2').to('ft^2').scalar],
    ['power', 100000, () => Qty('100000 W').to('hp').scalar],
    ['thrust', 10000, () => Qty('10000 N').to('lbf').scalar],
    ['speed', 50, () => Qty('50 m/s').to('kt').scalar],
    ['mass', 750, () => Qty('750 kg').to('lb').scalar],
    ['length', 500, () => Qty('500 m').to('ft').scalar],
    ['altitude', 3000, () => Qty('3000 m').to('ft').scalar],
    ['climbRate', 5, () => Qty('5 m/s').to('ft/min').scalar],
  ];
  it.each(US)('US %s agrees with js-quantities', (quantity, si, library) => {
    expect(Math.abs(toDisplay(si, quantity, 'us') / library() - 1)).toBeLessThan(1e-6);
  });

  it('matches the display factors of core/methods.md section 7', () => {
    // W/N x 0.0059652 = hp/lbf; w / 47.880 = psf (core/methods.md section 7).
    expect(toDisplay(1, 'powerToWeight', 'us')).toBeCloseTo(0.0059652, 7);
    expect(toDisplay(47.88, 'wingLoading', 'us')).toBeCloseTo(1, 4);
    // SI shows the engine's own units, with power and thrust in kW and kN.
    expect(toDisplay(812, 'wingLoading', 'si')).toBe(812);
    expect(toDisplay(59600, 'power', 'si')).toBeCloseTo(59.6, 12);
    expect(displayUnit('thrust', 'si').unit).toBe('kN');
  });

  it('formats values with their unit and never shows NaN', () => {
    expect(formatQuantity(812.3, 'wingLoading', 'si')).toBe('812 N/m²');
    // 812.3 Pa / 47.880259 = 16.97 psf.
    expect(formatQuantity(812.3, 'wingLoading', 'us')).toBe('17.0 lb/ft²');
    expect(formatQuantity(0.31, 'thrustToWeight', 'si')).toBe('0.310');
    for (const bad of [NaN, Infinity, -Infinity, null, undefined]) {
      expect(formatQuantity(bad, 'speed', 'us')).toBe('—');
      expect(formatMargin(bad)).toBe('—');
    }
  });

  it('formats margins as signed percentages', () => {
    expect(formatMargin(0.123)).toBe('+12.3 %');
    expect(formatMargin(-0.05)).toBe('−5.0 %');
    expect(formatMargin(0)).toBe('0.0 %');
  });
});

describe('formatQuantity on small values', () => {
  it('keeps two significant figures where the usual decimals would leave one', () => {
    // NIST SP 811: 1 hp (550 ft·lbf/s) = 745.6999 W, so 800 W is 1.0728 hp.
    expect(formatQuantity(800, 'power', 'us')).toBe('1.1 hp');
    expect(formatQuantity(800, 'power', 'si')).toBe('0.80 kW');
    // Values with two or more significant figures keep their usual decimals.
    expect(formatQuantity(80_900, 'power', 'si')).toBe('80.9 kW');
    expect(formatQuantity(84.2, 'wingLoading', 'si')).toBe('84 N/m²');
    expect(formatQuantity(0, 'power', 'si')).toBe('0.0 kW');
  });
});

describe('fixedDecimals', () => {
  it('writes US-English numbers with thousands separators and exactly the decimals asked for', () => {
    // Unicode CLDR, locale en-US: grouping separator "," every three digits, decimal separator ".".
    expect(fixedDecimals(12_345.678, 2)).toBe('12,345.68');
    expect(fixedDecimals(1_234_567, 0)).toBe('1,234,567');
    expect(fixedDecimals(0.5, 3)).toBe('0.500');
    expect(fixedDecimals(-1_500.25, 1)).toBe('-1,500.3');
    // At most six decimals, never fewer than none.
    expect(fixedDecimals(1 / 3, 9)).toBe('0.333333');
    expect(fixedDecimals(2.5, -1)).toBe('3');
  });

  it('agrees with the platform\'s own toLocaleString for any number and number of decimals (ECMA-402)', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, min: -1e12, max: 1e12 }), fc.integer({ min: 0, max: 6 }), (number, decimals) => {
        // The same number formatted twice in a row, in any order, reads the same (the format is kept between calls).
        const reference = number.toLocaleString('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
        expect(fixedDecimals(number, decimals)).toBe(reference);
        expect(fixedDecimals(number, decimals)).toBe(reference);
      }),
      { numRuns: 300 },
    );
  });
});
