/**
 * The optional top-level `uncertainty` block of a concept file
 * (`loftpoint-concept/1`, a backward-compatible addition) and its resolution
 * against the resolved Design into ranged assumptions.
 *
 *   "uncertainty": {
 *     "seed": 20261202,            whole number 0..4294967295 [1]
 *     "samples": 10000,            whole number 100..1000000 [10000]
 *     "parameters": [              [none]
 *       { "field": "aircraft.aero.configurations.clean.oswaldEfficiency",
 *         "low": 0.72, "high": 0.88, "distribution": "triangular" }
 *     ]
 *   }
 *
 * `field` is a concept-file path; requirements are addressed by id
 * (`requirements.cruise.propellerEfficiency`). The nominal value is the
 * concept's own; low <= nominal <= high with low < high. A triangular
 * distribution peaks at the nominal value; uniform is the default.
 */
import * as z from 'zod';
import type { Design } from '../model';
import type { Distribution } from './random';
import { boundsOf, fieldRef, labelOf, nominalOf, type PhysicalBounds } from './uncertain-fields';
import { affectedRequirements, assigner, targetConfigurations, workingCopy } from './uncertain-apply';

export const DEFAULT_SEED = 1;
export const DEFAULT_SAMPLES = 10000;

const rangedValueSchema = z.strictObject({
  field: z.string({ error: 'must be a concept-file path such as "aircraft.aero.aspectRatio"' }).min(1),
  low: z.number({ error: 'must be a number' }),
  high: z.number({ error: 'must be a number' }),
  distribution: z.enum(['uniform', 'triangular'], { error: 'must be "uniform" or "triangular"' }).default('uniform'),
});

export const uncertaintySchema = z.strictObject({
  seed: z
    .int({ error: 'must be a whole number from 0 to 4294967295' })
    .min(0, { error: 'must be 0 or more' })
    .max(4294967295, { error: 'must be at most 4294967295' })
    .default(DEFAULT_SEED),
  samples: z
    .int({ error: 'must be a whole number of samples, e.g. 10000' })
    .min(100, { error: 'must be at least 100 for a usable probability' })
    .max(1_000_000, { error: 'must be at most 1000000' })
    .default(DEFAULT_SAMPLES),
  parameters: z.array(rangedValueSchema).default([]),
});

/** The block as written (defaults filled in). */
export type UncertaintyBlock = z.output<typeof uncertaintySchema>;

/** One assumption with its range, ready for the studies. */
export interface UncertainParameter {
  /** Concept-file path, e.g. `aircraft.aero.configurations.clean.clMax`. */
  field: string;
  label: string;
  low: number;
  nominal: number;
  high: number;
  distribution: Distribution;
  /** A new Design with this assumption set to `value`; the input is not changed. */
  apply: (design: Design, value: number) => Design;
  /**
   * Optional fast path for many values at once: writes the value into a copy
   * made by `workingCopy` that the caller owns. Same result as `apply`.
   */
  assign?: (working: Design, value: number) => void;
  /** Ids of requirements whose boundary it can move; absent means any. */
  requirementIds?: readonly string[];
}

export interface UncertaintyIssue {
  path: string;
  message: string;
}

export type ResolvedUncertainty =
  | { ok: true; seed: number; samples: number; parameters: UncertainParameter[] }
  | { ok: false; issues: UncertaintyIssue[] };

/**
 * Validate a block (unknown JSON) and resolve it against the design. Paths in
 * issues start with `uncertainty.`. Pass the concept JSON as `concept` so that
 * a configuration that inherits clean's e or CLmax is recognised as such.
 */
export function resolveUncertainty(input: unknown, design: Design, concept?: unknown): ResolvedUncertainty {
  const parsed = uncertaintySchema.safeParse(input ?? {});
  if (!parsed.success) {
    return { ok: false, issues: parsed.error.issues.map((issue) => ({ path: pathOf(['uncertainty', ...issue.path]), message: issue.message })) };
  }
  const block = parsed.data;
  const issues: UncertaintyIssue[] = [];
  const parameters: UncertainParameter[] = [];
  const seen = new Set<string>();
  block.parameters.forEach((entry, i) => {
    const at = `uncertainty.parameters[${i}]`;
    const found = fieldRef(entry.field, design);
    if (!found.ok) return void issues.push({ path: `${at}.field`, message: `${entry.field}: ${found.message}` });
    if (seen.has(entry.field)) return void issues.push({ path: `${at}.field`, message: `${entry.field} is ranged twice; keep one entry` });
    seen.add(entry.field);
    const nominal = nominalOf(found.ref, design);
    const problem = rangeProblem(entry.low, nominal, entry.high, boundsOf(found.ref));
    if (problem) return void issues.push({ path: `${at}.${problem.end}`, message: `${entry.field}: ${problem.message}` });
    const targets = targetConfigurations(found.ref, design, concept);
    const assign = assigner(found.ref, targets);
    parameters.push({
      field: entry.field,
      label: labelOf(found.ref),
      low: entry.low,
      nominal: Math.min(Math.max(nominal, entry.low), entry.high),
      high: entry.high,
      distribution: entry.distribution,
      apply: (d, value) => {
        const working = workingCopy(d);
        assign(working, value);
        return working;
      },
      assign,
      requirementIds: affectedRequirements(found.ref, design, targets),
    });
  });
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, seed: block.seed, samples: block.samples, parameters };
}

function rangeProblem(
  low: number,
  nominal: number,
  high: number,
  bounds: PhysicalBounds,
): { end: 'low' | 'high'; message: string } | null {
  const shown = (x: number) => Number(x.toPrecision(6));
  if (bounds.openMin ? low <= bounds.min : low < bounds.min) {
    return { end: 'low', message: `low ${low} is outside the physical range (must be ${bounds.openMin ? 'above' : 'at least'} ${bounds.min})` };
  }
  if (bounds.openMax ? high >= bounds.max : high > bounds.max) {
    return { end: 'high', message: `high ${high} is outside the physical range (must be ${bounds.openMax ? 'below' : 'at most'} ${bounds.max})` };
  }
  // The nominal of an increment is a difference of two resolved values, so allow for rounding.
  const tolerance = 1e-9 * Math.max(1, Math.abs(nominal));
  if (low > nominal + tolerance) return { end: 'low', message: `low ${low} is above the concept's value ${shown(nominal)}; the range must contain it` };
  if (high < nominal - tolerance) return { end: 'high', message: `high ${high} is below the concept's value ${shown(nominal)}; the range must contain it` };
  if (!(low < high)) return { end: 'high', message: `high ${high} must be greater than low ${low}` };
  return null;
}

function pathOf(parts: readonly PropertyKey[]): string {
  return parts.reduce<string>((path, part) => (typeof part === 'number' ? `${path}[${part}]` : `${path}.${String(part)}`), '').slice(1);
}
