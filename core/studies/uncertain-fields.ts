/**
 * The assumptions that may carry a range, addressed by their concept-file
 * path: where each lives in the resolved Design, what it is called, which
 * physical bounds it has, and which requirements it can move.
 */
import type { Design, Requirement, RequirementKind } from '../model';

export type AircraftKey = 'aspectRatio' | 'cdLinear' | 'lapseExponent';
export type ConfigurationKey = 'cd0' | 'cd0Increment' | 'oswaldEfficiency' | 'clMax';
export type RequirementKey = 'propellerEfficiency' | 'rollingFriction' | 'brakingFriction' | 'clGroundRun';

export type FieldRef =
  | { scope: 'aircraft'; key: AircraftKey }
  | { scope: 'configuration'; name: string; key: ConfigurationKey }
  | { scope: 'requirement'; id: string; key: RequirementKey };

const CONFIGURATIONS = 'aircraft.aero.configurations.';
const REQUIREMENTS = 'requirements.';
const CONFIGURATION_KEYS: readonly ConfigurationKey[] = ['cd0', 'cd0Increment', 'oswaldEfficiency', 'clMax'];
const REQUIREMENT_KEYS: readonly RequirementKey[] = ['propellerEfficiency', 'rollingFriction', 'brakingFriction', 'clGroundRun'];

/** Kinds drawn as a wing-loading limit; they use no drag polar and no propulsion. */
const LIMIT_KINDS: readonly RequirementKind[] = ['stall', 'landing-ground-roll'];

export function isCurveKind(kind: RequirementKind): boolean {
  return !LIMIT_KINDS.includes(kind);
}

/** Parse a field path and check that this design has it and that it may carry a range. */
export function fieldRef(field: string, design: Design): { ok: true; ref: FieldRef } | { ok: false; message: string } {
  if (field === 'aircraft.aero.aspectRatio') return { ok: true, ref: { scope: 'aircraft', key: 'aspectRatio' } };
  if (field === 'aircraft.aero.cdLinear') return { ok: true, ref: { scope: 'aircraft', key: 'cdLinear' } };
  if (field === 'aircraft.propulsion.lapseExponent') {
    const kind = design.aircraft.propulsion.kind;
    if (kind !== 'turboprop' && kind !== 'turbofan') {
      return { ok: false, message: `a ${kind} concept has no lapse exponent (only turboprop and turbofan use one)` };
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
  'requirements.ID.(propellerEfficiency|rollingFriction|brakingFriction|clGroundRun)';

function configurationRef(rest: string, design: Design): { ok: true; ref: FieldRef } | { ok: false; message: string } {
  const dot = rest.lastIndexOf('.');
  const name = rest.slice(0, dot);
  const key = rest.slice(dot + 1) as ConfigurationKey;
  if (dot < 0 || !CONFIGURATION_KEYS.includes(key)) {
    return { ok: false, message: `a configuration's ranged value must be cd0, cd0Increment, oswaldEfficiency or clMax` };
  }
  if (!(name in design.aircraft.configurations)) {
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
    return { ok: false, message: `a requirement's ranged value must be propellerEfficiency, rollingFriction, brakingFriction or clGroundRun` };
  }
  const requirement = design.requirements.find((r) => r.id === id);
  if (!requirement) return { ok: false, message: `no requirement has the id "${id}" (requirements are addressed by id)` };
  const kind = requirement.kind;
  if (key === 'propellerEfficiency') {
    if (design.aircraft.propulsion.kind === 'turbofan') return { ok: false, message: 'a turbofan concept uses no propeller efficiency' };
    if (!isCurveKind(kind)) return { ok: false, message: `a ${kind} requirement does not use propeller efficiency` };
  }
  if ((key === 'rollingFriction' || key === 'clGroundRun') && kind !== 'takeoff-ground-roll') {
    return { ok: false, message: `${key} belongs to a takeoff-ground-roll requirement; "${id}" is ${kind}` };
  }
  if (key === 'brakingFriction' && kind !== 'landing-ground-roll') {
    return { ok: false, message: `brakingFriction belongs to a landing-ground-roll requirement; "${id}" is ${kind}` };
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
    case 'clGroundRun':
      return bounds(0, Infinity);
    case 'rollingFriction':
      return bounds(0, 1, false, true);
    case 'brakingFriction':
    case 'oswaldEfficiency':
    case 'propellerEfficiency':
      return bounds(0, 1, true);
  }
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
  const what = {
    propellerEfficiency: 'Propeller efficiency',
    rollingFriction: 'Rolling friction',
    brakingFriction: 'Braking friction',
    clGroundRun: 'Ground-run CL',
  }[ref.key];
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
