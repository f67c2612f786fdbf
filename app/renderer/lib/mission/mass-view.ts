/**
 * The closed mass as the window shows it: the parts of the take-off mass in
 * the order they stack, what moves it (largest first) in plain words, and
 * energies in kWh. Never NaN: a value that is not a finite number shows "—".
 */
import type { MassDriverJson, MassJson, MassSegmentJson } from '../../../../core';

export type MassPartKey = 'empty' | 'fuel' | 'battery' | 'payload' | 'crew';

export interface MassPart {
  key: MassPartKey;
  name: string;
  /** kg. */
  mass: number;
  /** Of the take-off mass, 0-1. */
  share: number;
}

const PART_NAMES: Record<MassPartKey, string> = { empty: 'Empty', fuel: 'Fuel', battery: 'Battery', payload: 'Payload', crew: 'Crew' };

/** Empty, fuel or battery, payload, crew: the parts with mass, each with its share of the take-off mass. */
export function massParts(mass: MassJson): MassPart[] {
  const total = mass.takeoff;
  const keys: MassPartKey[] = ['empty', mass.battery > 0 ? 'battery' : 'fuel', 'payload', 'crew'];
  return keys
    .map((key) => ({ key, name: PART_NAMES[key], mass: mass[key] }))
    .filter((part) => Number.isFinite(part.mass) && part.mass > 0)
    .map((part) => ({ ...part, share: total > 0 && Number.isFinite(total) ? part.mass / total : 0 }));
}

/** "62 %" (0-1 in); "—" when not a number. */
export function shareText(share: number): string {
  return Number.isFinite(share) ? `${Math.round(share * 100)} %` : '—';
}

/** Up to six decimals, as many as the number needs, with thousands separators (built once: a format per call is slow). */
const UP_TO_SIX_DECIMALS = new Intl.NumberFormat('en-US', { maximumFractionDigits: 6 });

/** Battery energy in kWh, or Wh below 1 kWh, three significant figures; "—" when there is none. */
export function energyText(joules: number | null): string {
  if (joules === null || !Number.isFinite(joules)) return '—';
  const kwh = joules / 3.6e6;
  const [value, unit] = Math.abs(kwh) >= 1 || kwh === 0 ? [kwh, 'kWh'] : [kwh * 1000, 'Wh'];
  return `${UP_TO_SIX_DECIMALS.format(Number(value.toPrecision(3)))} ${unit}`;
}

/** A plain number to three significant figures, "—" when not finite. */
export function plain3(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return UP_TO_SIX_DECIMALS.format(Number(value.toPrecision(3)));
}

export interface DriverRow {
  field: string;
  name: string;
  elasticity: number;
  /** "+1.8 %" for each 1 % more of the input. */
  text: string;
}

/** The drivers with a finite elasticity, largest effect first (ties keep the engine's order). */
export function driverRows(drivers: readonly MassDriverJson[]): DriverRow[] {
  return drivers
    .filter((driver) => Number.isFinite(driver.elasticity))
    .map((driver, order) => ({ driver, order }))
    .sort((a, b) => Math.abs(b.driver.elasticity) - Math.abs(a.driver.elasticity) || a.order - b.order)
    .map(({ driver }) => ({ field: driver.field, name: driver.name, elasticity: driver.elasticity, text: signedPercent(driver.elasticity) }));
}

function signedPercent(value: number): string {
  const rounded = Number(value.toFixed(2));
  const sign = rounded > 0 ? '+' : rounded < 0 ? '−' : '';
  return `${sign}${Math.abs(rounded).toFixed(2)} %`;
}

export const SEGMENT_NAMES: Record<MassSegmentJson['kind'], string> = {
  'takeoff-climb': 'Take-off and climb',
  climb: 'Climb',
  cruise: 'Cruise',
  loiter: 'Loiter',
  'descent-landing': 'Descent and landing',
  reserve: 'Reserve',
};
