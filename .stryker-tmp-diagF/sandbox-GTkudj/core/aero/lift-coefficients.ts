/**
 * Lift coefficients of the characteristic flight conditions of a polar with a
 * linear term (core/methods.md section 4).
 */
// @ts-nocheck

import type { Polar } from './drag-polar';

/** C_L,md = sqrt(C_D0/K), independent of K1: minimises C_D/C_L (Anderson, Introduction to Flight, (L/D)max). */
export function minimumDragLiftCoefficient(polar: Polar): number {
  return Math.sqrt(polar.cd0 / polar.k);
}

/** C_L,mp = [K1 + sqrt(K1^2 + 12 K C_D0)]/(2K): minimises C_D/C_L^1.5 (Anderson, minimum power required). */
export function minimumPowerLiftCoefficient(polar: Polar): number {
  return (polar.k1 + Math.sqrt(polar.k1 * polar.k1 + 12 * polar.k * polar.cd0)) / (2 * polar.k);
}

/** C_L,mr from 3K C_L^2 + K1 C_L - C_D0 = 0: jet best range, max of sqrt(C_L)/C_D (Anderson, range of a jet). */
export function bestRangeLiftCoefficient(polar: Polar): number {
  return (-polar.k1 + Math.sqrt(polar.k1 * polar.k1 + 12 * polar.k * polar.cd0)) / (6 * polar.k);
}

/** (L/D)max = 1/(2 sqrt(K C_D0) + K1) (Anderson, Introduction to Flight, with the linear term). */
export function maximumLiftToDrag(polar: Polar): number {
  return 1 / (2 * Math.sqrt(polar.k * polar.cd0) + polar.k1);
}

/** L/D = C_L / C_D at a given lift coefficient. */
export function liftToDrag(polar: Polar, liftCoefficient: number): number {
  return liftCoefficient / (polar.cd0 + polar.k1 * liftCoefficient + polar.k * liftCoefficient * liftCoefficient);
}
