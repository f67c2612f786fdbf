/**
 * Empty-mass fraction from the take-off mass by aircraft class:
 * W_e/W_0 = A W_0^C K_vs, W_0 in lb (Raymer, Aircraft Design: A Conceptual
 * Approach, section 3.4, the table of empty-weight fraction against W_0;
 * coefficients from memory, fixed sweep K_vs = 1), times a technology factor.
 */
import { POUND_KG } from '../units/factors';
import type { AircraftClass } from './aircraft-class';

/** A and C of W_e/W_0 = A W_0^C with W_0 in lb (Raymer, section 3.4; from memory). */
export const EMPTY_MASS_REGRESSION: Record<AircraftClass, { a: number; c: number }> = {
  sailplane: { a: 0.86, c: -0.05 },
  'powered-sailplane': { a: 0.91, c: -0.05 },
  homebuilt: { a: 1.19, c: -0.09 },
  'composite-homebuilt': { a: 1.15, c: -0.09 },
  'single-engine-general-aviation': { a: 2.36, c: -0.18 },
  'twin-engine-general-aviation': { a: 1.51, c: -0.1 },
  agricultural: { a: 0.74, c: -0.03 },
  'twin-turboprop': { a: 0.96, c: -0.05 },
  'flying-boat': { a: 1.09, c: -0.05 },
  'jet-trainer': { a: 1.59, c: -0.1 },
  'jet-fighter': { a: 2.34, c: -0.13 },
  'military-cargo': { a: 0.93, c: -0.07 },
  'jet-transport': { a: 1.02, c: -0.06 },
  'uncrewed-tactical': { a: 1.67, c: -0.16 },
  'uncrewed-high-altitude': { a: 2.75, c: -0.18 },
  'uncrewed-small': { a: 0.97, c: -0.06 },
};

/** W_e/W_0 at a take-off mass [kg] for a class, times the technology factor. */
export function regressionEmptyFraction(takeoffMassKg: number, aircraftClass: AircraftClass, technologyFactor: number): number {
  const { a, c } = EMPTY_MASS_REGRESSION[aircraftClass];
  return technologyFactor * a * (takeoffMassKg / POUND_KG) ** c;
}
