/**
 * Ceiling requirement: a residual rate of climb (100 ft/min for the service
 * ceiling, Anderson and Raymer) at the ceiling altitude, at the best-rate speed.
 */
// @ts-nocheck

import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { climbSpeedAt } from './climb-rate';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

export interface CeilingRequirement extends RequirementCommon {
  kind: 'ceiling';
  rateMps: number;
  minimumSpeedFactor: number;
}

/** Master equation with n = 1, P_s = RC at max(V*, k V_s) (core/methods.md section 6). */
export function ceilingBoundary(requirement: CeilingRequirement, aircraft: Aircraft): BoundaryOf<'ceiling'> {
  const c = flightCondition(requirement, aircraft);
  const { rateMps, minimumSpeedFactor } = requirement;
  const speedAt = (w: number): number => climbSpeedAt(c, w, rateMps, minimumSpeedFactor);
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required: (w: number): number => loadingRequired(c, w, speedAt(w), 1, rateMps),
    speedAt,
  };
}
