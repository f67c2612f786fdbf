/**
 * The resolved mission: what the weight closure computes with. SI throughout
 * (kg, m, s, m/s, J/kg; BSFC in kg/J, TSFC in 1/s as weight flow per thrust).
 */
import type { AircraftClass } from './aircraft-class';

/** Where a cruise, loiter or reserve is flown. */
export interface FlightCondition {
  speedMps: number;
  altitudeM: number;
  temperatureOffsetK: number;
}

/** A segment given by a published mass fraction (end over start). */
export interface FractionSegment {
  kind: 'takeoff-climb' | 'climb' | 'descent-landing';
  fraction: number;
}

export interface CruiseSegment extends FlightCondition {
  kind: 'cruise';
  rangeM: number;
}

export interface LoiterSegment extends FlightCondition {
  kind: 'loiter';
  enduranceS: number;
}

/** A reserve flown for a time or a distance, or kept as a share of the mission's fuel or energy. */
export type ReserveSegment =
  | ({ kind: 'reserve'; by: 'endurance'; enduranceS: number } & FlightCondition)
  | ({ kind: 'reserve'; by: 'range'; rangeM: number } & FlightCondition)
  | { kind: 'reserve'; by: 'fraction'; fraction: number };

export type MissionSegment = FractionSegment | CruiseSegment | LoiterSegment | ReserveSegment;

export type MissionEnergy =
  | { kind: 'fuel'; engine: 'propeller'; bsfcKgPerJ: number; propellerEfficiency: number }
  | { kind: 'fuel'; engine: 'jet'; tsfcPerS: number }
  | { kind: 'battery'; specificEnergyJPerKg: number; usableFraction: number; driveEfficiency: number };

export interface Mission {
  payloadKg: number;
  crewKg: number;
  segments: MissionSegment[];
  energy: MissionEnergy;
  /** Given: overrides the regression. */
  emptyMassFraction?: number;
  aircraftClass: AircraftClass;
  technologyFactor: number;
  /** Multiplies every lift-to-drag ratio the polar gives (1; the studies vary it). */
  liftToDragScale: number;
  /** Where messages that need a mass read the regression [kg]: aircraft.takeoffMass, else a guess. */
  startingMassKg: number;
  /** Whether the concept gave aircraft.takeoffMass (else sizing waits for a mass that closes). */
  takeoffMassGiven: boolean;
}
