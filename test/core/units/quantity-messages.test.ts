/**
 * The exact one-line messages of the quantity parser: each names the value
 * the user wrote and says what to write instead. The messages are part of
 * the product (they reach the window and the command line word for word).
 */
import { describe, expect, it } from 'vitest';
import { outOfRange, parseQuantity, type Dimension } from '../../../core/units/quantity';

const message = (input: unknown, dimension: Dimension, options = {}): string => {
  const parsed = parseQuantity(input, dimension, options);
  if (parsed.ok) throw new Error(`expected ${String(input)} to be refused, got ${parsed.value}`);
  return parsed.message;
};

describe('quantity messages, word for word', () => {
  it('a number that is not finite', () => {
    expect(message(Infinity, 'mass')).toBe('is Infinity; give a finite number');
    expect(message(NaN, 'fraction')).toBe('is NaN; give a finite number');
  });

  it('a value that is neither a number nor text', () => {
    expect(message(true, 'speed')).toBe('must be a string with a unit, e.g. "45 kt"');
    expect(message(null, 'mass')).toBe('must be a string with a unit, e.g. "750 kg"');
  });

  it('text that does not start with a number', () => {
    expect(message('fast', 'speed')).toBe('"fast" is not a number with a unit, e.g. "45 kt"');
  });

  it('a number too large for double precision, written out', () => {
    // 1e999 is past Number.MAX_VALUE (about 1.8e308, IEEE 754 binary64), so it reads as Infinity.
    expect(message('1e999 m', 'length')).toBe('"1e999 m" is too large a number; write a finite value, e.g. "1500 ft"');
  });

  it('a comma inside the number is a thousands separator; a comma after the unit is part of an unknown unit', () => {
    expect(message('1,500 ft', 'length')).toBe('"1,500 ft": write the number without thousands separators, e.g. "1500 ft"');
    expect(message('15 ft,5', 'length')).toBe('"15 ft,5": unit "ft,5" is not a length unit; use one of m, km, ft, nmi');
  });

  it('a bare ratio too large to compute with, written as text', () => {
    expect(message('1e200', 'thrustToWeight')).toBe(
      '"1e200" is too large a number to compute with (magnitudes from 1e-60 to 1e60 in SI units); write a realistic value, e.g. "0.35"',
    );
  });

  it('a power loading of zero or below', () => {
    const refused = '": a power loading must be greater than 0, e.g. "10 lb/hp"';
    expect(message('0 lb/hp', 'powerToWeight')).toBe(`"0 lb/hp${refused}`);
    expect(message('-5 kg/kW', 'powerToWeight')).toBe(`"-5 kg/kW${refused}`);
  });

  it('a power loading so small that its power-to-weight is too large to compute with', () => {
    // 1e-70 lb/hp is 1 / (1e-70 x 4.448 N / 745.7 W) = 1.7e72 W/N in SI, past 1e60 (NIST SP 811 factors).
    expect(message('1e-70 lb/hp', 'powerToWeight')).toBe(
      '"1e-70 lb/hp" is too small a number to compute with (magnitudes from 1e-60 to 1e60 in SI units); write a realistic value, e.g. "9 W/N"',
    );
  });

  // The article and the name of each dimension as a person reads them.
  const named: Array<[Dimension, string]> = [
    ['mass', 'a mass'],
    ['length', 'a length'],
    ['speed', 'a speed'],
    ['temperatureDifference', 'a temperature difference'],
    ['angle', 'an angle'],
    ['time', 'a time'],
    ['wingLoading', 'a wing loading'],
    ['powerToWeight', 'a power-to-weight'],
    ['thrustToWeight', 'a thrust-to-weight'],
    ['fraction', 'a fraction'],
    ['brakeSpecificFuelConsumption', 'a brake specific fuel consumption'],
    ['thrustSpecificFuelConsumption', 'a thrust specific fuel consumption'],
    ['specificEnergy', 'a specific energy'],
  ];

  it.each(named)('an unknown unit for %s names the dimension as "%s unit"', (dimension, words) => {
    expect(message('3 furlong', dimension)).toMatch(new RegExp(`^"3 furlong": unit "furlong" is not ${words} unit; use one of `));
  });

  it('a unit of another dimension names both dimensions with their articles', () => {
    expect(message('45 deg', 'mass')).toMatch(/^"45 deg": "deg" is an angle unit, but this field is a mass; use one of kg, lb$/);
    expect(message('45 kg', 'angle')).toMatch(/^"45 kg": "kg" is a mass unit, but this field is an angle; use one of deg, rad$/);
  });
});

describe('flight levels and Mach numbers only where they belong', () => {
  it('"FL370" is a length, not a speed', () => {
    expect(parseQuantity('FL370', 'length').ok).toBe(true);
    expect(message('FL370', 'speed', { mach: true })).toBe('"FL370" is not a number with a unit, e.g. "45 kt"');
  });

  it('"M0.78" is a true airspeed, not a length', () => {
    expect(message('M0.78', 'length', { mach: true })).toBe('"M0.78" is not a number with a unit, e.g. "1500 ft"');
  });

  it('a Mach number carries its sea-level speed for the range checks', () => {
    // Sea-level speed of sound 340.294 m/s (U.S. Standard Atmosphere 1976, Table I).
    const parsed = parseQuantity('M0.78', 'speed', { mach: true });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.mach).toBe(0.78);
    expect(parsed.value).toBeCloseTo(0.78 * 340.294, 2);
  });

  it('takes Mach numbers above 0 and at most 10', () => {
    const refused = '": write a Mach number above 0 and at most 10, e.g. "M0.78"';
    expect(message('M0', 'speed', { mach: true })).toBe(`"M0${refused}`);
    expect(message('M10.5', 'speed', { mach: true })).toBe(`"M10.5${refused}`);
    const ten = parseQuantity('M10', 'speed', { mach: true });
    expect(ten.ok && ten.mach).toBe(10);
    const small = parseQuantity('Mach 0.01', 'speed', { mach: true });
    expect(small.ok && small.mach).toBe(0.01);
  });
});

describe('the computable range is 1e-60 to 1e60 in SI, both ends included', () => {
  it('takes the ends and refuses just past them', () => {
    // The message promises "magnitudes from 1e-60 to 1e60 in SI units".
    expect(outOfRange(1e60)).toBe(false);
    expect(outOfRange(-1e60)).toBe(false);
    expect(outOfRange(1e-60)).toBe(false);
    expect(outOfRange(1.0000001e60)).toBe(true);
    expect(outOfRange(0.9999999e-60)).toBe(true);
    expect(outOfRange(0)).toBe(false);
    expect(parseQuantity('1e60 m', 'length')).toEqual({ ok: true, value: 1e60 });
    expect(parseQuantity('1e-60 m', 'length')).toEqual({ ok: true, value: 1e-60 });
  });
});
