/**
 * Starting ranges for the assumptions: the published bands of the one table
 * of typical ranges (core/assumptions/typical-ranges.ts, and each requirement
 * kind's own), each with its source. They are offered, never imposed: the
 * engineer edits them.
 */
import { configurationRole } from '../assumptions/configuration-role';
import type { Distribution } from './random';
import type { TypicalBand } from '../assumptions/typical-range';
import { AIRCRAFT_CLASS_WORDS, RUNWAY_SURFACE_WORDS, type AircraftClass, type RunwaySurface } from '../assumptions/study-case';
import { ASPECT_RATIO, CD0_CLEAN, CD0_INCREMENT, CLMAX, OSWALD, ROLLING_FRICTION } from '../assumptions/typical-ranges';
import type { Design, Requirement } from '../model';
import { propulsionKind } from '../propulsion/kinds';
import { requirementKind } from '../requirements';
import { fieldRef, nominalOf, rangeableFields, type FieldRef } from './uncertain-fields';
import { DEFAULT_SAMPLES, DEFAULT_SEED } from './uncertainty-schema';
import { messageNumber } from '../units/message-number';

export interface TypicalRange {
  field: string;
  low: number;
  high: number;
  source: string;
  /** True when the published range was widened to contain the concept's own value. */
  widened: boolean;
  /** Triangular with its peak at the concept's own value, so the studies weight it most. */
  distribution: 'triangular';
  /** Which published range was used and why, in words, ending with the peak. */
  basis: string;
}

const SOURCE_PREFIX = 'Loftpoint methods reference, section 9: ';

/** Band indexes of core/assumptions/typical-ranges.ts by case; absent: that case has no band of its own. */
const ASPECT_RATIO_BY_CLASS: Partial<Record<AircraftClass, number>> = { 'light-aircraft': 0, transport: 2 };
const CD0_BY_CLASS: Record<AircraftClass, number> = { 'light-aircraft': 0, 'business-jet': 1, transport: 2, 'small-uav': 3, sailplane: 4 };
const ROLLING_FRICTION_BY_SURFACE: Record<RunwaySurface, number> = { paved: 0, grass: 1, soft: 2 };

/** The published band the concept's stated case picks for this field, with the case in words; null: no case applies. */
function caseBand(ref: FieldRef, design: Design): { band: TypicalBand; why: string } | null {
  const cls = design.aircraft.class;
  if (cls && ref.key === 'aspectRatio') {
    const i = ASPECT_RATIO_BY_CLASS[cls];
    return i === undefined ? null : { band: ASPECT_RATIO.bands[i] as TypicalBand, why: `aircraft class ${AIRCRAFT_CLASS_WORDS[cls]}` };
  }
  if (cls && ref.key === 'cd0') return { band: CD0_CLEAN.bands[CD0_BY_CLASS[cls]] as TypicalBand, why: `aircraft class ${AIRCRAFT_CLASS_WORDS[cls]}` };
  if (ref.scope === 'requirement' && ref.key === 'rollingFriction') {
    const requirement = design.requirements.find((r) => r.id === ref.id);
    const surface = requirement && 'runwaySurface' in requirement ? requirement.runwaySurface : undefined;
    if (surface) return { band: ROLLING_FRICTION.bands[ROLLING_FRICTION_BY_SURFACE[surface]] as TypicalBand, why: `runway surface ${RUNWAY_SURFACE_WORDS[surface]}` };
  }
  return null;
}

/** The published bands for one rangeable field of a design, most likely first; empty: none published. */
function typicalBands(ref: FieldRef, design: Design): readonly TypicalBand[] {
  switch (ref.key) {
    case 'aspectRatio':
      return ASPECT_RATIO.bands;
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
  // The aircraft's cdLinear: no published range.
  if (ref.scope !== 'requirement') return [];
  const requirement = design.requirements.find((r) => r.id === ref.id) as Requirement;
  const descriptor = requirementKind(requirement.kind);
  if (ref.key === 'propellerEfficiency') return descriptor.propeller?.typical.bands ?? [];
  return descriptor.typicalRanges.find((entry) => entry.key === ref.key)?.range.bands ?? [];
}


/**
 * The published range for this field of this design, and why: the band the
 * concept's stated case picks (aircraft class, runway surface), else the
 * first band that holds the concept's value, else the nearest band; widened
 * to contain the concept's value when it lies outside. The studies draw from
 * it triangularly, peaking at the concept's value (core/methods.md, section
 * 9). Null for a valid field with no published range (cdLinear) or a field
 * the design does not have.
 */
export function typicalRange(field: string, design: Design): TypicalRange | null {
  const found = fieldRef(field, design);
  if (!found.ok) return null;
  const bands = typicalBands(found.ref, design);
  if (bands.length === 0) return null;
  const nominal = nominalOf(found.ref, design);
  const byCase = caseBand(found.ref, design);
  const containing = bands.find((r) => r.low <= nominal && nominal <= r.high);
  const distance = (r: TypicalBand) => Math.max(r.low - nominal, nominal - r.high);
  const chosen = byCase?.band ?? containing ?? bands.reduce((best, r) => (distance(r) < distance(best) ? r : best));
  const why = byCase ? `${byCase.why}: ${chosen.source}` : containing ? `the band holding the concept's value: ${chosen.source}` : `no band holds the concept's value; nearest: ${chosen.source}`;
  const low = Math.min(chosen.low, nominal);
  const high = Math.max(chosen.high, nominal);
  const widened = low < chosen.low || high > chosen.high;
  const basis = `${why}${widened ? `, widened to ${messageNumber(low)}-${messageNumber(high)} to contain the concept's value` : ''}; triangular, peaking at the concept's ${messageNumber(nominal)}`;
  return { field, low, high, source: `${SOURCE_PREFIX}${chosen.source}`, widened, distribution: 'triangular', basis };
}

/**
 * An `uncertainty` block ranging every assumption of the design that has a
 * published typical range, triangular over it with the peak at the
 * concept's own value: a starting point to edit.
 */
export function typicalUncertainty(design: Design, options: { seed?: number; samples?: number } = {}) {
  const parameters = rangeableFields(design)
    .map((field) => typicalRange(field, design))
    .filter((range): range is TypicalRange => range !== null)
    .map(({ field, low, high, distribution }) => ({ field, low, high, distribution: distribution as Distribution }));
  return { seed: options.seed ?? DEFAULT_SEED, samples: options.samples ?? DEFAULT_SAMPLES, parameters };
}
