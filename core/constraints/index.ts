/**
 * One boundary per requirement kind (METHODS.md section 6).
 */
import type { Aircraft, Boundary, Requirement } from '../model';
import { ceilingBoundary } from './ceiling';
import { climbGradientBoundary } from './climb-gradient';
import { climbRateBoundary } from './climb-rate';
import { cruiseBoundary } from './cruise';
import { landingGroundRollBoundary } from './landing-ground-roll';
import { stallBoundary } from './stall';
import { sustainedTurnBoundary } from './sustained-turn';
import { takeoffGroundRollBoundary } from './takeoff-ground-roll';

/** The boundary a requirement draws on the wing-loading plane. */
export function boundaryOf(requirement: Requirement, aircraft: Aircraft): Boundary {
  switch (requirement.kind) {
    case 'stall':
      return stallBoundary(requirement, aircraft);
    case 'landing-ground-roll':
      return landingGroundRollBoundary(requirement, aircraft);
    case 'takeoff-ground-roll':
      return takeoffGroundRollBoundary(requirement, aircraft);
    case 'cruise':
      return cruiseBoundary(requirement, aircraft);
    case 'climb-rate':
      return climbRateBoundary(requirement, aircraft);
    case 'climb-gradient':
      return climbGradientBoundary(requirement, aircraft);
    case 'ceiling':
      return ceilingBoundary(requirement, aircraft);
    case 'sustained-turn':
      return sustainedTurnBoundary(requirement, aircraft);
  }
}

export {
  stallBoundary,
  landingGroundRollBoundary,
  takeoffGroundRollBoundary,
  cruiseBoundary,
  climbRateBoundary,
  climbGradientBoundary,
  ceilingBoundary,
  sustainedTurnBoundary,
};
export { touchdownSpeedForRoll } from './landing-ground-roll';
export { MEAN_ROLL_SPEED_FRACTION } from './takeoff-ground-roll';
export { bestRateSpeed, propellerBestRateSpeed, jetBestRateSpeed } from './best-rate-speed';
export { engineOutFactor } from './engine-out';
export { flightCondition, type FlightCondition } from './flight-condition';
export { thrustLoadingRequired, loadingRequired } from './master-equation';
