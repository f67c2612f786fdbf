/**
 * Closing the take-off mass: m_0 = (m_payload + m_crew) + m_empty(m_0) +
 * m_fuel or m_battery, i.e. 1 = (m_payload + m_crew)/m_0 + W_e/W_0 + W_f/W_0
 * (Raymer, Aircraft Design: A Conceptual Approach, section 3.2; from
 * memory), solved for m_0 with the project's bracketing root finder.
 */
import type { Aircraft } from '../aircraft';
import { smoothFallingRoot } from '../numeric/false-position';
import { formatQuantity } from '../units/display';
import { AIRCRAFT_CLASS_TITLES } from './aircraft-class';
import { regressionEmptyFraction } from './empty-mass-fraction';
import { flyMission, type FlownMission } from './fly-mission';
import type { Mission } from './mission';

/** The bracket's top: above the heaviest aircraft ever built, about 640 t (common practice). */
export const HEAVIEST_TAKEOFF_MASS_KG = 1e6;

export type ClosureResult =
  | { ok: true; takeoffKg: number; emptyFraction: number; iterations: number; flown: FlownMission }
  | { ok: false; field: string; message: string };

/** W_e/W_0 at a take-off mass: the mission's own, else the class regression with its technology factor. */
export function emptyFractionAt(mission: Mission, takeoffMassKg: number): number {
  return mission.emptyMassFraction ?? regressionEmptyFraction(takeoffMassKg, mission.aircraftClass, mission.technologyFactor);
}

const two = (x: number): string => x.toFixed(2);

function noClosure(mission: Mission, flown: FlownMission): { ok: false; field: string; message: string } {
  const battery = mission.energy.kind === 'battery';
  const energyName = battery ? 'battery fraction' : 'fuel fraction';
  const energy = battery ? flown.batteryFraction : flown.fuelFraction;
  const advice = battery
    ? 'shorten the mission, carry less, or improve the lift-to-drag ratio, the pack or the empty fraction'
    : 'shorten the mission, carry less, or improve the lift-to-drag ratio, the fuel consumption or the empty fraction';
  if (!(energy < 1)) {
    return { ok: false, field: 'mission.segments', message: `the ${energyName} ${two(energy)} alone is the whole take-off mass or more; ${advice}` };
  }
  const given = mission.emptyMassFraction !== undefined;
  const at = mission.startingMassKg;
  const empty = emptyFractionAt(mission, at);
  if (empty + energy < 1) {
    // The fractions alone leave room: payload and crew are too large a share of even the heaviest mass.
    const top = HEAVIEST_TAKEOFF_MASS_KG;
    const carried = mission.payloadKg + mission.crewKg;
    const emptyTop = emptyFractionAt(mission, top);
    const there = given ? '' : ` (${AIRCRAFT_CLASS_TITLES[mission.aircraftClass]} regression there)`;
    return {
      ok: false,
      field: 'mission.payload',
      message:
        `payload and crew of ${formatQuantity(carried, 'mass', 'si')} are ${two(carried / top)} of even ${formatQuantity(top, 'mass', 'si')}; ` +
        `with the empty-mass fraction ${two(emptyTop)}${there} and the ${energyName} ${two(energy)} they add to ${two(carried / top + emptyTop + energy)}, ` +
        `so no take-off mass up to ${formatQuantity(top, 'mass', 'si')} closes; carry less`,
    };
  }
  const whence = given ? '' : ` (${AIRCRAFT_CLASS_TITLES[mission.aircraftClass]} regression at ${formatQuantity(at, 'mass', 'si')})`;
  return {
    ok: false,
    field: given ? 'mission.emptyMassFraction' : 'mission',
    message: `empty-mass fraction ${two(empty)}${whence} plus ${energyName} ${two(energy)} add to ${two(empty + energy)} and leave nothing for payload and crew; ${advice}`,
  };
}

/**
 * m_0 where (m_payload + m_crew)/m_0 + W_e/W_0(m_0) + energy fraction = 1, by
 * bracketing from m_0 = payload + crew (false position: the balance is smooth
 * in m_0); NaN where none closes below the bracket's top. `iterations` counts
 * the evaluations of the balance.
 */
export function solveTakeoffMass(
  carriedKg: number,
  emptyFraction: (takeoffMassKg: number) => number,
  energyFraction: number,
): { takeoffKg: number; iterations: number } {
  let iterations = 0;
  // Falls with m_0: payload and crew become a smaller share, and the regression's fraction falls (C < 0).
  const leftOver = (m: number): number => {
    iterations++;
    return carriedKg / m + emptyFraction(m) + energyFraction - 1;
  };
  // The first upper end is held to the top too, so no mass above it is ever returned.
  const takeoffKg = smoothFallingRoot(leftOver, carriedKg, Math.min(2 * carriedKg, HEAVIEST_TAKEOFF_MASS_KG), HEAVIEST_TAKEOFF_MASS_KG);
  return { takeoffKg, iterations };
}

/** Solve for the take-off mass at a take-off wing loading [N/m^2]. */
export function closeMass(mission: Mission, aircraft: Aircraft, takeoffWingLoadingPa: number): ClosureResult {
  const flight = flyMission(mission, aircraft, takeoffWingLoadingPa);
  if (!flight.ok) return flight;
  const { flown } = flight;
  const { takeoffKg, iterations } = solveTakeoffMass(
    mission.payloadKg + mission.crewKg,
    (m) => emptyFractionAt(mission, m),
    flown.fuelFraction + flown.batteryFraction,
  );
  if (!Number.isFinite(takeoffKg)) return noClosure(mission, flown);
  return { ok: true, takeoffKg, emptyFraction: emptyFractionAt(mission, takeoffKg), iterations, flown };
}
