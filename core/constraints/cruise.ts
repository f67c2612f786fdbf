/**
 * Cruise speed requirement: level, unaccelerated flight at a true airspeed.
 */
import type { Aircraft, Boundary, CruiseRequirement } from '../model';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

/** Master equation with n = 1, P_s = 0 at the given TAS (Mattingly; METHODS.md section 6). */
export function cruiseBoundary(requirement: CruiseRequirement, aircraft: Aircraft): Boundary {
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
