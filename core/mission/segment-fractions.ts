/**
 * Historical mass fractions (end over start) of the segments a mission
 * gives no physics for: Raymer, Aircraft Design: A Conceptual Approach,
 * section 3.4, table of historical mission-segment weight fractions
 * (from memory): warm-up and take-off 0.970, climb 0.985, landing 0.995.
 */

/** Warm-up and take-off (Raymer, section 3.4; from memory). */
export const WARMUP_TAKEOFF_FRACTION = 0.97;
/** Climb (Raymer, section 3.4; from memory). */
export const CLIMB_FRACTION = 0.985;
/** Descent and landing (Raymer, section 3.4; from memory). */
export const DESCENT_LANDING_FRACTION = 0.995;

/** The default fraction of each segment kind a fraction describes; take-off and climb together is the product. */
export const DEFAULT_SEGMENT_FRACTION = {
  'takeoff-climb': WARMUP_TAKEOFF_FRACTION * CLIMB_FRACTION,
  climb: CLIMB_FRACTION,
  'descent-landing': DESCENT_LANDING_FRACTION,
} as const;
