/**
 * Adding, renaming and removing aerodynamic configurations of a concept
 * document (aircraft.aero.configurations), as immutable edits. A
 * configuration a requirement flies in (named, or by its kind's default) is
 * never removed: the refusal names the requirement. A rename carries the
 * requirements and the ranges that name the configuration along with it.
 */
import { REQUIREMENT_KINDS, requirementKind, type RequirementKind } from '../../../../core/requirements';
import { getIn, requirementsOf, type ConceptDocument, type Json } from './edit';

export type ConfigurationEdit = { ok: true; document: ConceptDocument } | { ok: false; message: string };

const NAME = /^[a-z][a-z0-9-]{0,39}$/;

type JsonRecord = { [key: string]: Json };

function isRecord(value: unknown): value is JsonRecord {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function configurationsOf(document: ConceptDocument): JsonRecord {
  const found = getIn(document, ['aircraft', 'aero', 'configurations']);
  return isRecord(found) ? found : {};
}

function withConfigurations(document: ConceptDocument, configurations: JsonRecord): ConceptDocument {
  const aircraft = isRecord(document.aircraft) ? document.aircraft : {};
  const aero = isRecord(aircraft.aero) ? aircraft.aero : {};
  return { ...document, aircraft: { ...aircraft, aero: { ...aero, configurations } } };
}

/** What is wrong with a new configuration name, or null. */
export function configurationNameProblem(document: ConceptDocument, name: string, except?: string): string | null {
  if (name === '') return 'Give the configuration a name.';
  if (!NAME.test(name)) return 'A configuration name is lower-case letters, digits and hyphens, starting with a letter (e.g. engine-out).';
  if (name !== except && Object.hasOwn(configurationsOf(document), name)) return `A configuration "${name}" already exists.`;
  return null;
}

/** The requirements flying in `name`: named in `configuration`, or by their kind's default when they name none. */
export function requirementsUsing(document: ConceptDocument, name: string): Array<{ id: string; byDefault: boolean }> {
  const users: Array<{ id: string; byDefault: boolean }> = [];
  for (const requirement of requirementsOf(document)) {
    const id = typeof requirement.id === 'string' ? requirement.id : '(no id)';
    if (requirement.configuration === name) users.push({ id, byDefault: false });
    else if (requirement.configuration === undefined && (REQUIREMENT_KINDS as readonly string[]).includes(String(requirement.kind))) {
      if (requirementKind(requirement.kind as RequirementKind).defaultConfiguration === name) users.push({ id, byDefault: true });
    }
  }
  return users;
}

/**
 * A new configuration; its values copy `from` (clean's become an increment of
 * zero on clean), so it starts as a twin of a configuration the engineer knows.
 */
export function addConfiguration(document: ConceptDocument, name: string, from = 'clean'): ConfigurationEdit {
  const problem = configurationNameProblem(document, name);
  if (problem) return { ok: false, message: problem };
  const configurations = configurationsOf(document);
  const source = configurations[from];
  if (!isRecord(source)) return { ok: false, message: `There is no configuration "${from}" to start from.` };
  const values: JsonRecord =
    from === 'clean'
      ? { cd0Increment: 0, ...(source.oswaldEfficiency !== undefined ? { oswaldEfficiency: source.oswaldEfficiency } : {}), ...(source.clMax !== undefined ? { clMax: source.clMax } : {}) }
      : { ...source };
  return { ok: true, document: withConfigurations(document, { ...configurations, [name]: values }) };
}

/** Renames a configuration, keeping its place; requirements and ranges that name it follow. Clean keeps its name. */
export function renameConfiguration(document: ConceptDocument, from: string, to: string): ConfigurationEdit {
  if (from === 'clean') return { ok: false, message: 'The clean configuration is the reference of the others and keeps its name.' };
  const configurations = configurationsOf(document);
  if (!Object.hasOwn(configurations, from)) return { ok: false, message: `There is no configuration "${from}".` };
  if (from === to) return { ok: true, document };
  const problem = configurationNameProblem(document, to);
  if (problem) return { ok: false, message: problem };
  // A requirement that flew in `from` by its kind's default now names it, so it keeps flying in the same configuration.
  const users = new Set(requirementsUsing(document, from).map((user) => user.id));
  const renamed: JsonRecord = Object.fromEntries(Object.entries(configurations).map(([key, value]) => [key === from ? to : key, value]));
  let next = withConfigurations(document, renamed);
  if (Array.isArray(document.requirements)) {
    next = {
      ...next,
      requirements: document.requirements.map((requirement) =>
        isRecord(requirement) && typeof requirement.id === 'string' && users.has(requirement.id) ? { ...requirement, configuration: to } : requirement,
      ),
    };
  }
  const uncertainty = document.uncertainty;
  if (isRecord(uncertainty) && Array.isArray(uncertainty.parameters)) {
    const prefix = `aircraft.aero.configurations.${from}.`;
    const parameters = uncertainty.parameters.map((parameter) =>
      isRecord(parameter) && typeof parameter.field === 'string' && parameter.field.startsWith(prefix)
        ? { ...parameter, field: `aircraft.aero.configurations.${to}.${parameter.field.slice(prefix.length)}` }
        : parameter,
    );
    next = { ...next, uncertainty: { ...uncertainty, parameters } };
  }
  return { ok: true, document: next };
}

/** Removes a configuration no requirement flies in; ranges on its values go with it. */
export function removeConfiguration(document: ConceptDocument, name: string): ConfigurationEdit {
  if (name === 'clean') return { ok: false, message: 'The clean configuration is the reference of the others and cannot be removed.' };
  const configurations = configurationsOf(document);
  if (!Object.hasOwn(configurations, name)) return { ok: false, message: `There is no configuration "${name}".` };
  const users = requirementsUsing(document, name);
  if (users.length > 0) {
    const list = users.map((user) => `"${user.id}"${user.byDefault ? ' (by its default)' : ''}`).join(', ');
    return {
      ok: false,
      message: `The ${name} configuration cannot be removed: requirement${users.length > 1 ? 's' : ''} ${list} fl${users.length > 1 ? 'y' : 'ies'} in it. Give ${users.length > 1 ? 'them' : 'it'} another configuration first.`,
    };
  }
  const rest: JsonRecord = Object.fromEntries(Object.entries(configurations).filter(([key]) => key !== name));
  let next = withConfigurations(document, rest);
  const uncertainty = document.uncertainty;
  if (isRecord(uncertainty) && Array.isArray(uncertainty.parameters)) {
    const prefix = `aircraft.aero.configurations.${name}.`;
    const parameters = uncertainty.parameters.filter((parameter) => !(isRecord(parameter) && typeof parameter.field === 'string' && parameter.field.startsWith(prefix)));
    next = { ...next, uncertainty: { ...uncertainty, parameters } };
  }
  return { ok: true, document: next };
}
