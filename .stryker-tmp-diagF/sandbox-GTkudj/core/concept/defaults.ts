/**
 * What a concept means where it says nothing (DESIGN.md, "The concept file").
 * SI values; the resolver is the only reader. Each requirement kind's own
 * defaults are in its descriptor (core/requirements), each propulsion kind's
 * in its own (core/propulsion/kinds).
 */
// @ts-nocheck


export const DEFAULT_CONCEPT_NAME = 'Untitled concept';
export const DEFAULT_SAMPLES = 201;
export const DEFAULT_ENGINES = 1;
export const DEFAULT_CD_LINEAR = 0;
export const DEFAULT_CD0_INCREMENT = 0;

/** Per-requirement defaults, SI. */
export const REQUIREMENT_DEFAULTS = {
  enabled: true,
  altitudeM: 0,
  temperatureOffsetK: 0,
  massFraction: 1,
  powerSetting: 1,
  /** eta_p of a kind that gives none (stall and landing roll use no power). */
  propellerEfficiency: 0.75,
} as const;
