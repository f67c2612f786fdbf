/**
 * Quantities written with their unit ("45 kt", "25 lb/ft^2", "2.4 %"),
 * parsed to SI. Each dimension lists the units it accepts; a value in a unit
 * of another dimension is an error that says which units would do.
 */
// @ts-nocheck

import {
  FOOT_M,
  FOOT_PER_MINUTE_MPS,
  G0,
  HORSEPOWER_W,
  KNOT_MPS,
  MILE_PER_HOUR_MPS,
  NAUTICAL_MILE_M,
  POUND_FORCE_N,
  POUND_KG,
  PSF_PA,
  RANKINE_K,
} from './factors';
import { A0 } from '../atmosphere';
import { shortened } from '../shortened';

export type Dimension =
  | 'mass'
  | 'length'
  | 'speed'
  | 'temperatureDifference'
  | 'angle'
  | 'time'
  | 'wingLoading'
  | 'powerToWeight'
  | 'thrustToWeight'
  | 'fraction';

/** Units of each dimension, with the factor that takes a value to SI. */
export const UNITS: Record<Dimension, Record<string, number>> = {
  mass: { kg: 1, lb: POUND_KG },
  length: { m: 1, km: 1000, ft: FOOT_M, nmi: NAUTICAL_MILE_M },
  speed: {
    'm/s': 1,
    'km/h': 1000 / 3600,
    kt: KNOT_MPS,
    mph: MILE_PER_HOUR_MPS,
    'ft/s': FOOT_M,
    'ft/min': FOOT_PER_MINUTE_MPS,
  },
  temperatureDifference: { K: 1, degC: 1, degF: RANKINE_K },
  angle: { deg: Math.PI / 180, rad: 1 },
  time: { s: 1, min: 60 },
  wingLoading: { 'N/m^2': 1, Pa: 1, 'kg/m^2': G0, 'lb/ft^2': PSF_PA, psf: PSF_PA },
  // lb in hp/lb is pound-weight, so hp/lbf.
  powerToWeight: { 'W/N': 1, 'W/kg': 1 / G0, 'kW/kg': 1000 / G0, 'hp/lb': HORSEPOWER_W / POUND_FORCE_N },
  thrustToWeight: { 'N/N': 1, 'lbf/lbf': 1 },
  fraction: { '%': 0.01 },
};

/** The SI unit each dimension is stored in, for messages and display. */
export const SI_UNIT: Record<Dimension, string> = {
  mass: 'kg',
  length: 'm',
  speed: 'm/s',
  temperatureDifference: 'K',
  angle: 'rad',
  time: 's',
  wingLoading: 'N/m^2',
  powerToWeight: 'W/N',
  thrustToWeight: '',
  fraction: '',
};

/** An example of a well-written value, shown in error messages. */
export const EXAMPLE: Record<Dimension, string> = {
  mass: '750 kg',
  length: '1500 ft',
  speed: '45 kt',
  temperatureDifference: '15 K',
  angle: '45 deg',
  time: '3 s',
  wingLoading: '2400 N/m^2',
  powerToWeight: '9 W/N',
  thrustToWeight: '0.35',
  fraction: '2.4 %',
};

/**
 * A parsed value. A speed written as a Mach number ("M0.78") carries `mach`;
 * its `value` is then Mach x the sea-level speed of sound, for range checks
 * only: resolution turns it into TAS at the requirement's own altitude.
 */
export type ParsedQuantity = { ok: true; value: number; mach?: number } | { ok: false; message: string };

/** What a field accepts beyond its units: a speed field that takes a Mach number ("M0.78"). */
export interface QuantityOptions {
  mach?: boolean;
}

/** Units written as the inverse of the dimension (power loading W/P for P/W), with the factor of their SI inverse. */
const INVERSE_UNITS: Partial<Record<Dimension, Record<string, number>>> = {
  // W/P in lb/hp: pound-weight per horsepower, N/W; in kg/kW: kilogram-weight per kilowatt.
  powerToWeight: { 'lb/hp': POUND_FORCE_N / HORSEPOWER_W, 'kg/kW': G0 / 1000 },
};

/** "FL370": flight level, hundreds of feet of pressure altitude (ICAO Annex 2; common practice). */
const FLIGHT_LEVEL = /^\s*FL\s*(\d{1,3})\s*$/i;
/** "M0.78", "M 0.78" or "Mach 0.78". */
const MACH = /^\s*(?:M|Mach)\s*(\d*\.?\d+)\s*$/i;

/**
 * Magnitudes (in SI) the methods can compute with: squares, cubes and
 * products of such values stay finite in double precision (largest about
 * 1.8e308, smallest normal about 2.2e-308, IEEE 754). Anything outside is
 * refused as input rather than overflowing to Infinity later.
 */
export const LARGEST_MAGNITUDE = 1e60;
export const SMALLEST_MAGNITUDE = 1e-60;

export function outOfRange(value: number): boolean {
  const size = Math.abs(value);
  return size > LARGEST_MAGNITUDE || (size !== 0 && size < SMALLEST_MAGNITUDE);
}

function rangeMessage(written: string, dimension: Dimension): string {
  return `${written} is too ${Math.abs(Number.parseFloat(written.replace(/^"/, ''))) < 1 ? 'small' : 'large'} a number to compute with (magnitudes from 1e-60 to 1e60 in SI units); write a realistic value, e.g. "${EXAMPLE[dimension]}"`;
}

const NUMBER = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

/** Spellings that mean the same unit. */
const ALIASES: Record<string, string> = {
  'm/s²': 'm/s^2',
  'N/m²': 'N/m^2',
  'N/m2': 'N/m^2',
  'kg/m²': 'kg/m^2',
  'kg/m2': 'kg/m^2',
  'lb/ft²': 'lb/ft^2',
  'lb/ft2': 'lb/ft^2',
  '°C': 'degC',
  '°F': 'degF',
  '°': 'deg',
  kts: 'kt',
  knots: 'kt',
  fpm: 'ft/min',
  kmh: 'km/h',
  kn: 'kt',
  lbs: 'lb',
  'hp/lbf': 'hp/lb',
  'lbf/ft^2': 'lb/ft^2',
  'lbf/ft²': 'lb/ft^2',
};

function listUnits(dimension: Dimension): string {
  return [...Object.keys(UNITS[dimension]), ...Object.keys(INVERSE_UNITS[dimension] ?? {})].join(', ');
}

/**
 * Parse a dimensional value. Numbers are allowed bare only for dimensionless
 * kinds (thrustToWeight, fraction); everything else must carry a unit.
 */
export function parseQuantity(input: unknown, dimension: Dimension, options: QuantityOptions = {}): ParsedQuantity {
  const dimensionless = dimension === 'fraction' || dimension === 'thrustToWeight';
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) return { ok: false, message: `is ${input}; give a finite number` };
    if (dimensionless && outOfRange(input)) return { ok: false, message: rangeMessage(String(input), dimension) };
    if (dimensionless) return { ok: true, value: input };
    return {
      ok: false,
      message: `is a bare number (${input}); write it with a unit, e.g. "${EXAMPLE[dimension]}" (units: ${listUnits(dimension)})`,
    };
  }
  if (typeof input !== 'string') {
    return { ok: false, message: `must be a string with a unit, e.g. "${EXAMPLE[dimension]}"` };
  }
  const shown = shortened(input);
  const level = dimension === 'length' ? FLIGHT_LEVEL.exec(input) : null;
  if (level) return { ok: true, value: Number(level[1]) * 100 * FOOT_M };
  const mach = dimension === 'speed' ? MACH.exec(input) : null;
  if (mach) {
    if (!options.mach) {
      return { ok: false, message: `"${shown}": a Mach number is taken only for a true airspeed; write this speed with a unit, e.g. "${EXAMPLE.speed}"` };
    }
    const number = Number(mach[1]);
    if (!(number > 0) || number > 10) return { ok: false, message: `"${shown}": write a Mach number above 0 and at most 10, e.g. "M0.78"` };
    return { ok: true, value: number * A0, mach: number };
  }
  const match = NUMBER.exec(input);
  if (!match) {
    return { ok: false, message: `"${shown}" is not a number with a unit, e.g. "${EXAMPLE[dimension]}"` };
  }
  const magnitude = Number(match[1]);
  if (!Number.isFinite(magnitude)) {
    return { ok: false, message: `"${shown}" is too large a number; write a finite value, e.g. "${EXAMPLE[dimension]}"` };
  }
  const written = match[2];
  if (/^,\d/.test(written)) {
    return { ok: false, message: `"${shown}": write the number without thousands separators, e.g. "1500 ft"` };
  }
  const unit = Object.hasOwn(ALIASES, written) ? ALIASES[written] : written;
  if (unit === '') {
    if (dimensionless && outOfRange(magnitude)) return { ok: false, message: rangeMessage(`"${shown}"`, dimension) };
    if (dimensionless) return { ok: true, value: magnitude };
    return {
      ok: false,
      message: `"${shown}" has no unit; write it with one, e.g. "${EXAMPLE[dimension]}" (units: ${listUnits(dimension)})`,
    };
  }
  const inverse = INVERSE_UNITS[dimension];
  if (inverse && Object.hasOwn(inverse, unit)) {
    if (!(magnitude > 0)) return { ok: false, message: `"${shown}": a power loading must be greater than 0, e.g. "10 lb/hp"` };
    const value = 1 / (magnitude * inverse[unit]);
    if (outOfRange(value)) return { ok: false, message: rangeMessage(`"${shown}"`, dimension) };
    return { ok: true, value };
  }
  // Own keys only: "45 constructor" must not find Object.prototype.constructor.
  if (!Object.hasOwn(UNITS[dimension], unit)) return { ok: false, message: unknownUnitMessage(shown, shortened(unit, 30), dimension) };
  const value = magnitude * UNITS[dimension][unit];
  if (outOfRange(value)) return { ok: false, message: rangeMessage(`"${shown}"`, dimension) };
  return { ok: true, value };
}

/** Say what the unit is if it belongs elsewhere, and what to write instead. */
function unknownUnitMessage(input: string, unit: string, dimension: Dimension): string {
  const wanted = `use one of ${listUnits(dimension)}`;
  const caseMatch = Object.keys(UNITS[dimension]).find((u) => u.toLowerCase() === unit.toLowerCase());
  if (caseMatch) return `"${input}": unit "${unit}" is not known; did you mean "${caseMatch}"? (units are case-sensitive; ${wanted})`;
  const other = (Object.keys(UNITS) as Dimension[]).find((d) => d !== dimension && Object.hasOwn(UNITS[d], unit));
  if (other) return `"${input}": "${unit}" is ${a(describe(other))} unit, but this field is ${a(describe(dimension))}; ${wanted}`;
  return `"${input}": unit "${unit}" is not ${a(describe(dimension))} unit; ${wanted}`;
}

const a = (noun: string): string => (/^[aeiou]/.test(noun) ? `an ${noun}` : `a ${noun}`);

function describe(dimension: Dimension): string {
  return {
    mass: 'mass',
    length: 'length',
    speed: 'speed',
    temperatureDifference: 'temperature difference',
    angle: 'angle',
    time: 'time',
    wingLoading: 'wing loading',
    powerToWeight: 'power-to-weight',
    thrustToWeight: 'thrust-to-weight',
    fraction: 'fraction',
  }[dimension];
}

/** Parse or throw a RangeError naming the value; for code paths that already validated. */
export function quantity(input: string, dimension: Dimension): number {
  const parsed = parseQuantity(input, dimension);
  if (!parsed.ok) throw new RangeError(parsed.message);
  return parsed.value;
}
