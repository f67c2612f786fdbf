/**
 * Landing ground-roll requirement: a wing-loading limit.
 */
// @ts-nocheck

import { G0 } from '../units/factors';
import { stallSpeed } from '../aero/speeds';
import { dragCoefficient } from '../aero/drag-polar';
import type { Aircraft } from '../aircraft';
import { fallingRoot } from '../numeric/bracket-root';
import { rollDistance } from './roll-distance';
import type { FlightCondition } from './flight-condition';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { flightCondition } from './flight-condition';

export interface LandingGroundRollRequirement extends RequirementCommon {
  kind: 'landing-ground-roll';
  distanceM: number;
  brakingFriction: number;
  touchdownSpeedFactor: number;
  freeRollTimeS: number;
  /** Lift coefficient in the braking roll; null: aerodynamic lift and drag left out (files without it keep that meaning). */
  clGround: number | null;
  /** Spoilers dump the lift in the braking roll (C_L 0; aerodynamic drag kept). */
  liftDumping: boolean;
}

/** The braking roll's lift coefficient with aerodynamic terms, or null without them. */
export function brakingLiftCoefficient(clGround: number | null, liftDumping: boolean): number | null {
  if (liftDumping) return 0;
  return clGround;
}

/**
 * Free roll at V_TD for t_fr, then braking from V_TD to rest with friction mu_B,
 * aerodynamic lift C_L,g and drag of the configuration, idle thrust taken as zero
 * (Raymer ch. 17 closed form). Infinity where braking cannot stop the aircraft.
 */
export function brakedRoll(c: FlightCondition, weightLoadingPa: number, touchdownSpeed: number, brakingFriction: number, freeRollTimeS: number, cl: number): number {
  return (
    touchdownSpeed * freeRollTimeS +
    rollDistance({
      thrustToWeight: 0,
      friction: brakingFriction,
      densityKgM3: c.densityKgM3,
      wingLoadingPa: weightLoadingPa,
      liftCoefficient: cl,
      dragCoefficient: dragCoefficient(c.polar, cl),
      startSpeed: touchdownSpeed,
      endSpeed: 0,
    })
  );
}

/** Largest wing loading [Pa] whose distance(w) stays within allowed; 0 where none does. */
export function largestWingLoading(distance: (w: number) => number, allowedM: number): number {
  const most = 1e7;
  if (allowedM - distance(most) >= 0) return most;
  const w = fallingRoot((x) => (allowedM - distance(x) >= 0 ? 1 : -1), 1e-3, 1000, most);
  return Number.isFinite(w) ? w : 0;
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
  const touchdownAt = (w: number): number => requirement.touchdownSpeedFactor * stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax);
  const cl = brakingLiftCoefficient(requirement.clGround, requirement.liftDumping);
  let wingLoadingMaxPa: number;
  if (cl === null) {
    const vTouchdown = touchdownSpeedForRoll(requirement.distanceM, requirement.brakingFriction, requirement.freeRollTimeS);
    const vStall = vTouchdown / requirement.touchdownSpeedFactor;
    wingLoadingMaxPa = (0.5 * c.densityKgM3 * c.polar.clMax * vStall * vStall) / c.beta;
  } else {
    wingLoadingMaxPa = largestWingLoading(
      (w) => brakedRoll(c, c.beta * w, touchdownAt(w), requirement.brakingFriction, requirement.freeRollTimeS, cl),
      requirement.distanceM,
    );
  }
  return {
    type: 'limit',
    id: requirement.id,
    kind: requirement.kind,
    wingLoadingMaxPa,
    speedAt: (w: number): number => (w > 0 ? touchdownAt(w) : NaN),
  };
}
