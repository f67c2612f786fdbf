/**
 * Adding, renaming and removing an aerodynamic configuration of a concept
 * document (loftpoint-concept/1). Each returns a new document, never changing
 * the one it is given, or the one problem that stops it with the field it is
 * about. A rename follows every requirement that names the configuration and
 * every range on its fields; a removal is refused while anything still uses
 * it. `clean` is the reference polar: it is never renamed or removed.
 */
import { findRequirementKind } from '../requirements';
import type { ConceptDocument } from './migrate';

export type ConfigurationEdit = { ok: true; concept: ConceptDocument } | { ok: false; path: string; message: string };

/** The values a new configuration may state; absent ones are clean's (cd0Increment: 0). */
export interface ConfigurationValues {
  cd0Increment?: number;
  oswaldEfficiency?: number;
  clMax?: number;
}

const NAME = /^[A-Za-z0-9][A-Za-z0-9 _-]{0,39}$/;
const PREFIX = 'aircraft.aero.configurations.';

type Json = Record<string, unknown>;

const isRecord = (value: unknown): value is Json => value !== null && typeof value === 'object' && !Array.isArray(value);

function configurationsOf(document: ConceptDocument): Json | null {
  const aircraft = document.aircraft;
  const aero = isRecord(aircraft) ? aircraft.aero : undefined;
  const configurations = isRecord(aero) ? aero.configurations : undefined;
  return isRecord(configurations) ? configurations : null;
}

function withConfigurations(document: ConceptDocument, configurations: Json): ConceptDocument {
  const aircraft = document.aircraft as Json;
  const aero = aircraft.aero as Json;
  return { ...document, aircraft: { ...aircraft, aero: { ...aero, configurations } } };
}

function fail(path: string, message: string): ConfigurationEdit {
  return { ok: false, path, message };
}

function nameProblem(name: string): string | null {
  if (!NAME.test(name)) return `"${name}" is not a configuration name: 1 to 40 letters, digits, spaces, "-" or "_", starting with a letter or digit`;
  return null;
}

/** Requirements flown in `name`: named as their configuration, or their kind's default when they name none. */
function usersOf(document: ConceptDocument, name: string): { index: number; id: string }[] {
  const requirements = Array.isArray(document.requirements) ? document.requirements : [];
  return requirements.flatMap((r, index) => {
    if (!isRecord(r)) return [];
    const flown = r.configuration ?? (typeof r.kind === 'string' ? findRequirementKind(r.kind)?.defaultConfiguration : undefined);
    return flown === name ? [{ index, id: String(r.id ?? index) }] : [];
  });
}

/** Ranged fields (uncertainty.parameters) on configuration `name`. */
function rangesOf(document: ConceptDocument, name: string): number[] {
  const block = document.uncertainty;
  const parameters = isRecord(block) && Array.isArray(block.parameters) ? block.parameters : [];
  return parameters.flatMap((p, i) => (isRecord(p) && typeof p.field === 'string' && p.field.startsWith(`${PREFIX}${name}.`) ? [i] : []));
}

/** A new configuration `name`; the values it does not state are clean's. */
export function addConfiguration(document: ConceptDocument, name: string, values: ConfigurationValues = {}): ConfigurationEdit {
  const configurations = configurationsOf(document);
  if (!configurations) return fail('aircraft.aero.configurations', 'is missing; the concept has no configurations to add to');
  const problem = nameProblem(name);
  if (problem) return fail(`${PREFIX}${name}`, problem);
  if (name in configurations) return fail(`${PREFIX}${name}`, `already exists; choose another name`);
  const entry: Json = { cd0Increment: values.cd0Increment ?? 0 };
  if (values.oswaldEfficiency !== undefined) entry.oswaldEfficiency = values.oswaldEfficiency;
  if (values.clMax !== undefined) entry.clMax = values.clMax;
  return { ok: true, concept: withConfigurations(document, { ...configurations, [name]: entry }) };
}

/** Configuration `from` under the name `to`, in the same place; requirements and ranges that name it follow. */
export function renameConfiguration(document: ConceptDocument, from: string, to: string): ConfigurationEdit {
  const configurations = configurationsOf(document);
  if (!configurations) return fail('aircraft.aero.configurations', 'is missing');
  if (!(from in configurations)) return fail(`${PREFIX}${from}`, `no such configuration (the concept has ${Object.keys(configurations).join(', ')})`);
  if (from === 'clean') return fail(`${PREFIX}clean`, 'is the reference configuration and keeps its name');
  const problem = nameProblem(to);
  if (problem) return fail(`${PREFIX}${to}`, problem);
  if (to in configurations) return fail(`${PREFIX}${to}`, 'already exists; choose another name');
  const renamed = Object.fromEntries(Object.entries(configurations).map(([key, value]) => [key === from ? to : key, value]));
  let next = withConfigurations(document, renamed);
  // Requirements that fly in it, by name or by their kind's default, name it from now on.
  const users = new Set(usersOf(document, from).map((u) => u.index));
  if (Array.isArray(document.requirements) && users.size > 0) {
    next = { ...next, requirements: document.requirements.map((r, i) => (users.has(i) && isRecord(r) ? { ...r, configuration: to } : r)) };
  }
  const block = document.uncertainty;
  if (isRecord(block) && Array.isArray(block.parameters)) {
    const parameters = block.parameters.map((p) =>
      isRecord(p) && typeof p.field === 'string' && p.field.startsWith(`${PREFIX}${from}.`) ? { ...p, field: `${PREFIX}${to}.${p.field.slice(`${PREFIX}${from}.`.length)}` } : p,
    );
    next = { ...next, uncertainty: { ...block, parameters } };
  }
  return { ok: true, concept: next };
}

/** The document without configuration `name`; refused while a requirement or a range uses it. */
export function removeConfiguration(document: ConceptDocument, name: string): ConfigurationEdit {
  const configurations = configurationsOf(document);
  if (!configurations) return fail('aircraft.aero.configurations', 'is missing');
  if (!(name in configurations)) return fail(`${PREFIX}${name}`, `no such configuration (the concept has ${Object.keys(configurations).join(', ')})`);
  if (name === 'clean') return fail(`${PREFIX}clean`, 'is the reference configuration and cannot be removed');
  const users = usersOf(document, name);
  if (users.length > 0) {
    return fail(`requirements[${users[0]!.index}].configuration`, `requirement${users.length > 1 ? 's' : ''} ${users.map((u) => `"${u.id}"`).join(', ')} still fl${users.length > 1 ? 'y' : 'ies'} in "${name}"; point ${users.length > 1 ? 'them' : 'it'} at another configuration first`);
  }
  const ranged = rangesOf(document, name);
  if (ranged.length > 0) return fail(`uncertainty.parameters[${ranged[0]}].field`, `ranges a field of "${name}"; remove the range first`);
  const { [name]: _removed, ...rest } = configurations;
  return { ok: true, concept: withConfigurations(document, rest) };
}
