/**
 * Requirement templates from published certification rules, confirmed rows
 * only (methods reference, section 8), each kept in its kind's descriptor.
 * Each is an ordinary concept-file requirement (loftpoint-concept/1 syntax,
 * values with units) that the engineer inserts and may edit; the rule stays
 * named in its label.
 */
// @ts-nocheck

import { REQUIREMENT_DESCRIPTORS, type TemplateRow } from '../requirements';

export const APPLICABILITY_NOTE =
  'Applicability depends on the certification basis: the applicable authority decides which rules apply, ' +
  'and the rule text governs. Preliminary sizing only; final numbers need licensed engineering review.';

/** A requirement as the concept file writes it. */
export type TemplateRequirement = Record<string, string | number | boolean>;

export interface RequirementTemplate {
  id: string;
  title: string;
  /** The rule and paragraph, e.g. "14 CFR 25.121(b)". */
  source: string;
  status: 'confirmed';
  note: string;
  /** Engine count the rule is written for; absent when it does not depend on it. */
  engines?: number;
  /** Configurations to use, first one the concept defines wins; absent: the kind's default. */
  configurations?: readonly string[];
  requirement: TemplateRequirement;
}

function toTemplate({ code: _code, ...row }: TemplateRow): RequirementTemplate {
  const label = `${row.source}: ${row.title}`;
  return {
    ...row,
    status: 'confirmed',
    note: `${row.note} ${APPLICABILITY_NOTE}`,
    requirement: { id: row.id, label, ...row.requirement },
  };
}

/** Every template, Part 23 first, then Part 25, then sailplanes. */
const CODES: readonly TemplateRow['code'][] = ['part-23', 'part-25', 'sailplane'];

/** Every template, Part 23 first, then Part 25, then sailplanes; within a code, kinds in registry order. */
export const REQUIREMENT_TEMPLATES: readonly RequirementTemplate[] = CODES.flatMap((code) =>
  REQUIREMENT_DESCRIPTORS.flatMap((d) => d.templates.filter((row) => row.code === code)),
).map(toTemplate);
