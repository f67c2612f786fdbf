/**
 * alpha: the fraction of rated sea-level power or thrust available at a
 * flight condition, lapse times throttle (methods reference, section 5).
 */
// @ts-nocheck

import { atmosphere } from '../atmosphere';
import type { Propulsion } from '../aircraft';
import { propulsionKind } from './kinds';
import { DEFAULT_THROTTLE_RATIO, turbineLapse, type FlightAir } from './turbine-lapse';

/**
 * Lapse of the propulsion kind at density ratio sigma (no throttle); a
 * Mach-aware turbine model reads the flight air and Mach number instead.
 */
export function lapseAt(propulsion: Propulsion, sigma: number, air?: FlightAir): number {
  const model = propulsion.lapseModel ?? 'density';
  if (model !== 'density') {
    const flight = air ?? { temperatureK: NaN, pressurePa: NaN, mach: 0 };
    return turbineLapse(model, flight, propulsion.throttleRatio ?? DEFAULT_THROTTLE_RATIO);
  }
  return propulsionKind(propulsion.kind).lapse(sigma, propulsion);
}

/** alpha = lapse x power setting, at a pressure altitude, ISA offset and flight Mach number (0: static). */
export function availableFraction(
  propulsion: Propulsion,
  altitudeM: number,
  temperatureOffsetK: number,
  powerSetting: number,
  mach = 0,
): number {
  const air = atmosphere(altitudeM, temperatureOffsetK);
  return lapseAt(propulsion, air.sigma, { temperatureK: air.temperatureK, pressurePa: air.pressurePa, mach }) * powerSetting;
}
