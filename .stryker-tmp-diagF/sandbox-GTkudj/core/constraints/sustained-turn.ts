/**
 * Sustained level turn at a true airspeed and load factor n = 1/cos(bank).
 */
// @ts-nocheck

import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

export interface SustainedTurnRequirement extends RequirementCommon {
  kind: 'sustained-turn';
  /** True airspeed [m/s]. */
  speedMps: number;
  loadFactor: number;
}

/** Master equation with the turn's n and P_s = 0 (Mattingly; core/methods.md section 6). */
export function sustainedTurnBoundary(requirement: SustainedTurnRequirement, aircraft: Aircraft): BoundaryOf<'sustained-turn'> {
  const c = flightCondition(requirement, aircraft);
  const v = requirement.speedMps;
  const n = requirement.loadFactor;
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, v, n, 0),
    speedAt: (): number => v,
    // n beta w / q = C_Lmax: above this wing loading the turn stalls at its speed, whatever the thrust.
    stallLimitPa: (0.5 * c.densityKgM3 * v * v * c.polar.clMax) / (n * c.beta),
  };
}
