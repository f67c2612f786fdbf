/**
 * Stall speed requirement: a wing-loading limit.
 */
import { RHO0 } from '../atmosphere';
import type { Aircraft, Boundary, StallRequirement } from '../model';
import { flightCondition } from './flight-condition';

/**
 * w <= 1/2 rho0 V_E^2 C_Lmax,c / beta (Anderson, stalling speed). The required
 * speed is calibrated; it is taken as equivalent (CAS = EAS, under 0.1 % off
 * below M 0.3, METHODS.md section 2), so the limit uses sea-level density.
 */
export function stallBoundary(requirement: StallRequirement, aircraft: Aircraft): Boundary {
  const c = flightCondition(requirement, aircraft);
  const v = requirement.speedMps;
  return {
    type: 'limit',
    id: requirement.id,
    kind: requirement.kind,
    wingLoadingMaxPa: (0.5 * RHO0 * v * v * c.polar.clMax) / c.beta,
  };
}
