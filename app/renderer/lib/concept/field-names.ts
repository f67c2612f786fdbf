/**
 * A concept-file path in plain words, for lists that would otherwise show
 * the path (the problems list, Compare): "Landing flaps: Maximum lift
 * coefficient" for `aircraft.aero.configurations.landing.clMax`. The path
 * itself goes in the tooltip. Unknown paths are returned as written.
 */
import type { RequirementKind } from '../../../../core';
import { getIn, requirementsOf, type ConceptDocument } from './edit';
import { AERO_FIELDS, AIRCRAFT_FIELDS, configurationFieldSpecs, propulsionFieldSpecs, requirementFieldSpecs } from './fields';

const CONFIGURATION_TITLES: Record<string, string> = { clean: 'Clean', takeoff: 'Take-off flaps', landing: 'Landing flaps' };

const OWN_TITLES: Record<string, string> = { id: 'Id', kind: 'Kind', label: 'Label', enabled: 'Used', source: 'Source', note: 'Note', name: 'Concept name', format: 'File format' };

function titleIn(specs: ReadonlyArray<{ key: string; title: string }>, key: string | undefined): string | undefined {
  return key === undefined ? undefined : specs.find((spec) => spec.key === key)?.title;
}

/** The field in words, or the path when it names nothing the editor knows. */
export function fieldName(path: string, document: ConceptDocument): string {
  const parts = path.split('.').flatMap((part) => {
    const indexed = /^([^[]+)\[(\d+)\]$/.exec(part);
    return indexed ? [indexed[1], Number(indexed[2])] : [part];
  });
  const [head, second, third, fourth, fifth] = parts;
  if (head === 'aircraft') {
    if (second === 'takeoffMass') return titleIn(AIRCRAFT_FIELDS, 'takeoffMass') ?? path;
    if (second === 'aero' && third === 'configurations' && typeof fourth === 'string') {
      const where = CONFIGURATION_TITLES[fourth] ?? `Configuration ${fourth}`;
      const what = titleIn(configurationFieldSpecs(fourth), typeof fifth === 'string' ? fifth : undefined);
      return what ? `${where}: ${what}` : where;
    }
    if (second === 'aero' && typeof third === 'string') return titleIn(AERO_FIELDS, third) ?? path;
    if (second === 'propulsion' && typeof third === 'string') {
      if (third === 'kind') return 'Propulsion kind';
      const kind = String(getIn(document, ['aircraft', 'propulsion', 'kind']) ?? '');
      return titleIn(propulsionFieldSpecs(kind), third) ?? path;
    }
    return path;
  }
  if (head === 'requirements' && second !== undefined) {
    const requirements = requirementsOf(document);
    const requirement = typeof second === 'number' ? requirements[second] : requirements.find((entry) => entry.id === second);
    const who = requirement && typeof requirement.id === 'string' ? requirement.id : String(second);
    if (typeof third !== 'string') return `Requirement ${who}`;
    const what = OWN_TITLES[third] ?? (requirement ? titleIn(requirementFieldSpecs(String(requirement.kind) as RequirementKind), third) : undefined);
    return what ? `${who}: ${what}` : path;
  }
  if (typeof head === 'string' && parts.length === 1 && OWN_TITLES[head]) return OWN_TITLES[head];
  return path;
}
