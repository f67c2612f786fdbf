/**
 * The parabolic drag polar with a linear term, C_D = C_D0 + K1 C_L + K C_L^2,
 * for one aerodynamic configuration.
 */
// @ts-nocheck

import type { Aircraft } from '../aircraft';

/** A configuration's polar with the induced-drag factor worked out. */
export interface Polar {
  cd0: number;
  /** K1, the linear term. */
  k1: number;
  /** K = 1 / (pi e AR). */
  k: number;
  clMax: number;
}

/** K = 1/(pi e AR) (Anderson, Introduction to Flight, induced drag of a finite wing). */
export function inducedDragFactor(aspectRatio: number, oswaldEfficiency: number): number {
  return 1 / (Math.PI * oswaldEfficiency * aspectRatio);
}

/** C_D = C_D0 + K1 C_L + K C_L^2 (core/methods.md section 3; Mattingly's K1 is our K). */
export function dragCoefficient(polar: Polar, liftCoefficient: number): number {
  return polar.cd0 + polar.k1 * liftCoefficient + polar.k * liftCoefficient * liftCoefficient;
}

/** The smallest drag coefficient of the polar, C_D0 - K1^2/(4K), reached at C_L = -K1/(2K). */
export function minimumDragCoefficient(polar: Polar): number {
  return polar.cd0 - (polar.k1 * polar.k1) / (4 * polar.k);
}

/**
 * The polar of a named configuration; `undefined` when the aircraft does not
 * define that name.
 */
export function polarOf(aircraft: Aircraft, configuration: string): Polar | undefined {
  const c = Object.prototype.hasOwnProperty.call(aircraft.configurations, configuration)
    ? aircraft.configurations[configuration]
    : undefined;
  if (c === undefined) return undefined;
  return {
    cd0: c.cd0,
    k1: aircraft.cdLinear,
    k: inducedDragFactor(aircraft.aspectRatio, c.oswaldEfficiency),
    clMax: c.clMax,
  };
}
