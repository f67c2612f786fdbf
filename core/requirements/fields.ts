/**
 * Pieces the requirement descriptors share: zod fields with units, the
 * editor's value kinds, and number text for summaries.
 */
import * as z from 'zod';
import { RUNWAY_SURFACES, RUNWAY_SURFACE_WORDS } from '../assumptions/study-case';
import { quantityField, ratioField } from '../concept/quantity-field';
import type { EditorField, EditorValue } from './descriptor';

export const fraction = z.number().gt(0).lte(1);
/** A fraction of the requirement's common fields: 0.75 or "75 %". */
export const percentFraction = ratioField('fraction', { above: 0, to: 1 });
export const speedFactor = z.number().gte(1);
export const positiveSpeed = quantityField('speed', { above: 0 });
/** A true airspeed, with a unit or as a Mach number ("M0.78", turned into TAS at the requirement's altitude and temperature). */
export const trueAirspeed = quantityField('speed', { above: 0 }, { mach: true });
/** Pressure altitudes the standard atmosphere covers for sizing; "FL370" is 37,000 ft. */
export const altitude = quantityField('length', { from: -1000, to: 30000 });

export const speedValue = (): EditorValue => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'kt' } });
/** A true airspeed the editor also takes as a Mach number ("M0.78"). */
export const trueSpeedValue = (): EditorValue => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'kt' }, mach: true });
export const rateValue = (): EditorValue => ({ type: 'quantity', dimension: 'speed', units: { si: 'm/s', us: 'ft/min' } });
export const lengthValue = (): EditorValue => ({ type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' } });
export const numberValue = (integer = false): EditorValue => ({ type: 'number', integer });

/** The surface of a take-off run: only the studies read it, to pick the rolling-friction band that is typical. */
export const runwaySurfaceField: EditorField = {
  key: 'runwaySurface',
  title: 'Runway surface',
  value: { type: 'choice', choices: RUNWAY_SURFACES.map((value) => ({ value, title: RUNWAY_SURFACE_WORDS[value] })) },
  defaultText: 'not stated',
  advanced: true,
  help: 'Only the studies read it: it picks the typical band of rolling friction.',
};

export function plain(value: number, digits = 2): string {
  return Number.isFinite(value) ? String(Number(value.toFixed(digits))) : '—';
}

export function percent(fraction: number): string {
  return Number.isFinite(fraction) ? `${Number((fraction * 100).toFixed(2))} %` : '—';
}

/** A typical range as the editor marks it. */
export const mark = (range: { low: number; high: number; note: string }) => ({ low: range.low, high: range.high, note: range.note });
