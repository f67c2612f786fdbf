/**
 * Speeds reported beside the design point: sea level ISA, take-off mass,
 * equivalent airspeeds (core/methods.md section 7).
 */
import { characteristicSpeeds, stallSpeed } from '../aero/speeds';
import { polarOf, type Polar } from '../aero/drag-polar';
import { RHO0 } from '../atmosphere';
import type { Aircraft, Requirement } from '../model';
import type { SpeedsJson } from '../evaluation';

/** V_app = 1.3 V_s in the landing configuration (14 CFR 23.73). */
export const APPROACH_SPEED_FACTOR = 1.3;

/**
 * The characteristic approach speed and the words saying how it was taken:
 * the first enabled approach-speed requirement's factor, configuration and
 * landing mass, else 1.3 V_S0 at take-off mass (the small-aircraft rule).
 */
export function characteristicApproach(aircraft: Aircraft, wingLoadingPa: number, requirements: readonly Requirement[] = []): { speed: number; basis: string } {
  const clean = polarOf(aircraft, 'clean') as Polar;
  const given = requirements.find((r) => r.enabled && r.kind === 'approach-speed');
  if (given && given.kind === 'approach-speed') {
    const polar = polarOf(aircraft, given.configuration) ?? clean;
    const k = Number(given.speedFactor.toFixed(3));
    const mass = Number((given.massFraction * 100).toFixed(1));
    return {
      speed: given.speedFactor * stallSpeed(given.massFraction * wingLoadingPa, RHO0, polar.clMax),
      basis: `${k} × ${given.configuration} stall speed at ${mass} % of take-off mass (requirement "${given.id}")`,
    };
  }
  const landing = polarOf(aircraft, 'landing') ?? clean;
  return {
    speed: APPROACH_SPEED_FACTOR * stallSpeed(wingLoadingPa, RHO0, landing.clMax),
    basis: '1.3 × landing stall speed at take-off mass (small-aircraft rule, 14 CFR 23.73)',
  };
}

/** Clean stall, minimum-drag and minimum-power speeds, approach speed and each configuration's stall speed. */
export function reportedSpeeds(aircraft: Aircraft, wingLoadingPa: number, requirements: readonly Requirement[] = []): SpeedsJson {
  const clean = polarOf(aircraft, 'clean') as Polar;
  // Keyed by configuration names as written: no prototype, so any name is just a name.
  const stallByConfiguration: Record<string, number> = Object.create(null);
  for (const [name, configuration] of Object.entries(aircraft.configurations)) {
    stallByConfiguration[name] = stallSpeed(wingLoadingPa, RHO0, configuration.clMax);
  }
  return {
    ...characteristicSpeeds(clean, wingLoadingPa, RHO0),
    ...(() => {
      const a = characteristicApproach(aircraft, wingLoadingPa, requirements);
      return { approach: a.speed, approachBasis: a.basis };
    })(),
    stallByConfiguration,
  };
}
