/**
 * Ground roll under constant thrust, friction, lift and drag, between two
 * speeds: Raymer's closed form (Aircraft Design: A Conceptual Approach,
 * ch. 17, eq. 17.101, from memory), used for the take-off run and the
 * braking run.
 */
// @ts-nocheck

import { G0 } from '../units/factors';

/**
 * S = ln[(K_T + K_A V_end^2) / (K_T + K_A V_start^2)] / (2 g0 K_A),
 * K_T = T/W - mu, K_A = rho (mu C_L - C_D) / (2 W/S).
 * Infinity when the end speed is never reached (acceleration would turn
 * sign before it); K_A -> 0 gives the uniform-acceleration form.
 */
export function rollDistance(p: {
  thrustToWeight: number;
  friction: number;
  densityKgM3: number;
  wingLoadingPa: number;
  liftCoefficient: number;
  dragCoefficient: number;
  startSpeed: number;
  endSpeed: number;
}): number {
  const kT = p.thrustToWeight - p.friction;
  const kA = (p.densityKgM3 * (p.friction * p.liftCoefficient - p.dragCoefficient)) / (2 * p.wingLoadingPa);
  const a0 = kT + kA * p.startSpeed * p.startSpeed;
  const a1 = kT + kA * p.endSpeed * p.endSpeed;
  // Accelerating needs a0, a1 > 0; decelerating a0, a1 < 0 (same sign all the way).
  if (!(a0 * a1 > 0)) return Infinity;
  const s = Math.abs(kA) < 1e-12 ? (p.endSpeed * p.endSpeed - p.startSpeed * p.startSpeed) / (2 * G0 * kT) : Math.log(a1 / a0) / (2 * G0 * kA);
  return s >= 0 ? s : Infinity;
}
