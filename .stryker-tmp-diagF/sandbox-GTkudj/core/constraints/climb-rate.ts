/**
 * Rate-of-climb requirement, at a given speed or at the best-rate speed.
 */
// @ts-nocheck

import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { bestRateSpeed } from './best-rate-speed';
import { flightCondition, type FlightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

export interface ClimbRateRequirement extends RequirementCommon {
  kind: 'climb-rate';
  rateMps: number;
  /** True airspeed [m/s]; absent means the best-rate speed. */
  speedMps?: number;
  minimumSpeedFactor: number;
}

/** Speed of a climb at rate RC: the given TAS, else max(V*, k V_s,c). */
export function climbSpeedAt(
  c: FlightCondition,
  wingLoadingPa: number,
  rateMps: number,
  minimumSpeedFactor: number,
  givenSpeedMps?: number,
): number {
  if (givenSpeedMps !== undefined) return givenSpeedMps;
  return wingLoadingPa > 0 ? bestRateSpeed(c, wingLoadingPa, rateMps, minimumSpeedFactor) : NaN;
}

/** Master equation with n = 1, P_s = RC (Mattingly; core/methods.md section 6). */
export function climbRateBoundary(requirement: ClimbRateRequirement, aircraft: Aircraft): BoundaryOf<'climb-rate'> {
  const c = flightCondition(requirement, aircraft);
  const { rateMps, minimumSpeedFactor, speedMps } = requirement;
  const speedAt = (w: number): number => climbSpeedAt(c, w, rateMps, minimumSpeedFactor, speedMps);
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, speedAt(w), 1, rateMps),
    speedAt,
  };
}
