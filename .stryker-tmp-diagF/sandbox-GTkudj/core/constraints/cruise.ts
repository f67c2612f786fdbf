/**
 * Cruise speed requirement: level, unaccelerated flight at a true airspeed.
 */
// @ts-nocheck

import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

export interface CruiseRequirement extends RequirementCommon {
  kind: 'cruise';
  /** True airspeed [m/s]. */
  speedMps: number;
}

/** Master equation with n = 1, P_s = 0 at the given TAS (Mattingly; core/methods.md section 6). */
export function cruiseBoundary(requirement: CruiseRequirement, aircraft: Aircraft): BoundaryOf<'cruise'> {
  const c = flightCondition(requirement, aircraft);
  const v = requirement.speedMps;
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, v, 1, 0),
    speedAt: (): number => v,
  };
}
