/**
 * One requirement as written, with its defaults applied and its units
 * turned to SI (DESIGN.md field list; METHODS.md section 12).
 */
import type { WarningJson } from '../evaluation';
import type { Requirement } from '../model';
import { quantity, type Dimension } from '../units/quantity';
import { DEFAULT_CONFIGURATION, DEFAULT_PROPELLER_EFFICIENCY, REQUIREMENT_DEFAULTS as D } from './defaults';
import type { RequirementJson } from './schema';

/** Validated already, so a failure here is a bug and throws. */
function si(value: string | number | undefined, dimension: Dimension, fallback: number): number {
  if (value === undefined) return fallback;
  return typeof value === 'number' ? value : quantity(value, dimension);
}

/** The configuration a requirement flies in; a defaulted one the concept lacks falls back to clean. */
function configurationOf(r: RequirementJson, index: number, defined: readonly string[], warnings: WarningJson[]): string {
  if (r.configuration !== undefined) return r.configuration;
  const wanted = DEFAULT_CONFIGURATION[r.kind];
  if (defined.includes(wanted)) return wanted;
  warnings.push({
    code: 'configuration-fallback',
    field: `requirements[${index}].configuration`,
    message:
      `requirement "${r.id}" (${r.kind}) flies in the ${wanted} configuration by default, but the concept defines none; ` +
      `using clean. Define aircraft.aero.configurations.${wanted}, or set configuration: "clean" to say so.`,
  });
  return 'clean';
}

export function resolveRequirement(
  r: RequirementJson,
  index: number,
  configurations: readonly string[],
  warnings: WarningJson[],
): Requirement {
  const common = {
    id: r.id,
    ...(r.label !== undefined ? { label: r.label } : {}),
    enabled: r.enabled ?? D.enabled,
    altitudeM: si(r.altitude, 'length', D.altitudeM),
    temperatureOffsetK: si(r.temperatureOffset, 'temperatureDifference', D.temperatureOffsetK),
    massFraction: r.massFraction ?? D.massFraction,
    powerSetting: r.powerSetting ?? D.powerSetting,
    propellerEfficiency: r.propellerEfficiency ?? DEFAULT_PROPELLER_EFFICIENCY[r.kind],
    configuration: configurationOf(r, index, configurations, warnings),
  };
  switch (r.kind) {
    case 'stall':
      return { ...common, kind: r.kind, speedMps: si(r.speed, 'speed', NaN) };
    case 'cruise':
      return { ...common, kind: r.kind, speedMps: si(r.speed, 'speed', NaN) };
    case 'landing-ground-roll':
      return {
        ...common,
        kind: r.kind,
        distanceM: si(r.distance, 'length', NaN),
        brakingFriction: r.brakingFriction ?? D.brakingFriction,
        touchdownSpeedFactor: r.touchdownSpeedFactor ?? D.touchdownSpeedFactor,
        freeRollTimeS: si(r.freeRollTime, 'time', D.freeRollTimeS),
      };
    case 'takeoff-ground-roll':
      return {
        ...common,
        kind: r.kind,
        distanceM: si(r.distance, 'length', NaN),
        rollingFriction: r.rollingFriction ?? D.rollingFriction,
        clGroundRun: r.clGroundRun ?? D.clGroundRun,
        liftoffSpeedFactor: r.liftoffSpeedFactor ?? D.liftoffSpeedFactor,
      };
    case 'climb-rate':
      return {
        ...common,
        kind: r.kind,
        rateMps: si(r.rate, 'speed', NaN),
        ...(r.speed !== undefined ? { speedMps: si(r.speed, 'speed', NaN) } : {}),
        minimumSpeedFactor: r.minimumSpeedFactor ?? D.minimumSpeedFactor,
      };
    case 'climb-gradient':
      return {
        ...common,
        kind: r.kind,
        gradient: si(r.gradient, 'fraction', NaN),
        enginesInoperative: r.enginesInoperative ?? D.enginesInoperative,
        speedFactor: r.speedFactor ?? D.speedFactor,
      };
    case 'ceiling':
      return {
        ...common,
        kind: r.kind,
        rateMps: si(r.rate, 'speed', D.ceilingRateMps),
        minimumSpeedFactor: r.minimumSpeedFactor ?? D.minimumSpeedFactor,
      };
    case 'sustained-turn':
      return {
        ...common,
        kind: r.kind,
        speedMps: si(r.speed, 'speed', NaN),
        // n = 1/cos(phi) in a level coordinated turn (Anderson, Introduction to Flight, ch. 6, turning flight).
        loadFactor: r.loadFactor ?? 1 / Math.cos(si(r.bankAngle, 'angle', NaN)),
      };
  }
}
