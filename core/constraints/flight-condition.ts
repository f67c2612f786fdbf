/**
 * Everything a boundary needs about the flight condition of one requirement:
 * air density, weight fraction, available power or thrust fraction, polar.
 */
import { atmosphere } from '../atmosphere';
import { polarOf, type Polar } from '../aero/drag-polar';
import { waveDragIncrement } from '../aero/compressibility';
import type { Aircraft } from '../aircraft';
import type { RequirementCommon } from '../requirements/common';
import { availableFraction, lapseAt } from '../propulsion/available-fraction';
import { isPropellerDriven } from '../propulsion/propeller';

export interface FlightCondition {
  densityKgM3: number;
  /** beta = W/W_TO. */
  beta: number;
  /** alpha = lapse x power setting, static (Mach 0). */
  alpha: number;
  /** alpha at a flight speed (TAS, m/s): a Mach-aware turbine lapse reads the Mach number. */
  alphaAt: (speedMps: number) => number;
  polar: Polar;
  /** Wave-drag increment at a lift coefficient and flight speed (TAS); 0 where compressibility is not modelled. */
  waveDragAt: (liftCoefficient: number, speedMps: number) => number;
  /** Propeller kinds convert T/W to shaft P/W. */
  propeller: boolean;
  propellerEfficiency: number;
}

/**
 * The condition of a requirement. A configuration the aircraft does not
 * define falls back to clean (the evaluation warns about it).
 */
export function flightCondition(requirement: RequirementCommon, aircraft: Aircraft): FlightCondition {
  const air = atmosphere(requirement.altitudeM, requirement.temperatureOffsetK);
  const wing = aircraft.compressibility;
  const polar = polarOf(aircraft, requirement.configuration) ?? (polarOf(aircraft, 'clean') as Polar);
  const { propulsion } = aircraft;
  const { powerSetting } = requirement;
  const alpha = availableFraction(propulsion, requirement.altitudeM, requirement.temperatureOffsetK, powerSetting);
  // The air is the requirement's own at every speed: only the Mach number changes, and only a Mach-aware lapse reads it.
  const machAware = (propulsion.lapseModel ?? 'density') !== 'density';
  return {
    densityKgM3: air.densityKgM3,
    beta: requirement.massFraction,
    alpha,
    alphaAt: machAware
      ? (speedMps: number): number =>
          lapseAt(propulsion, air.sigma, { temperatureK: air.temperatureK, pressurePa: air.pressurePa, mach: speedMps / air.speedOfSoundMps }) * powerSetting
      : (): number => alpha,
    polar,
    waveDragAt: (cl: number, speedMps: number): number =>
      wing ? waveDragIncrement(wing, cl, speedMps / air.speedOfSoundMps) : 0,
    propeller: isPropellerDriven(aircraft.propulsion.kind),
    propellerEfficiency: requirement.propellerEfficiency,
  };
}
