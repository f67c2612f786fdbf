/**
 * One boundary per requirement, from its kind's descriptor (core/requirements;
 * methods reference, section 6).
 */
// @ts-nocheck

import type { Aircraft, Boundary, Requirement } from '../model';
import { requirementKind } from '../requirements';

/** The boundary a requirement draws on the wing-loading plane. */
export function boundaryOf(requirement: Requirement, aircraft: Aircraft): Boundary {
  return requirementKind(requirement.kind).boundary(requirement, aircraft);
}

export { bestRateSpeed, propellerBestRateSpeed, jetBestRateSpeed } from './best-rate-speed';
export { engineOutFactor } from './engine-out';
export { flightCondition, type FlightCondition } from './flight-condition';
export { thrustLoadingRequired, loadingRequired } from './master-equation';
