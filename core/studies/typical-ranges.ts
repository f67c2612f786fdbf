/**
 * Starting ranges for the assumptions, from the typical values of METHODS.md
 * sections 3, 5, 6 and 9, each with its source. They are offered, never
 * imposed: the engineer edits them.
 */
import type { Design, Requirement } from '../model';
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

interface Candidate {
  low: number;
  high: number;
  source: string;
}

const c = (low: number, high: number, source: string): Candidate => ({ low, high, source });

const OSWALD = c(0.7, 0.95, 'METHODS.md section 9: e 0.7-0.95 (common practice)');
const OSWALD_TAKEOFF = c(0.75, 0.8, 'METHODS.md section 3: take-off flaps e 0.75-0.80 (Roskam, Airplane Design I, Table 3.6, from memory)');
const OSWALD_LANDING = c(0.7, 0.75, 'METHODS.md section 3: landing flaps e 0.70-0.75 (Roskam, Airplane Design I, Table 3.6, from memory)');
const CLMAX_CLEAN = c(1.2, 1.5, 'METHODS.md section 9: clean CLmax 1.2-1.5 typical (common practice)');
const CLMAX_THIN = c(0.8, 1.2, 'METHODS.md section 9: clean CLmax from 0.8 for thin wings (common practice)');
const CLMAX_TAKEOFF = c(1.4, 2.2, 'METHODS.md section 9: take-off CLmax 1.4-2.2 (Roskam, Airplane Design I, Table 3.1, from memory)');
const CLMAX_LANDING = c(1.6, 2.8, 'METHODS.md section 9: landing CLmax 1.6-2.8 (Roskam, Airplane Design I, Table 3.1, from memory)');

const CANDIDATES: Record<string, (ref: FieldRef, design: Design) => Candidate[] | null> = {
  aspectRatio: () => [
    c(6, 8, 'METHODS.md section 9: aspect ratio 6-8 for general aviation (common practice)'),
    c(4, 5, 'METHODS.md section 9: aspect ratio 4-5 for deltas (common practice)'),
    c(9, 11, 'METHODS.md section 9: aspect ratio about 10 for transports, taken as 9-11 (common practice)'),
  ],
  cdLinear: () => null,
  lapseExponent: (_, design) =>
    design.aircraft.propulsion.kind === 'turbofan'
      ? [c(0.6, 1, 'METHODS.md section 5: turbofan lapse exponent 0.6-1 (common range)')]
      : [c(0.7, 0.9, 'METHODS.md section 5: turboprop lapse exponent 0.7-0.9 (common practice)')],
  cd0: (_, design) => {
    const classes = [
      c(0.025, 0.035, 'METHODS.md section 9: CD0 of light aircraft 0.025-0.035 (common practice)'),
      c(0.018, 0.025, 'METHODS.md section 9: CD0 of business jets 0.018-0.025 (common practice)'),
      c(0.015, 0.02, 'METHODS.md section 9: CD0 of transports 0.015-0.020 (common practice)'),
      c(0.03, 0.05, 'METHODS.md section 9: CD0 of small UAVs 0.03-0.05 (common practice)'),
      c(0.006, 0.012, 'METHODS.md section 9: CD0 of sailplanes 0.006-0.012 (common practice)'),
    ];
    // The class the propulsion suggests is tried first.
    const first = { turbofan: 1, electric: 3 }[design.aircraft.propulsion.kind as string] ?? 0;
    return [classes[first], ...classes.filter((_, i) => i !== first)];
  },
  cd0Increment: (ref) => {
    const name = (ref as { name: string }).name;
    if (kindOfConfiguration(name) === 'landing') {
      return [
        c(0.055, 0.075, 'METHODS.md section 3: landing flaps 0.055-0.075 (Roskam, Airplane Design I, Table 3.6, from memory)'),
        c(0.07, 0.1, 'METHODS.md section 3: landing flaps plus gear 0.055-0.075 + 0.015-0.025 (Roskam, Table 3.6, from memory)'),
      ];
    }
    if (kindOfConfiguration(name) === 'takeoff') {
      return [
        c(0.01, 0.02, 'METHODS.md section 3: take-off flaps 0.010-0.020 (Roskam, Airplane Design I, Table 3.6, from memory)'),
        c(0.025, 0.045, 'METHODS.md section 3: take-off flaps plus gear 0.010-0.020 + 0.015-0.025 (Roskam, Table 3.6, from memory)'),
      ];
    }
    return [c(0.003, 0.005, 'METHODS.md section 3: engine-out windmilling and trim 0.003-0.005 (common practice)')];
  },
  oswaldEfficiency: (ref) => {
    const kind = kindOfConfiguration((ref as { name: string }).name);
    if (kind === 'landing') return [OSWALD_LANDING, OSWALD];
    if (kind === 'takeoff') return [OSWALD_TAKEOFF, OSWALD];
    return [OSWALD];
  },
  clMax: (ref) => {
    const kind = kindOfConfiguration((ref as { name: string }).name);
    if (kind === 'landing') return [CLMAX_LANDING];
    if (kind === 'takeoff') return [CLMAX_TAKEOFF];
    return [CLMAX_CLEAN, CLMAX_THIN];
  },
  propellerEfficiency: (ref, design) => {
    const requirement = design.requirements.find((r) => r.id === (ref as { id: string }).id) as Requirement;
    if (requirement.kind === 'takeoff-ground-roll') return [c(0.5, 0.6, 'METHODS.md section 9: take-off run eta_p 0.5-0.6 (common practice)')];
    if (requirement.kind === 'cruise' || requirement.kind === 'sustained-turn') {
      return [c(0.75, 0.85, 'METHODS.md section 9: cruise eta_p about 0.8, taken as 0.75-0.85 (common practice)')];
    }
    return [c(0.7, 0.8, 'METHODS.md section 9: climb eta_p 0.7-0.8 (common practice)')];
  },
  rollingFriction: () => [
    c(0.02, 0.05, 'METHODS.md section 9: dry concrete or asphalt 0.02-0.05 (Brandt et al.; common practice)'),
    c(0.05, 0.1, 'METHODS.md section 9: short to long or wet grass 0.05-0.1 (Brandt et al.; common practice)'),
    c(0.1, 0.3, 'METHODS.md section 9: soft ground up to 0.3 (Brandt et al.; common practice)'),
  ],
  brakingFriction: () => [
    c(0.3, 0.5, 'METHODS.md section 9: dry runway 0.3-0.5 (Raymer, Table 17.1, from memory)'),
    c(0.15, 0.3, 'METHODS.md section 9: wet runway 0.15-0.3 (Raymer, Table 17.1, from memory)'),
  ],
  clGroundRun: () => [c(0.3, 0.8, 'METHODS.md section 6: ground-run CL 0.3-0.8 (common practice)')],
};

/** Configuration names read as the trade uses them: take-off-like, landing-like or other. */
function kindOfConfiguration(name: string): 'takeoff' | 'landing' | 'other' {
  const n = name.toLowerCase();
  if (n.includes('land') || n.includes('approach')) return 'landing';
  if (n.includes('takeoff') || n.includes('take-off') || n.includes('second-segment') || n.includes('climb')) return 'takeoff';
  return 'other';
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
  const candidates = CANDIDATES[found.ref.key](found.ref, design);
  if (!candidates || candidates.length === 0) return null;
  const nominal = nominalOf(found.ref, design);
  const containing = candidates.find((r) => r.low <= nominal && nominal <= r.high);
  if (containing) return { field, low: containing.low, high: containing.high, source: containing.source, widened: false };
  const distance = (r: Candidate) => Math.max(r.low - nominal, nominal - r.high);
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
