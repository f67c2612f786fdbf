/**
 * The assumptions that may carry a range, addressed by their concept-file
 * path: where each lives in the resolved Design, what it is called, which
 * physical bounds it has, and which requirements it can move.
 */
// @ts-nocheck

import type { Design, Requirement, RequirementKind } from '../model';
import { propulsionKind, PROPULSION_DESCRIPTORS } from '../propulsion/kinds';
import { REQUIREMENT_DESCRIPTORS, requirementKind } from '../requirements';

type AircraftKey = 'aspectRatio' | 'cdLinear' | 'lapseExponent';
type ConfigurationKey = 'cd0' | 'cd0Increment' | 'oswaldEfficiency' | 'clMax';
/** propellerEfficiency, or an assumption of a kind's own with a typical range (rollingFriction, brakingFriction, clGroundRun...). */
type RequirementKey = string;

export type FieldRef =
  | { scope: 'aircraft'; key: AircraftKey }
  | { scope: 'configuration'; name: string; key: ConfigurationKey }
  | { scope: 'requirement'; id: string; key: RequirementKey };

const CONFIGURATIONS = 'aircraft.aero.configurations.';
const REQUIREMENTS = 'requirements.';
const CONFIGURATION_KEYS: readonly ConfigurationKey[] = ['cd0', 'cd0Increment', 'oswaldEfficiency', 'clMax'];
/** Which kinds own each rangeable key of a requirement (propeller efficiency: every kind that uses it). */
const KEY_OWNERS: ReadonlyMap<string, readonly RequirementKind[]> = (() => {
  const owners = new Map<string, RequirementKind[]>([['propellerEfficiency', []]]);
  for (const d of REQUIREMENT_DESCRIPTORS) {
    if (d.propeller) owners.get('propellerEfficiency')?.push(d.kind);
    for (const entry of d.typicalRanges) owners.set(entry.key, [...(owners.get(entry.key) ?? []), d.kind]);
  }
  return owners;
})();
const REQUIREMENT_KEYS: readonly RequirementKey[] = [...KEY_OWNERS.keys()];

/** Curves use the drag polar and the propulsion; limits use neither. */
export function isCurveKind(kind: RequirementKind): boolean {
  return requirementKind(kind).drawnAs === 'curve';
}

/** Parse a field path and check that this design has it and that it may carry a range. */
export function fieldRef(field: string, design: Design): { ok: true; ref: FieldRef } | { ok: false; message: string } {
  if (field === 'aircraft.aero.aspectRatio') return { ok: true, ref: { scope: 'aircraft', key: 'aspectRatio' } };
  if (field === 'aircraft.aero.cdLinear') return { ok: true, ref: { scope: 'aircraft', key: 'cdLinear' } };
  if (field === 'aircraft.propulsion.lapseExponent') {
    const kind = design.aircraft.propulsion.kind;
    if (propulsionKind(kind).lapseExponent === null) {
      const users = PROPULSION_DESCRIPTORS.filter((d) => d.lapseExponent !== null).map((d) => d.kind);
      return { ok: false, message: `a ${kind} concept has no lapse exponent (only ${users.join(' and ')} use one)` };
    }
    const model = design.aircraft.propulsion.lapseModel ?? 'density';
    if (model !== 'density') {
      return { ok: false, message: `this concept's ${model} lapse model reads flight Mach and the air, not an exponent; give lapseModel "density" to range the exponent` };
    }
    return { ok: true, ref: { scope: 'aircraft', key: 'lapseExponent' } };
  }
  if (field.startsWith(CONFIGURATIONS)) return configurationRef(field.slice(CONFIGURATIONS.length), design);
  if (field.startsWith(REQUIREMENTS)) return requirementRef(field.slice(REQUIREMENTS.length), design);
  return { ok: false, message: `"${field}" is not an assumption that can carry a range; ${RANGEABLE_HINT}` };
}

const RANGEABLE_HINT =
  'use aircraft.aero.aspectRatio, aircraft.aero.cdLinear, aircraft.propulsion.lapseExponent, ' +
  'aircraft.aero.configurations.NAME.(cd0|cd0Increment|oswaldEfficiency|clMax) or ' +
  `requirements.ID.(${REQUIREMENT_KEYS.join('|')})`;

function configurationRef(rest: string, design: Design): { ok: true; ref: FieldRef } | { ok: false; message: string } {
  const dot = rest.lastIndexOf('.');
  const name = rest.slice(0, dot);
  const key = rest.slice(dot + 1) as ConfigurationKey;
  if (dot < 0 || !CONFIGURATION_KEYS.includes(key)) {
    return { ok: false, message: `a configuration's ranged value must be cd0, cd0Increment, oswaldEfficiency or clMax` };
  }
  if (!Object.hasOwn(design.aircraft.configurations, name)) {
    const known = Object.keys(design.aircraft.configurations).join(', ');
    return { ok: false, message: `the concept has no configuration "${name}" (it has ${known})` };
  }
  if (key === 'cd0' && name !== 'clean') return { ok: false, message: `only clean has cd0; range "${name}".cd0Increment instead` };
  if (key === 'cd0Increment' && name === 'clean') return { ok: false, message: 'clean has no cd0Increment; range clean.cd0 instead' };
  return { ok: true, ref: { scope: 'configuration', name, key } };
}

function requirementRef(rest: string, design: Design): { ok: true; ref: FieldRef } | { ok: false; message: string } {
  const dot = rest.lastIndexOf('.');
  const id = rest.slice(0, dot);
  const key = rest.slice(dot + 1) as RequirementKey;
  if (dot < 0 || !REQUIREMENT_KEYS.includes(key)) {
    return { ok: false, message: `a requirement's ranged value must be ${REQUIREMENT_KEYS.slice(0, -1).join(', ')} or ${REQUIREMENT_KEYS.at(-1)}` };
  }
  const requirement = design.requirements.find((r) => r.id === id);
  if (!requirement) return { ok: false, message: `no requirement has the id "${id}" (requirements are addressed by id)` };
  const kind = requirement.kind;
  if (key === 'propellerEfficiency') {
    const propulsion = design.aircraft.propulsion.kind;
    if (!propulsionKind(propulsion).propeller) return { ok: false, message: `a ${propulsion} concept uses no propeller efficiency` };
    if (!requirementKind(kind).propeller) return { ok: false, message: `a ${kind} requirement does not use propeller efficiency` };
  } else {
    const owners = KEY_OWNERS.get(key) ?? [];
    if (!owners.includes(kind)) return { ok: false, message: `${key} belongs to a ${owners.join(' or ')} requirement; "${id}" is ${kind}` };
  }
  return { ok: true, ref: { scope: 'requirement', id, key } };
}

/** The value the design itself uses. */
export function nominalOf(ref: FieldRef, design: Design): number {
  const aircraft = design.aircraft;
  if (ref.scope === 'aircraft') return ref.key === 'lapseExponent' ? aircraft.propulsion.lapseExponent : aircraft[ref.key];
  if (ref.scope === 'configuration') {
    const polar = aircraft.configurations[ref.name];
    return ref.key === 'cd0Increment' ? polar.cd0 - aircraft.configurations.clean.cd0 : polar[ref.key];
  }
  const requirement = design.requirements.find((r) => r.id === ref.id) as Requirement & Record<RequirementKey, number>;
  return requirement[ref.key];
}

/** Values outside [min, max] have no physical meaning; `open` ends exclude the bound itself. */
export interface PhysicalBounds {
  min: number;
  max: number;
  openMin: boolean;
  openMax: boolean;
}

export function boundsOf(ref: FieldRef): PhysicalBounds {
  const bounds = (min: number, max: number, openMin = false, openMax = false) => ({ min, max, openMin, openMax });
  // The same limits the concept schema puts on the values themselves.
  switch (ref.key) {
    case 'aspectRatio':
    case 'cd0':
    case 'clMax':
    case 'lapseExponent':
      return bounds(0, Infinity, true);
    case 'cdLinear':
      return bounds(-Infinity, Infinity);
    case 'cd0Increment':
      return bounds(0, Infinity);
    case 'oswaldEfficiency':
    case 'propellerEfficiency':
      return bounds(0, 1, true);
  }
  return ownEntry(ref.key).bounds;
}

/** The descriptor entry of a kind's own rangeable assumption. */
function ownEntry(key: string) {
  for (const d of REQUIREMENT_DESCRIPTORS) {
    const entry = d.typicalRanges.find((e) => e.key === key);
    if (entry) return entry;
  }
  throw new Error(`no requirement kind has the assumption "${key}"`);
}

/** A short label for a chart bar: "Oswald efficiency (landing)", "Propeller efficiency (cruise)" (requirement id). */
export function labelOf(ref: FieldRef): string {
  if (ref.scope === 'aircraft') {
    return { aspectRatio: 'Aspect ratio', cdLinear: 'Linear drag term K1', lapseExponent: 'Lapse exponent' }[ref.key];
  }
  if (ref.scope === 'configuration') {
    const what = { cd0: 'CD0', cd0Increment: 'CD0 increment', oswaldEfficiency: 'Oswald efficiency', clMax: 'CLmax' }[ref.key];
    return `${what} (${ref.name})`;
  }
  const what = ref.key === 'propellerEfficiency' ? 'Propeller efficiency' : ownEntry(ref.key).label;
  return `${what} (${ref.id})`;
}

/** Every field of this design that may carry a range, in concept-file order. */
export function rangeableFields(design: Design): string[] {
  const fields = ['aircraft.aero.aspectRatio', 'aircraft.aero.cdLinear'];
  for (const name of Object.keys(design.aircraft.configurations)) {
    const base = `${CONFIGURATIONS}${name}.`;
    fields.push(`${base}${name === 'clean' ? 'cd0' : 'cd0Increment'}`, `${base}oswaldEfficiency`, `${base}clMax`);
  }
  fields.push('aircraft.propulsion.lapseExponent');
  for (const r of design.requirements) {
    for (const key of REQUIREMENT_KEYS) fields.push(`${REQUIREMENTS}${r.id}.${key}`);
  }
  return fields.filter((field) => fieldRef(field, design).ok);
}
