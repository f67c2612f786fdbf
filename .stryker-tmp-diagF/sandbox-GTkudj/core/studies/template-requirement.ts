/**
 * A template made into a requirement for one concept: an id the concept does
 * not use yet, and the configuration the rule means where the concept
 * defines it.
 */
// @ts-nocheck

import type { RequirementTemplate, TemplateRequirement } from './templates';

export interface TemplateTarget {
  /** Configuration names the concept defines (always including clean). */
  configurations: readonly string[];
  /** Ids its requirements already use. */
  requirementIds: readonly string[];
  engines: number;
}

export type TemplateInsertion =
  | { ok: true; requirement: TemplateRequirement; notes: string[] }
  | { ok: false; message: string };

export function templateRequirement(template: RequirementTemplate, target: TemplateTarget): TemplateInsertion {
  const inoperative = Number(template.requirement.enginesInoperative ?? 0);
  if (inoperative >= target.engines) {
    return {
      ok: false,
      message: `${template.source} is an engine-out rule; the concept has ${target.engines} engine${target.engines === 1 ? '' : 's'} (aircraft.propulsion.engines)`,
    };
  }
  const notes: string[] = [];
  if (template.engines !== undefined && template.engines !== target.engines && template.source.includes('25.121')) {
    notes.push(`This row of ${template.source} is for ${template.engines} engines; the concept has ${target.engines}.`);
  }
  const requirement: TemplateRequirement = { ...template.requirement, id: freeId(String(template.requirement.id), target.requirementIds) };
  if (template.configurations) {
    const chosen = template.configurations.find((name) => target.configurations.includes(name));
    if (chosen) requirement.configuration = chosen;
    else {
      notes.push(
        `The rule means the ${template.configurations[0]} configuration, which the concept does not define; ` +
          `define aircraft.aero.configurations.${template.configurations[0]} and set this requirement's configuration to it.`,
      );
    }
  }
  return { ok: true, requirement, notes };
}

function freeId(base: string, taken: readonly string[]): string {
  if (!taken.includes(base)) return base;
  let n = 2;
  while (taken.includes(`${base}-${n}`)) n++;
  return `${base}-${n}`;
}
