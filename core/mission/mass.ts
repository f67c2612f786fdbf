/**
 * The evaluation's `mass` object: the closed take-off mass and its
 * breakdown, each segment as flown, the growth factor and the drivers.
 */
import type { Aircraft } from '../aircraft';
import type { MassJson } from '../evaluation';
import { G0 } from '../units/factors';
import { closeMass } from './closure';
import { growthFactor, massDrivers } from './drivers';
import type { Mission } from './mission';

export type MassResult = { ok: true; mass: MassJson } | { ok: false; field: string; message: string };

/** A finite number, else null, so NaN never reaches the JSON. */
const finiteOrNull = (x: number | null): number | null => (x !== null && Number.isFinite(x) ? x : null);

/**
 * Close the mission at a take-off wing loading [N/m^2] and describe the result in SI.
 * `drivers: false` leaves the drivers out (an empty list): a dragged design point needs the mass, not a study.
 */
export function missionMass(mission: Mission, aircraft: Aircraft, takeoffWingLoadingPa: number, options: { drivers?: boolean } = {}): MassResult {
  const closed = closeMass(mission, aircraft, takeoffWingLoadingPa);
  if (!closed.ok) return closed;
  const { takeoffKg, emptyFraction, iterations, flown } = closed;
  const growth = growthFactor(mission, aircraft, takeoffWingLoadingPa);
  return {
    ok: true,
    mass: {
      takeoff: takeoffKg,
      empty: emptyFraction * takeoffKg,
      fuel: flown.fuelFraction * takeoffKg,
      battery: flown.batteryFraction * takeoffKg,
      payload: mission.payloadKg,
      crew: mission.crewKg,
      emptyFraction,
      // A step that does not close leaves the slope undefined; 0 says "not known" without a NaN.
      growthFactor: Number.isFinite(growth) ? growth : 0,
      iterations,
      segments: flown.segments.map((s) => ({
        kind: s.kind,
        massFraction: finiteOrNull(s.massFraction),
        fuel: s.fuelShare === null ? null : finiteOrNull(s.fuelShare * takeoffKg),
        energy: s.energyPerWeight === null ? null : finiteOrNull(s.energyPerWeight * takeoffKg * G0),
        liftToDrag: finiteOrNull(s.liftToDrag),
        speed: finiteOrNull(s.speedMps),
        altitude: finiteOrNull(s.altitudeM),
      })),
      drivers: options.drivers === false ? [] : massDrivers(mission, aircraft, takeoffWingLoadingPa, takeoffKg),
    },
  };
}

/** The design with its take-off mass closed from the mission where the evaluation has one; else the design itself. */
export function atClosedMass<D extends { aircraft: Aircraft }>(design: D, evaluation: { mass?: MassJson }): D {
  return evaluation.mass ? { ...design, aircraft: { ...design.aircraft, takeoffMassKg: evaluation.mass.takeoff } } : design;
}
