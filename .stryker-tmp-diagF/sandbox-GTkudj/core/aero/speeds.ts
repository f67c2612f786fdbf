/**
 * Characteristic speeds of a polar at a wing loading and density
 * (core/methods.md section 4). With the sea-level density they are equivalent
 * airspeeds; with the density at altitude, true airspeeds.
 */
// @ts-nocheck

import type { Polar } from './drag-polar';
import { minimumDragLiftCoefficient, minimumPowerLiftCoefficient } from './lift-coefficients';

/** V = sqrt(2 W/S / (rho C_L)), level flight lift = weight (Anderson, Introduction to Flight). */
export function speedForLiftCoefficient(wingLoadingPa: number, densityKgM3: number, liftCoefficient: number): number {
  return Math.sqrt((2 * wingLoadingPa) / (densityKgM3 * liftCoefficient));
}

/** V_s = sqrt(2 W/S / (rho C_Lmax)) (Anderson, Introduction to Flight, stalling speed). */
export function stallSpeed(wingLoadingPa: number, densityKgM3: number, clMax: number): number {
  return speedForLiftCoefficient(wingLoadingPa, densityKgM3, clMax);
}

export interface CharacteristicSpeeds {
  stall: number;
  minimumDrag: number;
  minimumPower: number;
}

/**
 * Stall, minimum-drag and minimum-power speeds. Minimum-drag and
 * minimum-power are reported even when their C_L exceeds C_Lmax; callers
 * flag those as unflyable.
 */
export function characteristicSpeeds(polar: Polar, wingLoadingPa: number, densityKgM3: number): CharacteristicSpeeds {
  return {
    stall: stallSpeed(wingLoadingPa, densityKgM3, polar.clMax),
    minimumDrag: speedForLiftCoefficient(wingLoadingPa, densityKgM3, minimumDragLiftCoefficient(polar)),
    minimumPower: speedForLiftCoefficient(wingLoadingPa, densityKgM3, minimumPowerLiftCoefficient(polar)),
  };
}
