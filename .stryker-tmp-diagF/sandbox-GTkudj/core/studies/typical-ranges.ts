/**
 * Starting ranges for the assumptions: the published bands of the one table
 * of typical ranges (core/assumptions/typical-ranges.ts, and each requirement
 * kind's own), each with its source. They are offered, never imposed: the
 * engineer edits them.
 */
// @ts-nocheck

import { configurationRole } from '../assumptions/configuration-role';
import type { TypicalBand } from '../assumptions/typical-range';
import { ASPECT_RATIO, CD0_CLEAN, CD0_INCREMENT, CLMAX, OSWALD } from '../assumptions/typical-ranges';
import type { Design, Requirement } from '../model';
import { propulsionKind } from '../propulsion/kinds';
import { requirementKind } from '../requirements';
import { fieldRef, nominalOf, rangeableFields, type FieldRef } from './uncertain-fields';
import { DEFAULT_SAMPLES, DEFAULT_SEED } from './uncertainty-schema';

export interface TypicalRange {
  field: string;
  low: number;
  high: number;
  source: string;
  /** True when the published range was widened to contain the concept's own value. */
  widened: boolean;
}

const SOURCE_PREFIX = 'Loftpoint methods reference, section 9: ';

/** The published bands for one rangeable field of a design, most likely first; empty: none published. */
function typicalBands(ref: FieldRef, design: Design): readonly TypicalBand[] {
  switch (ref.key) {
    case 'aspectRatio':
      return ASPECT_RATIO.bands;
    case 'cdLinear':
      return [];
    case 'lapseExponent':
      return propulsionKind(design.aircraft.propulsion.kind).lapseExponent?.typical.bands ?? [];
    case 'cd0': {
      // The class the propulsion suggests is tried first.
      const first = propulsionKind(design.aircraft.propulsion.kind).cd0Band;
      return [CD0_CLEAN.bands[first], ...CD0_CLEAN.bands.filter((_, i) => i !== first)];
    }
  }
  if (ref.scope === 'configuration') {
    const role = configurationRole(ref.name);
    if (ref.key === 'cd0Increment') return CD0_INCREMENT[role].bands;
    if (ref.key === 'oswaldEfficiency') return OSWALD[role].bands;
    return CLMAX[role]?.bands ?? CLMAX.clean?.bands ?? [];
  }
  if (ref.scope !== 'requirement') return [];
  const requirement = design.requirements.find((r) => r.id === ref.id) as Requirement;
  const descriptor = requirementKind(requirement.kind);
  if (ref.key === 'propellerEfficiency') return descriptor.propeller?.typical.bands ?? [];
  return descriptor.typicalRanges.find((entry) => entry.key === ref.key)?.range.bands ?? [];
}

/**
 * The published range for this field of this design: the first candidate
 * that contains the concept's value, else the nearest one widened to contain
 * it. Null for a valid field with no published range (cdLinear) or a field
 * the design does not have.
 */
export function typicalRange(field: string, design: Design): TypicalRange | null {
  const found = fieldRef(field, design);
  if (!found.ok) return null;
  const candidates = typicalBands(found.ref, design).map((b) => ({ ...b, source: `${SOURCE_PREFIX}${b.source}` }));
  if (candidates.length === 0) return null;
  const nominal = nominalOf(found.ref, design);
  const containing = candidates.find((r) => r.low <= nominal && nominal <= r.high);
  if (containing) return { field, low: containing.low, high: containing.high, source: containing.source, widened: false };
  const distance = (r: TypicalBand) => Math.max(r.low - nominal, nominal - r.high);
  const nearest = candidates.reduce((best, r) => (distance(r) < distance(best) ? r : best));
  return { field, low: Math.min(nearest.low, nominal), high: Math.max(nearest.high, nominal), source: nearest.source, widened: true };
}

/**
 * An `uncertainty` block ranging every assumption of the design that has a
 * published typical range, uniform over it: a starting point to edit.
 */
export function typicalUncertainty(design: Design, options: { seed?: number; samples?: number } = {}) {
  const parameters = rangeableFields(design)
    .map((field) => typicalRange(field, design))
    .filter((range): range is TypicalRange => range !== null)
    .map(({ field, low, high }) => ({ field, low, high, distribution: 'uniform' as const }));
  return { seed: options.seed ?? DEFAULT_SEED, samples: options.samples ?? DEFAULT_SAMPLES, parameters };
}
