/**
 * Field text <-> concept values. A field shows its stored value in the unit
 * of the chosen system; what a person types is read in that unit unless they
 * write one ("45 kt"), and goes back into the file with its unit.
 */
import { UNITS, parseQuantity, type UnitSystem } from '../../../../core';
import type { FieldSpec } from './fields';

export type ReadResult = { ok: true; value: string | number | undefined } | { ok: false; message: string };

const PRETTY_UNITS: Record<string, string> = { 'N/m^2': 'N/m²', 'lb/ft^2': 'lb/ft²', 'kg/m^2': 'kg/m²', degF: '°F', degC: '°C', deg: '°' };

/** "N/m^2" -> "N/m²", "degF" -> "°F". */
export function prettyUnit(unit: string): string {
  return PRETTY_UNITS[unit] ?? unit;
}

/** The unit a field is shown in, in the file's own spelling; '' when it has none. */
export function fieldUnit(spec: FieldSpec, system: UnitSystem): string {
  if (spec.value.type === 'quantity') return spec.value.units[system];
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
  const si = storedSi(raw, spec);
  if (si === null) return typeof raw === 'string' ? raw : String(raw);
  // A Mach number or a flight level stays as typed: its value depends on the altitude, or is the trade's own way to say it.
  if (typeof raw === 'string' && /^\s*(?:FL|M(?:ach)?\s*\d|M\.)/i.test(raw)) return raw.trim();
  if (spec.value.type === 'quantity') {
    const unit = spec.value.units[system];
    return plainNumber(si / UNITS[spec.value.dimension][unit]);
  }
  if (spec.value.type === 'percent') return plainNumber(si * 100);
  return plainNumber(si);
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
      const written = BARE_NUMBER.test(trimmed) ? `${Number(trimmed)} ${spec.value.units[system]}` : trimmed;
      const parsed = parseQuantity(written, spec.value.dimension, { mach: spec.value.mach });
      return parsed.ok ? { ok: true, value: written } : { ok: false, message: parsed.message };
    }
  }
}
