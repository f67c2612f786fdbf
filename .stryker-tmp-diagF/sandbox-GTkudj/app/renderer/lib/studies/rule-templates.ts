/**
 * Requirements from published rules (core REQUIREMENT_TEMPLATES) for the
 * concept being worked on: which rules fit it, and the concept with one of
 * them added as an ordinary requirement that names its source and carries
 * the rule's note and the applicability note.
 */
// @ts-nocheck

import { REQUIREMENT_TEMPLATES, templateRequirement, type RequirementTemplate } from '../../../../core';
import { getIn, requirementsOf, type ConceptDocument, type Json } from '../concept/edit';

export interface RuleBook {
  /** "14 CFR Part 23". */
  title: string;
  templates: RuleChoice[];
}

export interface RuleChoice {
  template: RequirementTemplate;
  /** False when the rule is written for another engine count, or needs an engine out that the concept cannot lose. */
  fits: boolean;
  /** Why it does not fit; absent when it does. */
  why?: string;
}

/** The concept's engine count as written ([1] when absent or not a whole number). */
export function enginesOf(document: ConceptDocument): number {
  const engines = getIn(document, ['aircraft', 'propulsion', 'engines']);
  return typeof engines === 'number' && Number.isInteger(engines) && engines > 0 ? engines : 1;
}

function configurationsOf(document: ConceptDocument): string[] {
  const configurations = getIn(document, ['aircraft', 'aero', 'configurations']);
  const names = configurations && typeof configurations === 'object' && !Array.isArray(configurations) ? Object.keys(configurations) : [];
  return names.includes('clean') ? names : ['clean', ...names];
}

function bookOf(template: RequirementTemplate): string {
  if (template.source.startsWith('14 CFR 23.')) return '14 CFR Part 23';
  if (template.source.startsWith('14 CFR 25.')) return '14 CFR Part 25';
  if (template.source.startsWith('EASA CS 22.')) return 'EASA CS-22 (sailplanes)';
  return 'Other rules';
}

function fitOf(template: RequirementTemplate, engines: number): RuleChoice {
  const out = Number(template.requirement.enginesInoperative ?? 0);
  if (out >= engines) return { template, fits: false, why: `an engine-out rule; the concept has ${engines} engine${engines === 1 ? '' : 's'}` };
  if (template.engines !== undefined && template.engines !== engines) {
    return { template, fits: false, why: `written for ${template.engines} engines; the concept has ${engines}` };
  }
  return { template, fits: true };
}

/** Every template, grouped by rule book in the core's order, each marked whether it fits the concept. */
export function ruleBooks(document: ConceptDocument, templates: readonly RequirementTemplate[] = REQUIREMENT_TEMPLATES): RuleBook[] {
  const engines = enginesOf(document);
  const books: RuleBook[] = [];
  for (const template of templates) {
    const title = bookOf(template);
    let book = books.find((entry) => entry.title === title);
    if (!book) books.push((book = { title, templates: [] }));
    book.templates.push(fitOf(template, engines));
  }
  return books;
}

export type RuleInsertion = { ok: true; document: ConceptDocument; id: string; notes: string[] } | { ok: false; message: string };

/** The concept with the rule's requirement added at the end; a message instead when the rule cannot apply to it. */
export function insertRule(document: ConceptDocument, template: RequirementTemplate): RuleInsertion {
  const requirements = requirementsOf(document);
  const made = templateRequirement(template, {
    configurations: configurationsOf(document),
    requirementIds: requirements.map((requirement) => String(requirement.id)),
    engines: enginesOf(document),
  });
  if (!made.ok) return made;
  const note = [template.note, ...made.notes].join(' ');
  const requirement: { [key: string]: Json } = { ...made.requirement, source: template.source, note };
  return { ok: true, document: { ...document, requirements: [...requirements, requirement] }, id: String(made.requirement.id), notes: made.notes };
}
