/**
 * Setting a ranged assumption on a Design without touching the original, and
 * knowing which requirements it can move.
 *
 * The resolved Design stores each configuration with absolute values (clean's
 * cd0 plus the increment; clean's Oswald efficiency and CLmax where the
 * concept gives none), so moving clean's cd0 moves every configuration's cd0
 * by the same amount, and moving clean's e or CLmax moves every configuration
 * that inherits it.
 */
// @ts-nocheck

import type { ConfigurationPolar, Design, Requirement } from '../model';
import { requirementKind } from '../requirements';
import { isCurveKind, type FieldRef } from './uncertain-fields';

/**
 * Configuration names that take clean's value of `key`. Read from the concept
 * JSON when given (a configuration without the key inherits it); otherwise a
 * configuration whose value equals clean's is taken to inherit it.
 */
function inheritingConfigurations(key: 'oswaldEfficiency' | 'clMax', design: Design, concept?: unknown): string[] {
  const configurations = design.aircraft.configurations;
  const written = writtenConfigurations(concept);
  return Object.keys(configurations).filter((name) => {
    if (name === 'clean') return false;
    if (written) return !(written[name] && key in written[name]);
    return configurations[name][key] === configurations.clean[key];
  });
}

function writtenConfigurations(concept: unknown): Record<string, Record<string, unknown>> | null {
  const aero = (concept as { aircraft?: { aero?: { configurations?: unknown } } } | null)?.aircraft?.aero;
  const configurations = aero?.configurations;
  return configurations && typeof configurations === 'object' ? (configurations as Record<string, Record<string, unknown>>) : null;
}

/** The configurations a ranged configuration value writes to. */
export function targetConfigurations(ref: FieldRef, design: Design, concept?: unknown): string[] {
  if (ref.scope !== 'configuration') return [];
  if (ref.key === 'cd0') return Object.keys(design.aircraft.configurations);
  if (ref.name !== 'clean' || ref.key === 'cd0Increment') return [ref.name];
  return ['clean', ...inheritingConfigurations(ref.key, design, concept)];
}

/**
 * A copy of the design deep enough that every ranged assumption can be
 * written into it without touching the original: aircraft, propulsion,
 * configurations and requirements are new objects.
 */
export function workingCopy(design: Design): Design {
  const { aircraft } = design;
  const configurations: Record<string, ConfigurationPolar> = {};
  for (const name of Object.keys(aircraft.configurations)) configurations[name] = { ...aircraft.configurations[name] };
  return {
    ...design,
    aircraft: { ...aircraft, propulsion: { ...aircraft.propulsion }, configurations },
    requirements: design.requirements.map((r) => ({ ...r })),
  };
}

/** A function that writes the assumption into a working copy (see workingCopy) that the caller owns. */
export function assigner(ref: FieldRef, targets: readonly string[]): (working: Design, value: number) => void {
  if (ref.scope === 'aircraft') {
    if (ref.key === 'lapseExponent') return (working, value) => void (working.aircraft.propulsion.lapseExponent = value);
    const key = ref.key;
    return (working, value) => void (working.aircraft[key] = value);
  }
  if (ref.scope === 'requirement') {
    const { id, key } = ref;
    return (working, value) => {
      for (const r of working.requirements) if (r.id === id) (r as unknown as Record<string, number>)[key] = value;
    };
  }
  const key = ref.key;
  return (working, value) => {
    const configurations = working.aircraft.configurations;
    const cleanCd0 = configurations.clean.cd0;
    for (const name of targets) {
      const polar = configurations[name];
      if (!polar) continue;
      if (key === 'cd0') polar.cd0 = polar.cd0 - cleanCd0 + value;
      else if (key === 'cd0Increment') polar.cd0 = cleanCd0 + value;
      else polar[key] = value;
    }
  };
}

/**
 * Ids of the requirements whose boundary the assumption can move. Stall and
 * landing-roll limits use only CLmax (and the landing roll its braking
 * friction); every other kind uses the polar and the propulsion.
 */
export function affectedRequirements(ref: FieldRef, design: Design, targets: readonly string[]): string[] {
  // Curves, and the limits that take the configuration's drag (their descriptor says so).
  const curves = design.requirements.filter((r) => isCurveKind(r.kind) || requirementKind(r.kind).usesDrag?.(r) === true);
  if (ref.scope === 'requirement') return [ref.id];
  if (ref.scope === 'aircraft') return curves.map((r) => r.id);
  // A configuration the aircraft lacks is flown as clean (core/constraints/flight-condition.ts).
  const flies = (r: Requirement) => targets.includes(Object.hasOwn(design.aircraft.configurations, r.configuration) ? r.configuration : 'clean');
  if (ref.key === 'clMax') return design.requirements.filter(flies).map((r) => r.id);
  return curves.filter(flies).map((r) => r.id);
}
