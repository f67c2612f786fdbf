/**
 * The one place that chooses core's public names. Everything here is pure:
 * no fs, DOM, Electron or native modules, so it runs in the CLI, the store and
 * the page alike.
 */
export * from './model';
export * from './evaluation';
export { PRELIMINARY_CAUTION } from './caution';

export { G0 } from './units/factors';
export * as factors from './units/factors';
export { parseQuantity, quantity, UNITS, SI_UNIT, EXAMPLE, type Dimension, type ParsedQuantity } from './units/quantity';
export {
  displayUnit,
  toDisplay,
  fromDisplay,
  formatQuantity,
  fixedDecimals,
  formatMargin,
  UNIT_SYSTEMS,
  UNIT_SYSTEM_TITLES,
  type UnitSystem,
  type DisplayQuantity,
} from './units/display';

export {
  atmosphere,
  isaDensity,
  isaPressure,
  isaTemperature,
  densityAltitude,
  geopotentialAltitude,
  geometricAltitude,
  equivalentAirspeed,
  trueAirspeed,
  calibratedAirspeed,
  trueFromCalibrated,
  RHO0,
  P0,
  T0,
  A0,
  R_AIR,
  type AtmosphereState,
} from './atmosphere';

export * from './concept';
export * from './diagram';
export * from './studies';

export { AIRCRAFT_CLASSES, AIRCRAFT_CLASS_TITLES, defaultAircraftClass, type AircraftClass } from './mission/aircraft-class';
export { MISSION_SEGMENT_KINDS, type MissionJson, type MissionSegmentJson, type MissionSegmentKind } from './concept/mission-schema';
export type { Mission, MissionSegment, MissionEnergy } from './mission/mission';
export { atClosedMass, missionMass, type MassResult } from './mission/mass';
