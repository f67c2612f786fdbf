/**
 * Which fields a concept allows at a given place, for messages about
 * unknown fields. Read from the schema's own shapes, so it cannot drift.
 */
import { REQUIREMENT_KINDS, type RequirementKind } from '../model';
import { aeroShape, aircraftShape, cleanConfigurationShape, configurationShape, propulsionShape } from './aircraft-schema';
import { missionEnergySchema, missionSegmentSchema, missionShape } from './mission-schema';
import { requirementFields } from './requirement-schema';
import { conceptShape, designPointShape, diagramShape } from './schema';

const keys = (shape: object) => Object.keys(shape);

function at(value: unknown, key: PropertyKey): unknown {
  return value !== null && typeof value === 'object' ? (value as Record<PropertyKey, unknown>)[key] : undefined;
}

/** The fields of the option of a `kind` union that this kind picks. */
function kindFields(options: ReadonlyArray<{ shape: { kind: { value: unknown } } }>, kind: unknown): string[] | undefined {
  const option = options.find((o) => o.shape.kind.value === kind);
  return option ? keys(option.shape) : undefined;
}

/** The fields allowed in the object at `path`, or undefined if that place is not an object of the format. */
export function fieldsAt(path: readonly PropertyKey[], document: unknown): string[] | undefined {
  const p = path.join('/');
  if (p === '') return keys(conceptShape);
  if (p === 'aircraft') return keys(aircraftShape);
  if (p === 'aircraft/aero') return keys(aeroShape);
  if (p === 'aircraft/propulsion') return keys(propulsionShape);
  if (p === 'aircraft/aero/configurations/clean') return keys(cleanConfigurationShape);
  if (path.length === 4 && p.startsWith('aircraft/aero/configurations/')) return keys(configurationShape);
  if (p === 'diagram') return keys(diagramShape);
  if (p === 'designPoint') return keys(designPointShape);
  if (p === 'mission') return keys(missionShape);
  if (p === 'mission/energy') return kindFields(missionEnergySchema.options, at(at(at(document, 'mission'), 'energy'), 'kind'));
  if (path.length === 3 && p.startsWith('mission/segments/')) {
    return kindFields(missionSegmentSchema.options, at(at(at(at(document, 'mission'), 'segments'), path[2]), 'kind'));
  }
  if (path.length === 2 && path[0] === 'requirements' && typeof path[1] === 'number') {
    const kind = at(at(at(document, 'requirements'), path[1]), 'kind');
    if (REQUIREMENT_KINDS.includes(kind as RequirementKind)) return requirementFields(kind as RequirementKind);
  }
  return undefined;
}

/** Requirement kinds that have this field. */
export function kindsWithField(field: string): RequirementKind[] {
  return REQUIREMENT_KINDS.filter((kind) => requirementFields(kind).includes(field));
}
