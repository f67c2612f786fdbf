/**
 * Rules that join fields, run once every field is valid on its own:
 * unique ids, configurations that exist, engine counts, the design point's
 * axis, and the diagram range.
 */
// @ts-nocheck

import { loadingAxis } from '../aircraft';
import { propulsionKind } from '../propulsion/kinds';
import { requirementKind } from '../requirements';
import { parseQuantity } from '../units/quantity';
import { DEFAULT_ENGINES } from './defaults';
import type { ConceptIssue } from './format';
import type { ConceptJson, RequirementJson } from './schema';

const named = (r: RequirementJson) => ` (requirement "${r.id}")`;

function requirementIssues(concept: ConceptJson): ConceptIssue[] {
  const issues: ConceptIssue[] = [];
  const configurations = Object.keys(concept.aircraft.aero.configurations);
  const engines = concept.aircraft.propulsion.engines ?? DEFAULT_ENGINES;
  const firstIndex = new Map<string, number>();
  concept.requirements.forEach((r, i) => {
    const at = `requirements[${i}]`;
    const seen = firstIndex.get(r.id);
    if (seen !== undefined) {
      issues.push({ path: `${at}.id`, message: `duplicate id "${r.id}" (also requirements[${seen}].id); give each requirement its own id` });
    } else firstIndex.set(r.id, i);
    if (r.configuration !== undefined && !configurations.includes(r.configuration)) {
      issues.push({
        path: `${at}.configuration`,
        message: `no configuration "${r.configuration}" in aircraft.aero.configurations (defined: ${configurations.join(', ')})${named(r)}`,
      });
    }
    const own = requirementKind(r.kind).issues?.(r, { engines }) ?? [];
    for (const issue of own) issues.push({ path: issue.field ? `${at}.${issue.field}` : at, message: `${issue.message}${named(r)}` });
  });
  return issues;
}

function aircraftIssues(concept: ConceptJson): ConceptIssue[] {
  const { propulsion } = concept.aircraft;
  const descriptor = propulsionKind(propulsion.kind);
  if (descriptor.needsCriticalAltitude && propulsion.criticalAltitude === undefined) {
    return [{ path: 'aircraft.propulsion.criticalAltitude', message: `is required for a ${propulsion.kind} engine, e.g. "12000 ft"` }];
  }
  if (propulsion.lapseModel !== undefined && !descriptor.lapseModels.includes(propulsion.lapseModel)) {
    return [
      {
        path: 'aircraft.propulsion.lapseModel',
        message: `a ${propulsion.kind} engine takes lapseModel ${descriptor.lapseModels.map((m) => `"${m}"`).join(' or ')}, not "${propulsion.lapseModel}"`,
      },
    ];
  }
  return [];
}

function diagramIssues(concept: ConceptJson): ConceptIssue[] {
  const range = concept.diagram?.wingLoading;
  if (!range) return [];
  const [lo, hi] = range.map((v) => parseQuantity(v, 'wingLoading'));
  if (lo.ok && hi.ok && !(lo.value < hi.value)) {
    return [{ path: 'diagram.wingLoading', message: `must be ascending, [low, high] (got ${JSON.stringify(range)})` }];
  }
  return [];
}

function designPointIssues(concept: ConceptJson): ConceptIssue[] {
  const point = concept.designPoint;
  if (!point) return [];
  const kind = concept.aircraft.propulsion.kind;
  const axis = loadingAxis(kind);
  const other = axis === 'powerToWeight' ? 'thrustToWeight' : 'powerToWeight';
  const example = axis === 'powerToWeight' ? '"9 W/N"' : '0.35';
  const drawnAs = axis === 'powerToWeight' ? 'power-to-weight' : 'thrust-to-weight';
  if (point[other] !== undefined) {
    return [{ path: `designPoint.${other}`, message: `a ${kind} concept is drawn as ${drawnAs}; give designPoint.${axis} (e.g. ${example}) instead` }];
  }
  if (point[axis] === undefined) {
    return [{ path: `designPoint.${axis}`, message: `is required: a ${kind} concept is drawn as ${drawnAs}, e.g. ${example}` }];
  }
  return [];
}

/** Problems that only show when fields are read together; empty when there are none. */
export function checkConcept(concept: ConceptJson): ConceptIssue[] {
  return [...aircraftIssues(concept), ...requirementIssues(concept), ...diagramIssues(concept), ...designPointIssues(concept)];
}
