/**
 * Field text <-> concept values. A field shows its stored value in the unit
 * of the chosen system; what a person types is read in that unit unless they
 * write one ("45 kt"), and goes back into the file with its unit.
 */
import { UNITS, parseQuantity, type Dimension, type UnitSystem } from '../../../../core';
import type { FieldSpec } from './fields';

export type ReadResult = { ok: true; value: string | number | boolean | undefined } | { ok: false; message: string };

const PRETTY_UNITS: Record<string, string> = { 'N/m^2': 'N/m²', 'lb/ft^2': 'lb/ft²', 'kg/m^2': 'kg/m²', degF: '°F', degC: '°C', deg: '°' };

/** "N/m^2" -> "N/m²", "degF" -> "°F". */
export function prettyUnit(unit: string): string {
  return PRETTY_UNITS[unit] ?? unit;
}

/**
 * A quantity field's unit in a system: the working mix (kt-ft) takes the US
 * unit for speeds, rates and lengths (kt, ft/min, ft) and the SI one for the rest.
 */
export function unitIn(value: { dimension: Dimension; units: { si: string; us: string } }, system: UnitSystem): string {
  if (system !== 'kt-ft') return value.units[system];
  return value.dimension === 'speed' || value.dimension === 'length' ? value.units.us : value.units.si;
}

/** The unit a field is shown in, in the file's own spelling; '' when it has none. */
export function fieldUnit(spec: FieldSpec, system: UnitSystem): string {
  if (spec.value.type === 'quantity') return unitIn(spec.value, system);
  if (spec.value.type === 'percent') return '%';
  return '';
}

/** A number as a person writes it: at most 5 significant digits, no trailing zeros, never "NaN". */
export function plainNumber(value: number): string {
  if (!Number.isFinite(value)) return '';
  const rounded = Number(value.toPrecision(5));
  return Object.is(rounded, -0) ? '0' : String(rounded);
}

/** SI value of a stored field, or null when it is absent or unreadable. */
export function storedSi(raw: unknown, spec: FieldSpec): number | null {
  if (raw === undefined || raw === null) return null;
  if (spec.value.type === 'quantity') {
    const parsed = parseQuantity(raw, spec.value.dimension, { mach: spec.value.mach });
    return parsed.ok ? parsed.value : null;
  }
  if (spec.value.type === 'percent') {
    const parsed = parseQuantity(raw, 'fraction');
    return parsed.ok ? parsed.value : null;
  }
  return typeof raw === 'number' && Number.isFinite(raw) ? raw : null;
}

/** The text a field shows for its stored value; '' when the field is empty. */
export function displayText(raw: unknown, spec: FieldSpec, system: UnitSystem): string {
  if (raw === undefined || raw === null) return '';
  if (spec.value.type === 'configuration') return typeof raw === 'string' ? raw : '';
  if (spec.value.type === 'choice') return typeof raw === 'string' ? raw : String(raw);
  if (spec.value.type === 'switch') return raw === true ? 'yes' : raw === false ? 'no' : String(raw);
  const si = storedSi(raw, spec);
  if (si === null) return typeof raw === 'string' ? raw : String(raw);
  // A value stays as typed when it is written in another unit (the converted value shows beside it).
  if (typedElsewhere(raw, spec, system)) return String(raw).trim();
  if (spec.value.type === 'quantity') {
    const unit = unitIn(spec.value, system);
    return plainNumber(si / UNITS[spec.value.dimension][unit]);
  }
  if (spec.value.type === 'percent') return plainNumber(si * 100);
  return plainNumber(si);
}

/** The number and unit of a stored quantity, when it is written in a unit other than the system's for the field. */
function typedElsewhere(raw: unknown, spec: FieldSpec, system: UnitSystem): boolean {
  if (typeof raw !== 'string' || spec.value.type !== 'quantity') return false;
  const written = raw.trim().replace(/^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*/, '');
  return written !== unitIn(spec.value, system);
}

/**
 * Beside a value typed in another unit: the same value in the system's unit,
 * rounded as the system shows it ("= 56.6 m/s"); '' when there is nothing to add.
 */
export function convertedText(raw: unknown, spec: FieldSpec, system: UnitSystem): string {
  if (!typedElsewhere(raw, spec, system) || spec.value.type !== 'quantity') return '';
  const parsed = parseQuantity(raw, spec.value.dimension, { mach: spec.value.mach });
  if (!parsed.ok || parsed.mach !== undefined) return '';
  const unit = unitIn(spec.value, system);
  const shown = parsed.value / UNITS[spec.value.dimension][unit];
  const whole = system === 'kt-ft' && (unit === 'kt' || unit === 'ft' || unit === 'ft/min') && Math.abs(shown) >= 10;
  return `= ${whole ? Math.round(shown).toLocaleString('en-US') : String(Number(shown.toPrecision(3)))} ${prettyUnit(unit)}`;
}

const BARE_NUMBER = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;

/** Reads what was typed; the message names what is wrong (the caller adds the field's name). */
export function readInput(text: string, spec: FieldSpec, system: UnitSystem): ReadResult {
  const trimmed = text.trim();
  if (trimmed === '') {
    return spec.required ? { ok: false, message: 'is required' } : { ok: true, value: undefined };
  }
  switch (spec.value.type) {
    case 'configuration':
      return { ok: true, value: trimmed };
    case 'choice': {
      const { choices } = spec.value;
      return choices.some((choice) => choice.value === trimmed)
        ? { ok: true, value: trimmed }
        : { ok: false, message: `"${trimmed}" is not one of ${choices.map((choice) => choice.value).join(', ')}` };
    }
    case 'switch': {
      const word = trimmed.toLowerCase();
      if (['yes', 'on', 'true'].includes(word)) return { ok: true, value: true };
      if (['no', 'off', 'false'].includes(word)) return { ok: true, value: false };
      return { ok: false, message: `"${trimmed}" is not yes or no` };
    }
    case 'number': {
      if (!BARE_NUMBER.test(trimmed)) return { ok: false, message: `"${trimmed}" is not a number` };
      const value = Number(trimmed);
      if (spec.value.integer && !Number.isInteger(value)) return { ok: false, message: `must be a whole number (got ${trimmed})` };
      return { ok: true, value };
    }
    case 'percent': {
      const written = BARE_NUMBER.test(trimmed) ? `${trimmed} %` : trimmed;
      const parsed = parseQuantity(written, 'fraction');
      return parsed.ok ? { ok: true, value: `${Number(written.replace('%', '').trim())} %` } : { ok: false, message: parsed.message };
    }
    case 'quantity': {
      const written = BARE_NUMBER.test(trimmed) ? `${Number(trimmed)} ${unitIn(spec.value, system)}` : trimmed;
      const parsed = parseQuantity(written, spec.value.dimension, { mach: spec.value.mach });
      return parsed.ok ? { ok: true, value: written } : { ok: false, message: parsed.message };
    }
  }
}
