/**
 * Requirement templates from published certification rules: the confirmed
 * rows of METHODS.md section 8 only. Each is an ordinary concept-file
 * requirement (loftpoint-concept/1 syntax, values with units) that the
 * engineer inserts and may edit; the rule stays named in its label.
 */

import { PART_23_ROWS, SAILPLANE_ROWS } from './template-rows-part23';
import { PART_25_ROWS } from './template-rows-part25';

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

/** A rule as written in the tables, before the label and note are completed. */
export interface TemplateRow {
  id: string;
  title: string;
  source: string;
  note: string;
  engines?: number;
  configurations?: readonly string[];
  requirement: TemplateRequirement;
}

function toTemplate(row: TemplateRow): RequirementTemplate {
  const label = `${row.source}: ${row.title}`;
  return {
    ...row,
    status: 'confirmed',
    note: `${row.note} ${APPLICABILITY_NOTE}`,
    requirement: { id: row.id, label, ...row.requirement },
  };
}

/** Every template, Part 23 first, then Part 25, then sailplanes. */
export const REQUIREMENT_TEMPLATES: readonly RequirementTemplate[] = [...PART_23_ROWS, ...PART_25_ROWS, ...SAILPLANE_ROWS].map(toTemplate);
