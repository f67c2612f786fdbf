/**
 * The Ranges panel's rows: every assumption of the concept that may carry a
 * range (core `rangeableFields`), grouped as the Assumptions panel groups
 * them, with the concept's own value, the range the document gives it (if
 * any, and where in `uncertainty.parameters` it sits), and the published
 * typical range with its source.
 *
 * Every rangeable assumption is a plain number (a ratio, a coefficient, an
 * efficiency or a friction coefficient), so no unit conversion applies.
 */
// @ts-nocheck

import { rangeableFields, typicalRange, type Design, type Distribution, type TypicalRange } from '../../../../core';
import { REQUIREMENT_DESCRIPTORS } from '../../../../core/requirements';
import { fieldRef, nominalOf, type FieldRef } from '../../../../core/studies/uncertain-fields';
import { kindTitle } from '../../../chart';
import { plotName } from '../concept/names';

export interface RangeEntry {
  field: string;
  low: unknown;
  high: unknown;
  distribution: unknown;
}

export interface RangeRow {
  field: string;
  /** The assumption's name inside its group: "Oswald efficiency e". */
  title: string;
  /** The value the concept itself uses. */
  nominal: number;
  /** Index in `uncertainty.parameters`, or -1 when the document does not range it. */
  index: number;
  /** As written in the document (may be anything while the document has a problem). */
  low: unknown;
  high: unknown;
  distribution: Distribution;
  /** The published typical range and its source; null when none is published (K1). */
  typical: TypicalRange | null;
}

export interface RangeGroup {
  id: string;
  title: string;
  rows: RangeRow[];
}

const AIRCRAFT_TITLES = { aspectRatio: 'Aspect ratio', cdLinear: 'Linear drag term K1', lapseExponent: 'Lapse exponent m' } as const;
const CONFIGURATION_TITLES = {
  cd0: 'Zero-lift drag CD0',
  cd0Increment: 'CD0 increment',
  oswaldEfficiency: 'Oswald efficiency e',
  clMax: 'Maximum lift coefficient',
} as const;
/** A requirement's rangeable assumption as its kind's editor titles it. */
function requirementFieldTitle(key: string): string {
  if (key === 'propellerEfficiency') return 'Propeller efficiency';
  for (const d of REQUIREMENT_DESCRIPTORS) {
    const field = d.editorFields.find((f) => f.key === key);
    if (field) return field.title;
  }
  return key;
}

/** A configuration's name as the Assumptions panel shows it. */
function configurationTitle(name: string): string {
  return name === 'clean' ? 'Clean' : name === 'takeoff' ? 'Take-off flaps' : name === 'landing' ? 'Landing flaps' : name;
}

function titleOf(ref: FieldRef): string {
  if (ref.scope === 'aircraft') return AIRCRAFT_TITLES[ref.key];
  if (ref.scope === 'configuration') return CONFIGURATION_TITLES[ref.key];
  return requirementFieldTitle(ref.key);
}

function groupOf(ref: FieldRef, requirements: readonly Record<string, unknown>[]): { id: string; title: string } {
  if (ref.scope === 'aircraft') return { id: 'aircraft', title: ref.key === 'lapseExponent' ? 'Propulsion' : 'Aerodynamics' };
  if (ref.scope === 'configuration') return { id: `configuration:${ref.name}`, title: configurationTitle(ref.name) };
  const requirement = requirements.find((entry) => entry.id === ref.id);
  const name = requirement ? plotName(requirement) : ref.id;
  const kind = requirement ? kindTitle(String(requirement.kind)) : '';
  return { id: `requirement:${ref.id}`, title: kind && kind !== name ? `${name} · ${kind}` : name };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** The `uncertainty.parameters` entries of a document, whatever their state; [] when there are none. */
export function rangeEntries(document: Record<string, unknown>): RangeEntry[] {
  const block = document.uncertainty;
  const list = isRecord(block) ? block.parameters : undefined;
  if (!Array.isArray(list)) return [];
  return list.map((entry) =>
    isRecord(entry)
      ? { field: String(entry.field ?? ''), low: entry.low, high: entry.high, distribution: entry.distribution }
      : { field: '', low: undefined, high: undefined, distribution: undefined },
  );
}

/** The rows of the panel, grouped, in concept-file order. */
export function rangeGroups(design: Design, document: Record<string, unknown>): RangeGroup[] {
  const entries = rangeEntries(document);
  const requirements = Array.isArray(document.requirements) ? document.requirements.filter(isRecord) : [];
  const groups: RangeGroup[] = [];
  for (const field of rangeableFields(design)) {
    const found = fieldRef(field, design);
    if (!found.ok) continue;
    const index = entries.findIndex((entry) => entry.field === field);
    const entry = index >= 0 ? entries[index] : undefined;
    const row: RangeRow = {
      field,
      title: titleOf(found.ref),
      nominal: nominalOf(found.ref, design),
      index,
      low: entry?.low,
      high: entry?.high,
      distribution: entry?.distribution === 'triangular' ? 'triangular' : 'uniform',
      typical: typicalRange(field, design),
    };
    const { id, title } = groupOf(found.ref, requirements);
    const group = groups.find((existing) => existing.id === id);
    if (group) group.rows.push(row);
    else groups.push({ id, title, rows: [row] });
  }
  return groups;
}
