/**
 * Climb-gradient requirement (e.g. the 2.4 % second segment of 14 CFR
 * 25.121(b) for twins), possibly with engines inoperative.
 */
// @ts-nocheck

import { stallSpeed } from '../aero/speeds';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import type { RequirementCommon } from '../requirements/common';
import { engineOutFactor } from './engine-out';
import { flightCondition } from './flight-condition';
import { loadingRequired } from './master-equation';

export interface ClimbGradientRequirement extends RequirementCommon {
  kind: 'climb-gradient';
  /** sin(gamma), e.g. 0.024 for 2.4 %. */
  gradient: number;
  enginesInoperative: number;
  speedFactor: number;
}

/**
 * T/W = f_N (beta/alpha)[q C_D0/(beta w) + K1 + K beta w/q + G] at V = k_V V_s,c
 * (core/methods.md section 6): the master equation with P_s/V = G. With V/V_s fixed
 * the jet boundary is horizontal and the propeller boundary grows as sqrt(w).
 * All NaN when no engine is left running (k >= N).
 */
export function climbGradientBoundary(requirement: ClimbGradientRequirement, aircraft: Aircraft): BoundaryOf<'climb-gradient'> {
  const c = flightCondition(requirement, aircraft);
  const factor = engineOutFactor(aircraft.propulsion.engines, requirement.enginesInoperative);
  const { gradient, speedFactor } = requirement;
  const speedAt = (w: number): number =>
    w > 0 ? speedFactor * stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) : NaN;
  return {
    type: 'curve',
    id: requirement.id,
    kind: requirement.kind,
    required(w: number): number {
      const v = speedAt(w);
      return factor * loadingRequired(c, w, v, 1, gradient * v);
    },
    speedAt,
  };
}
