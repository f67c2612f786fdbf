/**
 * alpha: the fraction of rated sea-level power or thrust available at a
 * flight condition, lapse times throttle (methods reference, section 5).
 */
import { atmosphere } from '../atmosphere';
import type { Propulsion } from '../aircraft';
import { propulsionKind } from './kinds';

/** Lapse of the propulsion kind at density ratio sigma (no throttle). */
export function lapseAt(propulsion: Propulsion, sigma: number): number {
  return propulsionKind(propulsion.kind).lapse(sigma, propulsion);
}

/** alpha = lapse(sigma) x power setting, at a pressure altitude and ISA offset. */
export function availableFraction(
  propulsion: Propulsion,
  altitudeM: number,
  temperatureOffsetK: number,
  powerSetting: number,
): number {
  return lapseAt(propulsion, atmosphere(altitudeM, temperatureOffsetK).sigma) * powerSetting;
}
