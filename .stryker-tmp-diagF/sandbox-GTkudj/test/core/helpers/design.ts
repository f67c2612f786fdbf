/**
 * Builders of resolved SI Designs for engine tests, with the defaults of
 * DESIGN.md applied the way the concept resolver applies them.
 */
// @ts-nocheck

import type { Aircraft, ConfigurationPolar, Design, DesignPoint, Propulsion, PropulsionKind, Requirement } from '../../../core/model';
import type { CeilingRequirement } from '../../../core/constraints/ceiling';
import type { ClimbGradientRequirement } from '../../../core/constraints/climb-gradient';
import type { ClimbRateRequirement } from '../../../core/constraints/climb-rate';
import type { CruiseRequirement } from '../../../core/constraints/cruise';
import type { LandingGroundRollRequirement } from '../../../core/constraints/landing-ground-roll';
import type { StallRequirement } from '../../../core/constraints/stall';
import type { SustainedTurnRequirement } from '../../../core/constraints/sustained-turn';
import type { MaximumSpeedRequirement } from '../../../core/requirements/maximum-speed';
import type { TakeoffGroundRollRequirement } from '../../../core/constraints/takeoff-ground-roll';
import type { TakeoffDistanceRequirement } from '../../../core/requirements/takeoff-distance';
import type { BalancedFieldLengthRequirement } from '../../../core/requirements/balanced-field-length';
import type { LandingDistanceRequirement } from '../../../core/requirements/landing-distance';
import type { ApproachSpeedRequirement } from '../../../core/requirements/approach-speed';
import { FOOT_PER_MINUTE_MPS } from '../../../core/units/factors';

type Extra<R extends Requirement> = Partial<Omit<R, 'kind'>>;

function common(kind: Requirement['kind'], id: string) {
  const propellerEfficiency = kind === 'takeoff-ground-roll' || kind === 'takeoff-distance' || kind === 'balanced-field-length' ? 0.55 : kind === 'cruise' || kind === 'sustained-turn' || kind === 'maximum-speed' ? 0.8 : 0.75;
  const configuration =
    kind === 'stall' || kind === 'landing-ground-roll' || kind === 'landing-distance' || kind === 'approach-speed' ? 'landing' : kind === 'takeoff-ground-roll' || kind === 'takeoff-distance' || kind === 'balanced-field-length' || kind === 'climb-gradient' ? 'takeoff' : 'clean';
  return { id, enabled: true, altitudeM: 0, temperatureOffsetK: 0, massFraction: 1, powerSetting: 1, propellerEfficiency, configuration };
}

export function stall(speedMps: number, extra: Extra<StallRequirement> = {}): StallRequirement {
  return { ...common('stall', 'stall'), kind: 'stall', speedMps, ...extra };
}

export function landingRoll(distanceM: number, extra: Extra<LandingGroundRollRequirement> = {}): LandingGroundRollRequirement {
  return {
    ...common('landing-ground-roll', 'landing'),
    kind: 'landing-ground-roll',
    distanceM,
    brakingFriction: 0.3,
    touchdownSpeedFactor: 1.15,
    freeRollTimeS: 0,
    clGround: null,
    liftDumping: false,
    ...extra,
  };
}

export function takeoffRoll(distanceM: number, extra: Extra<TakeoffGroundRollRequirement> = {}): TakeoffGroundRollRequirement {
  return {
    ...common('takeoff-ground-roll', 'takeoff'),
    kind: 'takeoff-ground-roll',
    distanceM,
    rollingFriction: 0.04,
    clGroundRun: 0.5,
    liftoffSpeedFactor: 1.1,
    ...extra,
  };
}

export function takeoffDistance(distanceM: number, extra: Extra<TakeoffDistanceRequirement> = {}): TakeoffDistanceRequirement {
  return {
    ...common('takeoff-distance', 'takeoff-distance'),
    kind: 'takeoff-distance',
    distanceM,
    obstacleHeightM: 50 * 0.3048,
    rollingFriction: 0.04,
    clGroundRun: 0.5,
    liftoffSpeedFactor: 1.1,
    rotationTimeS: 3,
    climbPropellerEfficiency: 0.75,
    ...extra,
  };
}

export function balancedField(distanceM: number, extra: Extra<BalancedFieldLengthRequirement> = {}): BalancedFieldLengthRequirement {
  return {
    ...common('balanced-field-length', 'bfl'),
    kind: 'balanced-field-length',
    distanceM,
    obstacleHeightM: 35 * 0.3048,
    v2SpeedFactor: 1.2,
    averageThrustFraction: 0.75 * (10 / 9),
    ...extra,
  };
}

export function landingDistance(distanceM: number, extra: Extra<LandingDistanceRequirement> = {}): LandingDistanceRequirement {
  return {
    ...common('landing-distance', 'landing-distance'),
    kind: 'landing-distance',
    distanceM,
    obstacleHeightM: 50 * 0.3048,
    fieldLengthFactor: 1,
    approachSpeedFactor: 1.3,
    touchdownSpeedFactor: 1.15,
    approachAngleRad: (3 * Math.PI) / 180,
    brakingFriction: 0.3,
    freeRollTimeS: 2,
    clGround: 0.5,
    liftDumping: false,
    ...extra,
  };
}

export function approachSpeed(speedMps: number, extra: Extra<ApproachSpeedRequirement> = {}): ApproachSpeedRequirement {
  return { ...common('approach-speed', 'approach'), kind: 'approach-speed', speedMps, speedFactor: 1.3, ...extra };
}

export function cruise(speedMps: number, extra: Extra<CruiseRequirement> = {}): CruiseRequirement {
  return { ...common('cruise', 'cruise'), kind: 'cruise', speedMps, ...extra };
}

export function climbRate(rateMps: number, extra: Extra<ClimbRateRequirement> = {}): ClimbRateRequirement {
  return { ...common('climb-rate', 'climb'), kind: 'climb-rate', rateMps, minimumSpeedFactor: 1.2, ...extra };
}

export function climbGradient(gradient: number, extra: Extra<ClimbGradientRequirement> = {}): ClimbGradientRequirement {
  return { ...common('climb-gradient', 'gradient'), kind: 'climb-gradient', gradient, enginesInoperative: 0, speedFactor: 1.2, ...extra };
}

export function ceiling(altitudeM: number, extra: Extra<CeilingRequirement> = {}): CeilingRequirement {
  return { ...common('ceiling', 'ceiling'), kind: 'ceiling', altitudeM, rateMps: 100 * FOOT_PER_MINUTE_MPS, minimumSpeedFactor: 1.2, ...extra };
}

export function maximumSpeed(speedMps: number, extra: Extra<MaximumSpeedRequirement> = {}): MaximumSpeedRequirement {
  return { ...common('maximum-speed', 'top-speed'), kind: 'maximum-speed', speedMps, equivalent: false, ...extra };
}

export function sustainedTurn(speedMps: number, loadFactor: number, extra: Extra<SustainedTurnRequirement> = {}): SustainedTurnRequirement {
  return { ...common('sustained-turn', 'turn'), kind: 'sustained-turn', speedMps, loadFactor, ...extra };
}

export interface AircraftOptions {
  takeoffMassKg?: number;
  aspectRatio?: number;
  cdLinear?: number;
  clean?: ConfigurationPolar;
  /** Other configurations as increments over clean: cd0Increment, and optional e and clMax. */
  increments?: Record<string, { cd0Increment?: number; oswaldEfficiency?: number; clMax?: number }>;
  kind?: PropulsionKind;
  engines?: number;
  lapseExponent?: number;
  criticalAltitudeM?: number;
}

/** An aircraft with configurations resolved to absolute values, as the concept resolver does. */
export function aircraft(o: AircraftOptions = {}): Aircraft {
  const clean = o.clean ?? { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 };
  const configurations: Record<string, ConfigurationPolar> = { clean };
  const increments = o.increments ?? {
    takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.76, clMax: 1.8 },
    landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 2.1 },
  };
  for (const [name, inc] of Object.entries(increments)) {
    configurations[name] = {
      cd0: clean.cd0 + (inc.cd0Increment ?? 0),
      oswaldEfficiency: inc.oswaldEfficiency ?? clean.oswaldEfficiency,
      clMax: inc.clMax ?? clean.clMax,
    };
  }
  const kind = o.kind ?? 'piston';
  const propulsion: Propulsion = {
    kind,
    engines: o.engines ?? 1,
    lapseExponent: o.lapseExponent ?? (kind === 'turboprop' ? 0.75 : 1),
    ...(o.criticalAltitudeM === undefined ? {} : { criticalAltitudeM: o.criticalAltitudeM }),
  };
  return {
    takeoffMassKg: o.takeoffMassKg ?? 750,
    aspectRatio: o.aspectRatio ?? 7.5,
    cdLinear: o.cdLinear ?? 0,
    configurations,
    propulsion,
  };
}

export interface DesignOptions {
  name?: string;
  aircraft?: Aircraft;
  requirements: Requirement[];
  rangePa?: [number, number];
  samples?: number;
  designPoint?: DesignPoint;
}

export function design(o: DesignOptions): Design {
  return {
    name: o.name ?? 'Test design',
    aircraft: o.aircraft ?? aircraft(),
    requirements: o.requirements,
    diagram: { ...(o.rangePa ? { wingLoadingRangePa: o.rangePa } : {}), samples: o.samples ?? 201 },
    ...(o.designPoint ? { designPoint: o.designPoint } : {}),
  };
}
