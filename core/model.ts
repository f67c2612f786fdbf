/**
 * The resolved design model: what the engine computes with.
 *
 * Every number is SI (m, kg, s, N, W, Pa, K). The concept file's strings with
 * units are turned into this model once, by core/concept/resolve.ts; nothing
 * downstream parses units.
 */
import type { WarningJson } from './evaluation';

export type PropulsionKind = 'piston' | 'turbocharged-piston' | 'turboprop' | 'turbofan' | 'electric';

export const PROPULSION_KINDS: readonly PropulsionKind[] = [
  'piston',
  'turbocharged-piston',
  'turboprop',
  'turbofan',
  'electric',
];

export type RequirementKind =
  | 'stall'
  | 'landing-ground-roll'
  | 'takeoff-ground-roll'
  | 'cruise'
  | 'climb-rate'
  | 'climb-gradient'
  | 'ceiling'
  | 'sustained-turn';

export const REQUIREMENT_KINDS: readonly RequirementKind[] = [
  'stall',
  'landing-ground-roll',
  'takeoff-ground-roll',
  'cruise',
  'climb-rate',
  'climb-gradient',
  'ceiling',
  'sustained-turn',
];

/** Which loading the diagram's vertical axis shows. */
export type LoadingAxis = 'powerToWeight' | 'thrustToWeight';

/** One aerodynamic configuration with absolute values (clean's cd0 plus the increment). */
export interface ConfigurationPolar {
  cd0: number;
  oswaldEfficiency: number;
  clMax: number;
}

export interface Propulsion {
  kind: PropulsionKind;
  engines: number;
  /** m in sigma^m; used by turboprop and turbofan. */
  lapseExponent: number;
  /** Pressure altitude up to which a turbocharged piston holds rated power [m]. */
  criticalAltitudeM?: number;
}

export interface Aircraft {
  takeoffMassKg: number;
  aspectRatio: number;
  /** K1 in C_D = C_D0 + K1 C_L + K C_L^2. */
  cdLinear: number;
  /** Always has `clean`; other names as the concept defines them. */
  configurations: Record<string, ConfigurationPolar>;
  propulsion: Propulsion;
}

interface RequirementCommon {
  id: string;
  label?: string;
  enabled: boolean;
  /** Pressure (geopotential) altitude [m]. */
  altitudeM: number;
  /** Offset from the ISA temperature [K]. */
  temperatureOffsetK: number;
  /** beta = W / W_TO at the requirement. */
  massFraction: number;
  /** Throttle fraction of rated power or thrust. */
  powerSetting: number;
  propellerEfficiency: number;
  /** Name of a configuration that exists in Aircraft.configurations. */
  configuration: string;
}

export interface StallRequirement extends RequirementCommon {
  kind: 'stall';
  /** Calibrated airspeed [m/s]. */
  speedMps: number;
}

export interface LandingGroundRollRequirement extends RequirementCommon {
  kind: 'landing-ground-roll';
  distanceM: number;
  brakingFriction: number;
  touchdownSpeedFactor: number;
  freeRollTimeS: number;
}

export interface TakeoffGroundRollRequirement extends RequirementCommon {
  kind: 'takeoff-ground-roll';
  distanceM: number;
  rollingFriction: number;
  clGroundRun: number;
  liftoffSpeedFactor: number;
}

export interface CruiseRequirement extends RequirementCommon {
  kind: 'cruise';
  /** True airspeed [m/s]. */
  speedMps: number;
}

export interface ClimbRateRequirement extends RequirementCommon {
  kind: 'climb-rate';
  rateMps: number;
  /** True airspeed [m/s]; absent means the best-rate speed. */
  speedMps?: number;
  minimumSpeedFactor: number;
}

export interface ClimbGradientRequirement extends RequirementCommon {
  kind: 'climb-gradient';
  /** sin(gamma), e.g. 0.024 for 2.4 %. */
  gradient: number;
  enginesInoperative: number;
  speedFactor: number;
}

export interface CeilingRequirement extends RequirementCommon {
  kind: 'ceiling';
  rateMps: number;
  minimumSpeedFactor: number;
}

export interface SustainedTurnRequirement extends RequirementCommon {
  kind: 'sustained-turn';
  /** True airspeed [m/s]. */
  speedMps: number;
  loadFactor: number;
}

export type Requirement =
  | StallRequirement
  | LandingGroundRollRequirement
  | TakeoffGroundRollRequirement
  | CruiseRequirement
  | ClimbRateRequirement
  | ClimbGradientRequirement
  | CeilingRequirement
  | SustainedTurnRequirement;

export interface DesignPoint {
  wingLoadingPa: number;
  /** W/N for propeller kinds, dimensionless T/W for turbofan. */
  loading: number;
}

/** A whole concept, resolved to SI. */
export interface Design {
  name: string;
  aircraft: Aircraft;
  requirements: Requirement[];
  diagram: {
    /** Absent: the engine picks a range that shows every boundary. */
    wingLoadingRangePa?: [number, number];
    samples: number;
  };
  designPoint?: DesignPoint;
  /** Notes from resolving the concept (a defaulted configuration that fell back to clean, an ignored field). */
  warnings?: WarningJson[];
}

/**
 * A requirement turned into a boundary on the wing-loading plane.
 * A limit caps wing loading; a curve gives the required loading at each
 * wing loading, NaN where no power or thrust can meet it.
 */
export type Boundary =
  | {
      type: 'limit';
      id: string;
      kind: RequirementKind;
      wingLoadingMaxPa: number;
    }
  | {
      type: 'curve';
      id: string;
      kind: RequirementKind;
      /** Required loading (W/N or T/W) at wing loading w [Pa]; NaN where it cannot be met. */
      required: (wingLoadingPa: number) => number;
      /** Flight speed (TAS, m/s) the curve uses at wing loading w; NaN where undefined. */
      speedAt: (wingLoadingPa: number) => number;
    };

export function loadingAxis(kind: PropulsionKind): LoadingAxis {
  return kind === 'turbofan' ? 'thrustToWeight' : 'powerToWeight';
}
