/**
 * The case fields a concept may state so that the studies pick the published
 * band of its own kind: the class of aircraft (aspect ratio, clean CD0) and
 * the runway surface of a take-off (rolling friction). Both are optional; a
 * concept without them gets the band that holds its own value.
 */

/** What kind of aircraft the concept is, as the typical-range table groups them. */
export const AIRCRAFT_CLASSES = ['light-aircraft', 'business-jet', 'transport', 'small-uav', 'sailplane'] as const;
export type AircraftClass = (typeof AIRCRAFT_CLASSES)[number];

/** What the take-off run is made on. */
export const RUNWAY_SURFACES = ['paved', 'grass', 'soft'] as const;
export type RunwaySurface = (typeof RUNWAY_SURFACES)[number];

/** Words for a class, as a sentence uses them. */
export const AIRCRAFT_CLASS_WORDS: Readonly<Record<AircraftClass, string>> = {
  'light-aircraft': 'light aircraft',
  'business-jet': 'business jet',
  transport: 'transport',
  'small-uav': 'small UAV',
  sailplane: 'sailplane',
};

export const RUNWAY_SURFACE_WORDS: Readonly<Record<RunwaySurface, string>> = {
  paved: 'paved runway',
  grass: 'grass strip',
  soft: 'soft ground',
};
