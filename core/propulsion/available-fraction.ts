/**
 * alpha: the fraction of rated sea-level power or thrust available at a
 * flight condition, lapse times throttle (METHODS.md section 5).
 */
import { atmosphere } from '../atmosphere';
import type { Propulsion } from '../model';
import { electricLapse, pistonLapse, turbochargedPistonLapse, turbofanLapse, turbopropLapse } from './lapse';

/** Lapse of the propulsion kind at density ratio sigma (no throttle). */
export function lapseAt(propulsion: Propulsion, sigma: number): number {
  switch (propulsion.kind) {
    case 'piston':
      return pistonLapse(sigma);
    case 'turbocharged-piston':
      // sigma_crit is the standard day's (dT = 0) at the critical altitude.
      return turbochargedPistonLapse(sigma, atmosphere(propulsion.criticalAltitudeM ?? 0, 0).sigma);
    case 'turboprop':
      return turbopropLapse(sigma, propulsion.lapseExponent);
    case 'turbofan':
      return turbofanLapse(sigma, propulsion.lapseExponent);
    case 'electric':
      return electricLapse();
  }
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
