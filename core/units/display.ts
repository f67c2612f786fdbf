/**
 * Display units: the one place where SI values become numbers a person reads.
 * `si` shows the engine's own units; `us` shows US customary; `kt-ft` is the
 * working mix of design offices: knots, feet (flight levels for altitudes) and
 * ft/min for speeds, lengths, altitudes and rates, SI for mass, area, force and power.
 */
import { FOOT_M, FOOT_PER_MINUTE_MPS, G0, HORSEPOWER_W, KNOT_MPS, POUND_FORCE_N, POUND_KG, PSF_PA } from './factors';

export type UnitSystem = 'si' | 'us' | 'kt-ft';

/** Every unit system, in the order the window and the command line offer them. */
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['si', 'us', 'kt-ft'];

/** As the window and the reports name them. */
export const UNIT_SYSTEM_TITLES: Record<UnitSystem, string> = {
  si: 'SI',
  us: 'US customary',
  'kt-ft': 'knots and feet (SI for mass, area, force and power)',
};

export type DisplayQuantity =
  | 'wingLoading'
  | 'powerToWeight'
  | 'thrustToWeight'
  | 'area'
  | 'power'
  | 'thrust'
  | 'speed'
  | 'mass'
  | 'length'
  /** A dimension of the aircraft itself (span, chord): finer than a runway's length. */
  | 'dimension'
  | 'altitude'
  | 'climbRate';

interface DisplayUnit {
  unit: string;
  /** Multiply an SI value by this to get the displayed value. */
  fromSi: number;
  digits: number;
}

/** SI everywhere. */
const SI_DISPLAY: Record<DisplayQuantity, DisplayUnit> = {
  wingLoading: { unit: 'N/m²', fromSi: 1, digits: 0 },
  powerToWeight: { unit: 'W/N', fromSi: 1, digits: 2 },
  thrustToWeight: { unit: '', fromSi: 1, digits: 3 },
  area: { unit: 'm²', fromSi: 1, digits: 2 },
  power: { unit: 'kW', fromSi: 1e-3, digits: 1 },
  thrust: { unit: 'kN', fromSi: 1e-3, digits: 2 },
  speed: { unit: 'm/s', fromSi: 1, digits: 1 },
  mass: { unit: 'kg', fromSi: 1, digits: 0 },
  length: { unit: 'm', fromSi: 1, digits: 0 },
  dimension: { unit: 'm', fromSi: 1, digits: 2 },
  altitude: { unit: 'm', fromSi: 1, digits: 0 },
  climbRate: { unit: 'm/s', fromSi: 1, digits: 2 },
};

const DISPLAY: Record<UnitSystem, Record<DisplayQuantity, DisplayUnit>> = {
  si: SI_DISPLAY,
  // The working mix of design offices: knots, feet and ft/min; SI for mass, area, force and power.
  'kt-ft': {
    ...SI_DISPLAY,
    speed: { unit: 'kt', fromSi: 1 / KNOT_MPS, digits: 0 },
    length: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 0 },
    dimension: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 1 },
    altitude: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 0 },
    climbRate: { unit: 'ft/min', fromSi: 1 / FOOT_PER_MINUTE_MPS, digits: 0 },
  },
  us: {
    wingLoading: { unit: 'lb/ft²', fromSi: 1 / PSF_PA, digits: 1 },
    powerToWeight: { unit: 'hp/lb', fromSi: POUND_FORCE_N / HORSEPOWER_W, digits: 4 },
    thrustToWeight: { unit: '', fromSi: 1, digits: 3 },
    area: { unit: 'ft²', fromSi: 1 / (FOOT_M * FOOT_M), digits: 1 },
    power: { unit: 'hp', fromSi: 1 / HORSEPOWER_W, digits: 0 },
    thrust: { unit: 'lbf', fromSi: 1 / POUND_FORCE_N, digits: 0 },
    speed: { unit: 'kt', fromSi: 1 / KNOT_MPS, digits: 1 },
    mass: { unit: 'lb', fromSi: 1 / POUND_KG, digits: 0 },
    length: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 0 },
    dimension: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 1 },
    altitude: { unit: 'ft', fromSi: 1 / FOOT_M, digits: 0 },
    climbRate: { unit: 'ft/min', fromSi: 1 / FOOT_PER_MINUTE_MPS, digits: 0 },
  },
};

export function displayUnit(quantity: DisplayQuantity, system: UnitSystem): DisplayUnit {
  return DISPLAY[system][quantity];
}

/** SI value to the displayed number. */
export function toDisplay(value: number, quantity: DisplayQuantity, system: UnitSystem): number {
  return value * DISPLAY[system][quantity].fromSi;
}

/** Displayed number back to SI. */
export function fromDisplay(value: number, quantity: DisplayQuantity, system: UnitSystem): number {
  return value / DISPLAY[system][quantity].fromSi;
}

/**
 * US-English number formats by number of decimals (0 to 6), each built once:
 * `toLocaleString` with options builds a new one on every call (about 60
 * times slower), and a window shows hundreds of numbers at once.
 */
const FIXED_FORMATS: Intl.NumberFormat[] = [];

/** `number` with exactly `decimals` decimals (0 to 6) and thousands separators: "12,345.68". */
export function fixedDecimals(number: number, decimals: number): string {
  const places = Math.min(6, Math.max(0, Math.round(decimals)));
  const format = (FIXED_FORMATS[places] ??= new Intl.NumberFormat('en-US', { minimumFractionDigits: places, maximumFractionDigits: places }));
  return format.format(number);
}

/**
 * "812 N/m²", "16.9 lb/ft²", at least two significant figures ("0.80 kW");
 * never "NaN": a value that is not finite reads "—".
 */
export function formatQuantity(value: number | null | undefined, quantity: DisplayQuantity, system: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const { unit, fromSi, digits } = DISPLAY[system][quantity];
  const number = value * fromSi;
  if (system === 'kt-ft') return workingText(number, quantity, unit);
  // At least two significant figures, so a small aircraft's 1.07 hp reads "1.1 hp", not "1 hp".
  const decimals = number === 0 ? digits : Math.min(6, Math.max(digits, 1 - Math.floor(Math.log10(Math.abs(number)))));
  const shown = fixedDecimals(number, decimals);
  return unit ? `${shown} ${unit}` : shown;
}

/** Whole units in feet, knots and ft/min. */
const WHOLE: ReadonlySet<DisplayQuantity> = new Set(['speed', 'length', 'altitude', 'climbRate']);

/**
 * The working mix rounds as people say the numbers: whole knots and feet,
 * altitudes from 3,000 ft that are whole hundreds of feet as flight levels
 * ("FL370"; 3,000 ft is about the lowest transition altitude, common practice),
 * everything else to three significant figures.
 */
function workingText(number: number, quantity: DisplayQuantity, unit: string): string {
  if (quantity === 'altitude') {
    const hundreds = number / 100;
    // Compared in whole hundreds: 3,000 ft written in feet comes back as 2999.9999999999995 ft from metres.
    if (Math.round(hundreds) >= 30 && Math.abs(hundreds - Math.round(hundreds)) < 1e-6 && Math.round(hundreds) < 1000) {
      return `FL${String(Math.round(hundreds)).padStart(3, '0')}`;
    }
  }
  const shown = WHOLE.has(quantity) && Math.abs(number) >= 10 ? fixedDecimals(Math.round(number), 0) : threeFigures(number);
  return unit ? `${shown} ${unit}` : shown;
}

/** 3 significant figures, with thousands separators, never exponent notation. */
export function threeFigures(number: number): string {
  if (number === 0) return '0';
  // Decimals from the rounded value: 9.996 rounds to 10.0, which has one decimal, not two.
  const rounded = Number(number.toPrecision(3));
  const decimals = Math.max(0, 2 - Math.floor(Math.log10(Math.abs(rounded))));
  return fixedDecimals(rounded, Math.min(decimals, 6));
}

/** "+12.3 %" for a relative margin; "—" when not finite. */
export function formatMargin(margin: number | null | undefined): string {
  if (margin === null || margin === undefined || !Number.isFinite(margin)) return '—';
  const pct = margin * 100;
  // The sign follows the rounded text: whatever reads as non-zero is signed ("+0.1 %" at 0.05 %), "0.0 %" is not.
  const shown = Math.abs(pct).toFixed(1);
  const sign = shown === '0.0' ? '' : pct > 0 ? '+' : '−';
  return `${sign}${shown} %`;
}

export { G0 };
