/**
 * The `mission` block as written turned into the SI mission the weight
 * closure computes with (core/mission/mission.ts): defaults applied, units
 * converted, a named cruise requirement's condition copied in.
 */
import { atmosphere } from '../atmosphere';
import type { WarningJson } from '../evaluation';
import { defaultAircraftClass } from '../mission/aircraft-class';
import type { FlightCondition, Mission, MissionEnergy, MissionSegment } from '../mission/mission';
import { DEFAULT_SEGMENT_FRACTION } from '../mission/segment-fractions';
import type { Requirement } from '../model';
import { propulsionKind } from '../propulsion/kinds';
import { parseQuantity, quantity } from '../units/quantity';
import { DEFAULT_ENGINES } from './defaults';
import type { MissionJson, MissionSegmentJson } from './mission-schema';
import type { ConceptJson } from './schema';

/** The propeller efficiency of a fuel mission that gives none: the cruise requirement's default (about 0.8, common practice). */
export const DEFAULT_MISSION_PROPELLER_EFFICIENCY = 0.8;
/**
 * With no aircraft.takeoffMass, messages read the regression at three times
 * payload plus crew (payload and crew about a third of take-off mass; common practice).
 */
export const STARTING_MASS_PER_USEFUL_LOAD = 3;

type Flown = { speed?: string; altitude?: string; requirement?: string };

/** Speed and altitude as written, or those of the named cruise requirement (checks.ts made sure it exists). */
function conditionOf(segment: Flown, requirements: readonly Requirement[]): FlightCondition {
  if (segment.requirement !== undefined) {
    const r = requirements.find((q) => q.id === segment.requirement && q.kind === 'cruise') as
      | (Requirement & { speedMps: number })
      | undefined;
    if (r) return { speedMps: r.speedMps, altitudeM: r.altitudeM, temperatureOffsetK: r.temperatureOffsetK };
  }
  const altitudeM = quantity(segment.altitude ?? '0 m', 'length');
  const parsed = parseQuantity(segment.speed, 'speed', { mach: true });
  const speedMps = !parsed.ok ? NaN : parsed.mach !== undefined ? parsed.mach * atmosphere(altitudeM, 0).speedOfSoundMps : parsed.value;
  return { speedMps, altitudeM, temperatureOffsetK: 0 };
}

function resolveSegment(s: MissionSegmentJson, requirements: readonly Requirement[]): MissionSegment {
  switch (s.kind) {
    case 'takeoff-climb':
    case 'climb':
    case 'descent-landing':
      return { kind: s.kind, fraction: s.fraction ?? DEFAULT_SEGMENT_FRACTION[s.kind] };
    case 'cruise':
      return { kind: 'cruise', rangeM: quantity(s.range, 'length'), ...conditionOf(s, requirements) };
    case 'loiter':
      return { kind: 'loiter', enduranceS: quantity(s.endurance, 'time'), ...conditionOf(s, requirements) };
    case 'reserve':
      if (s.fraction !== undefined) return { kind: 'reserve', by: 'fraction', fraction: s.fraction };
      if (s.range !== undefined) return { kind: 'reserve', by: 'range', rangeM: quantity(s.range, 'length'), ...conditionOf(s, requirements) };
      return { kind: 'reserve', by: 'endurance', enduranceS: quantity(s.endurance ?? '0 s', 'time'), ...conditionOf(s, requirements) };
  }
}

function resolveEnergy(energy: MissionJson['energy'], propeller: boolean): MissionEnergy {
  if (energy.kind === 'battery') {
    return {
      kind: 'battery',
      specificEnergyJPerKg: quantity(energy.specificEnergy, 'specificEnergy'),
      usableFraction: energy.usableFraction,
      driveEfficiency: energy.driveEfficiency,
    };
  }
  if (propeller) {
    return {
      kind: 'fuel',
      engine: 'propeller',
      bsfcKgPerJ: quantity(energy.bsfc ?? '', 'brakeSpecificFuelConsumption'),
      propellerEfficiency: energy.propellerEfficiency ?? DEFAULT_MISSION_PROPELLER_EFFICIENCY,
    };
  }
  return { kind: 'fuel', engine: 'jet', tsfcPerS: quantity(energy.tsfc ?? '', 'thrustSpecificFuelConsumption') };
}

/** The resolved mission; the concept passed the schema and checkConcept. */
export function resolveMission(concept: ConceptJson, requirements: readonly Requirement[], warnings: WarningJson[]): Mission | undefined {
  const m = concept.mission;
  if (!m) return undefined;
  const { kind, engines } = concept.aircraft.propulsion;
  const propeller = propulsionKind(kind).propeller;
  const payloadKg = quantity(m.payload, 'mass');
  const crewKg = m.crew === undefined ? 0 : quantity(m.crew, 'mass');
  const given = concept.aircraft.takeoffMass;
  if (m.energy.kind === 'battery') {
    m.segments.forEach((s, i) => {
      if ('fraction' in s && s.fraction !== undefined && s.kind !== 'reserve') {
        warnings.push({
          code: 'field-ignored',
          field: `mission.segments[${i}].fraction`,
          message: 'ignored: a battery aircraft burns no fuel; its climb takes the energy to gain height, its descent none',
        });
      }
    });
  }
  if (m.energy.kind === 'fuel' && m.energy.propellerEfficiency !== undefined && !propeller) {
    warnings.push({ code: 'field-ignored', field: 'mission.energy.propellerEfficiency', message: `ignored: a ${kind} has no propeller` });
  }
  if (m.emptyMassFraction !== undefined && m.technologyFactor !== undefined) {
    warnings.push({
      code: 'field-ignored',
      field: 'mission.technologyFactor',
      message: 'ignored: the technology factor scales the regression, and mission.emptyMassFraction replaces it',
    });
  }
  return {
    payloadKg,
    crewKg,
    segments: m.segments.map((s) => resolveSegment(s, requirements)),
    energy: resolveEnergy(m.energy, propeller),
    ...(m.emptyMassFraction !== undefined ? { emptyMassFraction: m.emptyMassFraction } : {}),
    aircraftClass: m.aircraftClass ?? defaultAircraftClass(kind, engines ?? DEFAULT_ENGINES),
    technologyFactor: m.technologyFactor ?? 1,
    liftToDragScale: 1,
    startingMassKg: given !== undefined ? quantity(given, 'mass') : STARTING_MASS_PER_USEFUL_LOAD * (payloadKg + crewKg),
    takeoffMassGiven: given !== undefined,
  };
}
