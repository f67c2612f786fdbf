/**
 * Landing ground-roll requirement: a wing-loading limit.
 */
import { G0 } from '../units/factors';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { flightCondition } from './flight-condition';

export interface LandingGroundRollRequirement extends RequirementCommon {
  kind: 'landing-ground-roll';
  distanceM: number;
  brakingFriction: number;
  touchdownSpeedFactor: number;
  freeRollTimeS: number;
}

/**
 * Touchdown speed that stops in the distance: free roll for t_fr, then
 * constant deceleration a = mu_B g0 (kinematics, core/methods.md section 6):
 * V_TD = -a t_fr + sqrt((a t_fr)^2 + 2 a S_LG).
 */
export function touchdownSpeedForRoll(distanceM: number, brakingFriction: number, freeRollTimeS: number): number {
  const a = brakingFriction * G0;
  const at = a * freeRollTimeS;
  return -at + Math.sqrt(at * at + 2 * a * distanceM);
}

/** w <= 1/2 rho C_Lmax,L (V_TD/k_TD)^2 / beta, V_TD = k_TD V_s,L (Raymer ch. 17, k_TD 1.15 from memory). */
export function landingGroundRollBoundary(requirement: LandingGroundRollRequirement, aircraft: Aircraft): BoundaryOf<'landing-ground-roll'> {
  const c = flightCondition(requirement, aircraft);
  const vTouchdown = touchdownSpeedForRoll(requirement.distanceM, requirement.brakingFriction, requirement.freeRollTimeS);
  const vStall = vTouchdown / requirement.touchdownSpeedFactor;
  return {
    type: 'limit',
    id: requirement.id,
    kind: requirement.kind,
    wingLoadingMaxPa: (0.5 * c.densityKgM3 * c.polar.clMax * vStall * vStall) / c.beta,
    speedMps: vTouchdown,
  };
}
