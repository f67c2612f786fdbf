/**
 * Oswald span efficiency estimated from aspect ratio and leading-edge sweep
 * (Raymer, Aircraft Design: A Conceptual Approach, 4th ed., section 12.6;
 * equation numbers 12.48/12.49 from memory).
 */
// @ts-nocheck


/** Sweep above which the swept-wing form applies [rad]. */
export const SWEPT_WING_THRESHOLD_RAD = (30 * Math.PI) / 180;

/** e = 1.78(1 - 0.045 AR^0.68) - 0.64 (Raymer eq. 12.48, straight wing). */
export function oswaldStraightWing(aspectRatio: number): number {
  return 1.78 * (1 - 0.045 * Math.pow(aspectRatio, 0.68)) - 0.64;
}

/** e = 4.61(1 - 0.045 AR^0.68)(cos L_LE)^0.15 - 3.1 (Raymer eq. 12.49, L_LE > 30 deg). */
export function oswaldSweptWing(aspectRatio: number, leadingEdgeSweepRad: number): number {
  return 4.61 * (1 - 0.045 * Math.pow(aspectRatio, 0.68)) * Math.pow(Math.cos(leadingEdgeSweepRad), 0.15) - 3.1;
}

/** Raymer's estimate, choosing the straight or swept form by the leading-edge sweep. */
export function oswaldEstimate(aspectRatio: number, leadingEdgeSweepRad = 0): number {
  return Math.abs(leadingEdgeSweepRad) > SWEPT_WING_THRESHOLD_RAD
    ? oswaldSweptWing(aspectRatio, Math.abs(leadingEdgeSweepRad))
    : oswaldStraightWing(aspectRatio);
}
