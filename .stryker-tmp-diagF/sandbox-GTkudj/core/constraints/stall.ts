/**
 * Stall speed requirement: a wing-loading limit.
 */
// @ts-nocheck

import { RHO0 } from '../atmosphere';
import { stallSpeed } from '../aero/speeds';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { flightCondition } from './flight-condition';

export interface StallRequirement extends RequirementCommon {
  kind: 'stall';
  /** Calibrated airspeed [m/s]. */
  speedMps: number;
}

/**
 * w <= 1/2 rho0 V_E^2 C_Lmax,c / beta (Anderson, stalling speed). The required
 * speed is calibrated; it is taken as equivalent (CAS = EAS, under 0.1 % off
 * below M 0.3, core/methods.md section 2), so the limit uses sea-level density.
 */
export function stallBoundary(requirement: StallRequirement, aircraft: Aircraft): BoundaryOf<'stall'> {
  const c = flightCondition(requirement, aircraft);
  const v = requirement.speedMps;
  return {
    type: 'limit',
    id: requirement.id,
    kind: requirement.kind,
    wingLoadingMaxPa: (0.5 * RHO0 * v * v * c.polar.clMax) / c.beta,
    // The stall speed as TAS at the requirement's air, for the condition's speed and Mach.
    speedAt: (w: number): number => (w > 0 ? stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) : NaN),
  };
}
