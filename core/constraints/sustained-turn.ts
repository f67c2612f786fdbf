/**
 * Sustained level turn at a true airspeed and load factor n = 1/cos(bank).
 */
import type { Aircraft, Boundary, SustainedTurnRequirement } from '../model';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

/** Master equation with the turn's n and P_s = 0 (Mattingly; METHODS.md section 6). */
export function sustainedTurnBoundary(requirement: SustainedTurnRequirement, aircraft: Aircraft): Boundary {
  const c = flightCondition(requirement, aircraft);
  const v = requirement.speedMps;
  const n = requirement.loadFactor;
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, v, n, 0),
    speedAt: (): number => v,
  };
}
