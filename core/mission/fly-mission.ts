/**
 * The mission flown once per unit of take-off mass: each segment's mass
 * fraction, fuel share or battery energy, and the lift-to-drag ratio it
 * flies at. With the wing loading fixed by the diagram, none of it depends
 * on the take-off mass itself, so the closure (closure.ts) only has to meet
 * the empty-mass regression.
 */
import type { Aircraft } from '../aircraft';
import { G0 } from '../units/factors';
import { FOOT_M, KNOT_MPS } from '../units/factors';
import { batteryMassFraction, climbEnergyPerWeight, levelFlightEnergyPerWeight } from './battery-energy';
import { jetCruiseFraction, jetLoiterFraction, propellerCruiseFraction, propellerLoiterFraction } from './breguet';
import { segmentLiftToDrag } from './lift-to-drag';
import type { FlightCondition, Mission, MissionEnergy, MissionSegment } from './mission';

/** One segment per unit take-off mass. */
export interface FlownSegment {
  kind: MissionSegment['kind'];
  /** End over start mass; 1 for a battery aircraft; null for a reserve kept as a fraction. */
  massFraction: number | null;
  /** Fuel burnt or kept over take-off mass; null for a battery aircraft. */
  fuelShare: number | null;
  /** Battery energy over take-off weight [J/N]; null for a fuel aircraft. */
  energyPerWeight: number | null;
  liftToDrag: number | null;
  speedMps: number | null;
  altitudeM: number | null;
}

export interface FlownMission {
  segments: FlownSegment[];
  /** Fuel over take-off mass, reserves included. */
  fuelFraction: number;
  /** Battery over take-off mass. */
  batteryFraction: number;
}

export type FlightResult = { ok: true; flown: FlownMission } | { ok: false; field: string; message: string };

type Flown = Extract<MissionSegment, FlightCondition>;

/** Messages say speeds and heights the way a mission is usually written. */
const knots = (v: number): string => `${Math.round(v / KNOT_MPS).toLocaleString('en-US')} kt`;
const feet = (h: number): string => `${Math.round(h / FOOT_M).toLocaleString('en-US')} ft`;

const flies = (s: MissionSegment): s is Flown => 'speedMps' in s;

/** Distance of a level segment: its range, or speed times endurance. */
function distanceOf(s: Flown): number {
  return 'rangeM' in s ? s.rangeM : s.speedMps * s.enduranceS;
}

/** End over start mass of a level segment burning fuel, at lift-to-drag ratio ld. */
function fuelFraction(s: Flown, energy: Extract<MissionEnergy, { kind: 'fuel' }>, ld: number): number {
  const byRange = 'rangeM' in s;
  if (energy.engine === 'jet') {
    return byRange ? jetCruiseFraction(s.rangeM, s.speedMps, energy.tsfcPerS, ld) : jetLoiterFraction(s.enduranceS, energy.tsfcPerS, ld);
  }
  return byRange
    ? propellerCruiseFraction(s.rangeM, energy.bsfcKgPerJ, energy.propellerEfficiency, ld)
    : propellerLoiterFraction(s.enduranceS, s.speedMps, energy.bsfcKgPerJ, energy.propellerEfficiency, ld);
}

/** The altitude the next flown segment is at (a climb's target), or the ground. */
function nextAltitude(segments: readonly MissionSegment[], from: number): number {
  for (let j = from + 1; j < segments.length; j++) {
    const s = segments[j];
    if (flies(s)) return s.altitudeM;
  }
  return 0;
}

/** Fly the mission at a take-off wing loading [N/m^2] on this aircraft's polar. */
export function flyMission(mission: Mission, aircraft: Aircraft, takeoffWingLoadingPa: number): FlightResult {
  const { energy } = mission;
  const battery = energy.kind === 'battery';
  const segments: FlownSegment[] = [];
  let massRatio = 1;
  let heightM = 0;
  let energyPerWeight = 0;
  /** Reserves kept as a fraction: where they stand and their share. */
  const reserves: Array<{ at: number; share: number }> = [];
  for (let i = 0; i < mission.segments.length; i++) {
    const s = mission.segments[i];
    const none = { liftToDrag: null, speedMps: null, altitudeM: null };
    if (s.kind === 'reserve' && s.by === 'fraction') {
      reserves.push({ at: i, share: s.fraction });
      segments.push({ kind: s.kind, massFraction: null, fuelShare: null, energyPerWeight: null, ...none });
      continue;
    }
    if (!flies(s)) {
      if (battery) {
        // A climb takes the height to the next flown segment; descent and landing glide down for nothing.
        const target = s.kind === 'descent-landing' ? 0 : nextAltitude(mission.segments, i);
        const e = s.kind === 'descent-landing' ? 0 : climbEnergyPerWeight(target - heightM, energy.driveEfficiency);
        heightM = target;
        energyPerWeight += e;
        segments.push({ kind: s.kind, massFraction: 1, fuelShare: null, energyPerWeight: e, ...none });
      } else {
        segments.push({ kind: s.kind, massFraction: s.fraction, fuelShare: massRatio * (1 - s.fraction), energyPerWeight: null, ...none });
        massRatio *= s.fraction;
      }
      continue;
    }
    heightM = s.altitudeM;
    const where = `mission.segments[${i}]`;
    const start = segmentLiftToDrag(aircraft, takeoffWingLoadingPa, massRatio, s);
    if (!(start.liftCoefficient <= start.clMax)) {
      return {
        ok: false,
        field: where,
        message:
          `the ${s.kind} at ${knots(s.speedMps)} and ${feet(s.altitudeM)} ` +
          `needs a lift coefficient of ${start.liftCoefficient.toFixed(2)} on the sized wing, above the clean C_Lmax of ${start.clMax.toFixed(2)}; fly it faster or lower`,
      };
    }
    if (!(start.liftToDrag > 0) || !Number.isFinite(start.liftToDrag)) {
      return { ok: false, field: where, message: `the ${s.kind} at ${knots(s.speedMps)} gives no positive lift-to-drag ratio on the concept's polar` };
    }
    if (energy.kind === 'battery') {
      const ld = start.liftToDrag * mission.liftToDragScale;
      const e = levelFlightEnergyPerWeight(distanceOf(s), ld, energy.driveEfficiency);
      energyPerWeight += e;
      segments.push({ kind: s.kind, massFraction: 1, fuelShare: null, energyPerWeight: e, liftToDrag: ld, speedMps: s.speedMps, altitudeM: s.altitudeM });
      continue;
    }
    // L/D at the segment's mean mass, the end mass estimated from a first pass at the start mass.
    const first = fuelFraction(s, energy, start.liftToDrag * mission.liftToDragScale);
    const ld = segmentLiftToDrag(aircraft, takeoffWingLoadingPa, (massRatio * (1 + first)) / 2, s).liftToDrag * mission.liftToDragScale;
    const fraction = fuelFraction(s, energy, ld);
    segments.push({ kind: s.kind, massFraction: fraction, fuelShare: massRatio * (1 - fraction), energyPerWeight: null, liftToDrag: ld, speedMps: s.speedMps, altitudeM: s.altitudeM });
    massRatio *= fraction;
  }
  // A reserve kept as a fraction is that share of what the flown segments use (Raymer's 6 % reserve and trapped fuel is one such).
  const reserve = reserves.reduce((sum, r) => sum + r.share, 0);
  const flownFuel = 1 - massRatio;
  for (const { at, share } of reserves) {
    if (battery) segments[at].energyPerWeight = share * energyPerWeight;
    else segments[at].fuelShare = share * flownFuel;
  }
  if (energy.kind === 'battery') {
    const total = energyPerWeight * (1 + reserve);
    return {
      ok: true,
      flown: { segments, fuelFraction: 0, batteryFraction: batteryMassFraction(total, G0, energy.specificEnergyJPerKg, energy.usableFraction) },
    };
  }
  return { ok: true, flown: { segments, fuelFraction: flownFuel * (1 + reserve), batteryFraction: 0 } };
}
