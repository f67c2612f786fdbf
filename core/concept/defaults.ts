/**
 * What a concept means where it says nothing (DESIGN.md, "The concept file";
 * METHODS.md section 12). SI values; the resolver is the only reader.
 */
import type { PropulsionKind, RequirementKind } from '../model';
import { FOOT_PER_MINUTE_MPS } from '../units/factors';

export const DEFAULT_CONCEPT_NAME = 'Untitled concept';
export const DEFAULT_SAMPLES = 201;
export const DEFAULT_ENGINES = 1;
export const DEFAULT_CD_LINEAR = 0;
export const DEFAULT_CD0_INCREMENT = 0;

/** m in sigma^m: turboprop 0.75, turbofan 1.0 (METHODS.md section 5); unused by the others. */
export const DEFAULT_LAPSE_EXPONENT: Readonly<Record<PropulsionKind, number>> = {
  piston: 1,
  'turbocharged-piston': 1,
  turboprop: 0.75,
  turbofan: 1,
  electric: 1,
};

/** Stall and landing in landing flaps, take-off run and climb gradient in take-off flaps. */
export const DEFAULT_CONFIGURATION: Readonly<Record<RequirementKind, string>> = {
  stall: 'landing',
  'landing-ground-roll': 'landing',
  'takeoff-ground-roll': 'takeoff',
  'climb-gradient': 'takeoff',
  cruise: 'clean',
  'climb-rate': 'clean',
  ceiling: 'clean',
  'sustained-turn': 'clean',
};

/** eta_p: take-off run 0.55, cruise and turn 0.8, others 0.75 (METHODS.md sections 9, 12). */
export const DEFAULT_PROPELLER_EFFICIENCY: Readonly<Record<RequirementKind, number>> = {
  stall: 0.75,
  'landing-ground-roll': 0.75,
  'takeoff-ground-roll': 0.55,
  'climb-gradient': 0.75,
  cruise: 0.8,
  'climb-rate': 0.75,
  ceiling: 0.75,
  'sustained-turn': 0.8,
};

/** Per-requirement defaults, SI. */
export const REQUIREMENT_DEFAULTS = {
  enabled: true,
  altitudeM: 0,
  temperatureOffsetK: 0,
  massFraction: 1,
  powerSetting: 1,
  brakingFriction: 0.3,
  touchdownSpeedFactor: 1.15,
  freeRollTimeS: 0,
  rollingFriction: 0.04,
  clGroundRun: 0.5,
  liftoffSpeedFactor: 1.1,
  minimumSpeedFactor: 1.2,
  enginesInoperative: 0,
  speedFactor: 1.2,
  /** Service ceiling: 100 ft/min (Anderson, Introduction to Flight; Raymer). */
  ceilingRateMps: 100 * FOOT_PER_MINUTE_MPS,
} as const;
