import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { EXAMPLE, UNITS, parseQuantity, quantity, type Dimension } from '../../../core/units/quantity';

// NIST SP 811 (2008), Appendix B, exact values (also core/methods.md section 10).
const FT = 0.3048;
const LB = 0.45359237;
const LBF = 4.4482216152605;
const KT = 1852 / 3600;
const HP = 745.69987158227022;
const PSF = 47.880258980335843;
// Standard gravity, exact by definition (3rd CGPM, 1901).
const G0 = 9.80665;

interface UnitCase {
  dimension: Dimension;
  unit: string;
  /** SI value of one unit from the published constants above. */
  si: number;
  /** The same value from js-quantities, a general-purpose units library on npm. */
  library: () => number;
}

const q = (text: string, to: string) => () => Qty(text).to(to).scalar;

// Every unit DESIGN.md ("The concept file") says the file accepts.
const CASES: UnitCase[] = [
  { dimension: 'mass', unit: 'kg', si: 1, library: q('1 kg', 'kg') },
  { dimension: 'mass', unit: 'lb', si: LB, library: q('1 lb', 'kg') },
  { dimension: 'length', unit: 'm', si: 1, library: q('1 m', 'm') },
  { dimension: 'length', unit: 'km', si: 1000, library: q('1 km', 'm') },
  { dimension: 'length', unit: 'ft', si: FT, library: q('1 ft', 'm') },
  { dimension: 'length', unit: 'nmi', si: 1852, library: q('1 nmi', 'm') },
  { dimension: 'speed', unit: 'm/s', si: 1, library: q('1 m/s', 'm/s') },
  { dimension: 'speed', unit: 'km/h', si: 1 / 3.6, library: q('1 km/h', 'm/s') },
  { dimension: 'speed', unit: 'kt', si: KT, library: q('1 kt', 'm/s') },
  { dimension: 'speed', unit: 'mph', si: 0.44704, library: q('1 mph', 'm/s') },
  { dimension: 'speed', unit: 'ft/s', si: FT, library: q('1 ft/s', 'm/s') },
  { dimension: 'speed', unit: 'ft/min', si: 0.00508, library: q('1 ft/min', 'm/s') },
  // Temperature differences: 1 degC = 1 K; 1 degF = 5/9 K (NIST SP 811, B.8).
  { dimension: 'temperatureDifference', unit: 'K', si: 1, library: q('1 degK', 'degK') },
  { dimension: 'temperatureDifference', unit: 'degC', si: 1, library: q('1 degC', 'degK') },
  { dimension: 'temperatureDifference', unit: 'degF', si: 5 / 9, library: q('1 degF', 'degK') },
  { dimension: 'angle', unit: 'deg', si: Math.PI / 180, library: q('1 deg', 'rad') },
  { dimension: 'angle', unit: 'rad', si: 1, library: q('1 rad', 'rad') },
  { dimension: 'time', unit: 's', si: 1, library: q('1 s', 's') },
  { dimension: 'wingLoading', unit: 'N/m^2', si: 1, library: q('1 N/m^2', 'Pa') },
  { dimension: 'wingLoading', unit: 'Pa', si: 1, library: q('1 Pa', 'Pa') },
  // kg/m^2 is per kilogram of mass, times standard gravity (DESIGN.md).
  { dimension: 'wingLoading', unit: 'kg/m^2', si: G0, library: () => Qty('1 kg/m^2').mul(Qty(`${G0} m/s^2`)).to('Pa').scalar },
  // lb in lb/ft^2 is pound-force (DESIGN.md: psf).
  { dimension: 'wingLoading', unit: 'lb/ft^2', si: PSF, library: q('1 lbf/ft^2', 'Pa') },
  { dimension: 'powerToWeight', unit: 'W/N', si: 1, library: q('1 W/N', 'W/N') },
  { dimension: 'powerToWeight', unit: 'W/kg', si: 1 / G0, library: () => Qty('1 W/kg').div(Qty(`${G0} m/s^2`)).to('W/N').scalar },
  { dimension: 'powerToWeight', unit: 'kW/kg', si: 1000 / G0, library: () => Qty('1 kW/kg').div(Qty(`${G0} m/s^2`)).to('W/N').scalar },
  // hp/lb with lb as weight: hp per lbf.
  { dimension: 'powerToWeight', unit: 'hp/lb', si: HP / LBF, library: q('1 hp/lbf', 'W/N') },
  { dimension: 'fraction', unit: '%', si: 0.01, library: () => Qty('1 %').toBase().scalar },
  // The mission's units: 1 h = 3600 s (SI Brochure, Table 8); kWh = 3.6 MJ; hp as above.
  { dimension: 'time', unit: 'h', si: 3600, library: q('1 h', 's') },
  { dimension: 'brakeSpecificFuelConsumption', unit: 'kg/J', si: 1, library: q('1 kg/J', 'kg/J') },
  { dimension: 'brakeSpecificFuelConsumption', unit: 'kg/kWh', si: 1 / 3.6e6, library: q('1 kg/kWh', 'kg/J') },
  { dimension: 'brakeSpecificFuelConsumption', unit: 'g/kWh', si: 1e-3 / 3.6e6, library: q('1 g/kWh', 'kg/J') },
  { dimension: 'brakeSpecificFuelConsumption', unit: 'lb/(hp h)', si: LB / (HP * 3600), library: q('1 lb/hp*h', 'kg/J') },
  // TSFC as weight flow per thrust [1/s]: a mass flow per force times g0; lb/(lbf h) is exactly 1/h.
  { dimension: 'thrustSpecificFuelConsumption', unit: '1/s', si: 1, library: q('1 1/s', '1/s') },
  { dimension: 'thrustSpecificFuelConsumption', unit: '1/h', si: 1 / 3600, library: q('1 1/h', '1/s') },
  { dimension: 'thrustSpecificFuelConsumption', unit: 'lb/(lbf h)', si: 1 / 3600, library: () => Qty('1 lb/lbf*h').to('s/m').scalar * G0 },
  { dimension: 'thrustSpecificFuelConsumption', unit: 'mg/(N s)', si: G0 * 1e-6, library: () => Qty('1 mg/N*s').to('s/m').scalar * G0 },
  { dimension: 'thrustSpecificFuelConsumption', unit: 'kg/(N h)', si: G0 / 3600, library: () => Qty('1 kg/N*h').to('s/m').scalar * G0 },
  { dimension: 'specificEnergy', unit: 'J/kg', si: 1, library: q('1 J/kg', 'J/kg') },
  { dimension: 'specificEnergy', unit: 'Wh/kg', si: 3600, library: q('1 Wh/kg', 'J/kg') },
  { dimension: 'specificEnergy', unit: 'kWh/kg', si: 3.6e6, library: q('1 kWh/kg', 'J/kg') },
  { dimension: 'specificEnergy', unit: 'MJ/kg', si: 1e6, library: q('1 MJ/kg', 'J/kg') },
];

describe('parseQuantity: every unit of the concept file', () => {
  it.each(CASES)('1 $unit ($dimension) is the NIST SP 811 value in SI', ({ dimension, unit, si }) => {
    const parsed = parseQuantity(`1 ${unit}`, dimension);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.value).toBeCloseTo(si, 12);
    // Scaling is linear and the space between number and unit is optional (needed only before a unit that starts with a digit, "0.7 1/h").
    const scaled = parseQuantity(`-2.5e2${/^\d/.test(unit) ? ' ' : ''}${unit}`, dimension);
    expect(scaled.ok && scaled.value / si).toBeCloseTo(-250, 9);
  });

  // js-quantities stores some factors to 7-9 significant figures (kt, lbf, hp), hence 1e-6.
  it.each(CASES)('1 $unit agrees with js-quantities to 1e-6', ({ dimension, unit, library }) => {
    const parsed = parseQuantity(`1 ${unit}`, dimension);
    if (!parsed.ok) throw new Error(parsed.message);
    expect(Math.abs(parsed.value / library() - 1)).toBeLessThan(1e-6);
  });

  it('covers every unit the parser lists, and nothing the list leaves out', () => {
    const listed = Object.entries(UNITS).flatMap(([d, units]) => Object.keys(units).map((u) => `${d}:${u}`));
    const tested = new Set(CASES.map((c) => `${c.dimension}:${c.unit}`));
    // Beyond DESIGN.md's list the parser also accepts these; each is checked below.
    const extras = ['time:min', 'wingLoading:psf', 'thrustToWeight:N/N', 'thrustToWeight:lbf/lbf'];
    expect(listed.filter((u) => !tested.has(u)).sort()).toEqual(extras.sort());
  });

  it('reads the extra units and the common spellings', () => {
    // 1 min = 60 s (SI Brochure, Table 8); psf = lbf/ft^2 (NIST SP 811).
    expect(quantity('2 min', 'time')).toBe(120);
    expect(quantity('1 psf', 'wingLoading')).toBeCloseTo(PSF, 12);
    expect(quantity('0.35 N/N', 'thrustToWeight')).toBe(0.35);
    expect(quantity('0.35 lbf/lbf', 'thrustToWeight')).toBe(0.35);
    const spellings: Array<[string, Dimension, number]> = [
      ['45 kts', 'speed', 45 * KT],
      ['45 knots', 'speed', 45 * KT],
      ['45 kn', 'speed', 45 * KT],
      ['500 fpm', 'speed', 500 * 0.00508],
      ['10 °C', 'temperatureDifference', 10],
      ['9 °F', 'temperatureDifference', 5],
      ['1650 lbs', 'mass', 1650 * LB],
      ['25 lb/ft²', 'wingLoading', 25 * PSF],
      ['25 lbf/ft^2', 'wingLoading', 25 * PSF],
      ['2400 N/m²', 'wingLoading', 2400],
      ['0.08 hp/lbf', 'powerToWeight', (0.08 * HP) / LBF],
    ];
    for (const [text, dimension, si] of spellings) expect(quantity(text, dimension)).toBeCloseTo(si, 9);
  });

  it('takes dimensionless values bare or with their unit', () => {
    expect(parseQuantity(0.024, 'fraction')).toEqual({ ok: true, value: 0.024 });
    expect(quantity('2.4 %', 'fraction')).toBeCloseTo(0.024, 15);
    expect(quantity('2.4%', 'fraction')).toBeCloseTo(0.024, 15);
    expect(parseQuantity(0.35, 'thrustToWeight')).toEqual({ ok: true, value: 0.35 });
    expect(parseQuantity('0.35', 'thrustToWeight')).toEqual({ ok: true, value: 0.35 });
  });
});

describe('parseQuantity: mistakes name what to write', () => {
  const dimensional = (Object.keys(UNITS) as Dimension[]).filter((d) => d !== 'fraction' && d !== 'thrustToWeight');

  it.each(dimensional)('a bare number for %s is an error that shows an example and the units', (dimension) => {
    const parsed = parseQuantity(45, dimension);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.message).toContain('bare number (45)');
    expect(parsed.message).toContain(`e.g. "${EXAMPLE[dimension]}"`);
    for (const unit of Object.keys(UNITS[dimension])) expect(parsed.message).toContain(unit);
    // The example itself must parse, or the advice would be wrong.
    expect(parseQuantity(EXAMPLE[dimension], dimension).ok).toBe(true);
  });

  it('a number written as text without a unit is an error', () => {
    const parsed = parseQuantity('45', 'speed');
    expect(parsed).toEqual({ ok: false, message: expect.stringContaining('"45" has no unit') });
  });

  it('an unknown unit lists the units that would do', () => {
    const parsed = parseQuantity('3 furlong', 'length');
    expect(parsed).toEqual({ ok: false, message: expect.stringMatching(/unit "furlong" is not a length unit; use one of m, km, ft, nmi/) });
  });

  it('a unit of another dimension says which dimension it belongs to', () => {
    const parsed = parseQuantity('45 kg', 'speed');
    expect(parsed).toEqual({ ok: false, message: expect.stringContaining('"kg" is a mass unit, but this field is a speed; use one of m/s') });
  });

  it('a unit in the wrong case suggests the right one', () => {
    const parsed = parseQuantity('45 KT', 'speed');
    expect(parsed).toEqual({ ok: false, message: expect.stringContaining('did you mean "kt"?') });
  });

  it('thousands separators are refused with an example', () => {
    const parsed = parseQuantity('1,500 ft', 'length');
    expect(parsed).toEqual({ ok: false, message: expect.stringContaining('without thousands separators') });
  });

  it('names of built-in object properties are not units', () => {
    for (const text of ['45 constructor', '45 toString', '45 __proto__', '45 hasOwnProperty']) {
      expect(parseQuantity(text, 'speed').ok).toBe(false);
    }
  });

  it('non-finite numbers, other types and non-numbers are errors, never NaN', () => {
    for (const input of [NaN, Infinity, '1e999 kt', null, undefined, true, {}, ['45 kt'], 'fast', '', ' kt', '4 5 kt']) {
      const parsed = parseQuantity(input, 'speed');
      expect(parsed.ok).toBe(false);
    }
    expect(parseQuantity(NaN, 'fraction').ok).toBe(false);
  });

  it('quantity() throws a RangeError with the same message', () => {
    expect(() => quantity('45', 'speed')).toThrow(RangeError);
    expect(() => quantity('45', 'speed')).toThrow(/has no unit/);
  });
});
