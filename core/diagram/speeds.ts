/**
 * Speeds reported beside the design point: sea level ISA, take-off mass,
 * equivalent airspeeds (core/methods.md section 7).
 */
import { characteristicSpeeds, stallSpeed } from '../aero/speeds';
import { polarOf, type Polar } from '../aero/drag-polar';
import { RHO0 } from '../atmosphere';
import type { Aircraft } from '../model';
import type { SpeedsJson } from '../evaluation';

/** V_app = 1.3 V_s in the landing configuration (14 CFR 23.73). */
export const APPROACH_SPEED_FACTOR = 1.3;

/** Clean stall, minimum-drag and minimum-power speeds, approach speed and each configuration's stall speed. */
export function reportedSpeeds(aircraft: Aircraft, wingLoadingPa: number): SpeedsJson {
  const clean = polarOf(aircraft, 'clean') as Polar;
  const landing = polarOf(aircraft, 'landing') ?? clean;
  // Keyed by configuration names as written: no prototype, so any name is just a name.
  const stallByConfiguration: Record<string, number> = Object.create(null);
  for (const [name, configuration] of Object.entries(aircraft.configurations)) {
    stallByConfiguration[name] = stallSpeed(wingLoadingPa, RHO0, configuration.clMax);
  }
  return {
    ...characteristicSpeeds(clean, wingLoadingPa, RHO0),
    approach: APPROACH_SPEED_FACTOR * stallSpeed(wingLoadingPa, RHO0, landing.clMax),
    stallByConfiguration,
  };
}
