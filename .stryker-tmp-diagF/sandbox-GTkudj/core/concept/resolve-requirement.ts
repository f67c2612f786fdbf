/**
 * One requirement as written, with its defaults applied and its units
 * turned to SI (DESIGN.md field list); the kind's own fields resolve in its
 * descriptor (core/requirements).
 */
// @ts-nocheck

import type { WarningJson } from '../evaluation';
import type { Requirement } from '../model';
import { atmosphere } from '../atmosphere';
import { parseQuantity, quantity, type Dimension } from '../units/quantity';
import { requirementKind } from '../requirements';
import { REQUIREMENT_DEFAULTS as D } from './defaults';
import type { RequirementJson } from './schema';

/** Validated already, so a failure here is a bug and throws. */
function si(value: string | number | undefined, dimension: Dimension, fallback: number): number {
  if (value === undefined) return fallback;
  return typeof value === 'number' ? value : quantity(value, dimension);
}

/** The configuration a requirement flies in; a defaulted one the concept lacks falls back to clean. */
function configurationOf(r: RequirementJson, index: number, defined: readonly string[], warnings: WarningJson[]): string {
  if (r.configuration !== undefined) return r.configuration;
  const wanted = requirementKind(r.kind).defaultConfiguration;
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
  const descriptor = requirementKind(r.kind);
  const altitudeM = si(r.altitude, 'length', D.altitudeM);
  const temperatureOffsetK = si(r.temperatureOffset, 'temperatureDifference', D.temperatureOffsetK);
  const common = {
    id: r.id,
    ...(r.label !== undefined ? { label: r.label } : {}),
    enabled: r.enabled ?? D.enabled,
    altitudeM,
    temperatureOffsetK,
    massFraction: si(r.massFraction, 'fraction', D.massFraction),
    powerSetting: si(r.powerSetting, 'fraction', D.powerSetting),
    // A kind without propeller efficiency keeps the climb value, unused.
    propellerEfficiency: si(r.propellerEfficiency, 'fraction', descriptor.propeller?.default ?? D.propellerEfficiency),
    configuration: configurationOf(r, index, configurations, warnings),
  };
  // A Mach number becomes TAS with the speed of sound at this requirement's altitude and temperature.
  const here = (value: string | number | undefined, dimension: Dimension, fallback: number): number => {
    if (dimension === 'speed' && typeof value === 'string') {
      const parsed = parseQuantity(value, 'speed', { mach: true });
      if (parsed.ok && parsed.mach !== undefined) return parsed.mach * atmosphere(altitudeM, temperatureOffsetK).speedOfSoundMps;
    }
    return si(value, dimension, fallback);
  };
  return { ...common, kind: r.kind, ...descriptor.resolve(r, here) } as Requirement;
}
