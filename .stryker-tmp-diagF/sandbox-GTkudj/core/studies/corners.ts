/**
 * Which combinations of range ends a band is drawn over, and applying a set
 * of values to a design.
 */
// @ts-nocheck

import type { Design } from '../model';
import { workingCopy } from './uncertain-apply';
import type { UncertainParameter } from './uncertainty-schema';

/** Up to this many assumptions, every corner of the box (2^k designs) is used. */
export const MAX_CORNER_PARAMETERS = 8;

export type CornerMethod = 'corners' | 'one-at-a-time';

/**
 * Value sets to evaluate, each listing one value per parameter: every corner
 * when there are at most 8 parameters; otherwise each parameter at each end
 * with the others nominal, plus all-low and all-high. The nominal set is
 * always first.
 */
export function cornerValues(parameters: readonly UncertainParameter[]): { method: CornerMethod; sets: number[][] } {
  const nominal = parameters.map((p) => p.nominal);
  const k = parameters.length;
  if (k === 0) return { method: 'corners', sets: [nominal] };
  if (k <= MAX_CORNER_PARAMETERS) {
    const sets = [nominal];
    for (let mask = 0; mask < 1 << k; mask++) sets.push(parameters.map((p, i) => (mask & (1 << i) ? p.high : p.low)));
    return { method: 'corners', sets };
  }
  const sets = [nominal, parameters.map((p) => p.low), parameters.map((p) => p.high)];
  parameters.forEach((_, i) => {
    for (const end of ['low', 'high'] as const) sets.push(parameters.map((p, j) => (j === i ? p[end] : p.nominal)));
  });
  return { method: 'one-at-a-time', sets };
}

/** The design with each parameter set to its value, in order; the input is not changed. */
export function applyValues(design: Design, parameters: readonly UncertainParameter[], values: ArrayLike<number>): Design {
  if (parameters.every((p) => p.assign)) {
    const working = workingCopy(design);
    for (let i = 0; i < parameters.length; i++) (parameters[i].assign as NonNullable<UncertainParameter['assign']>)(working, values[i]);
    return working;
  }
  let varied = design;
  for (let i = 0; i < parameters.length; i++) varied = parameters[i].apply(varied, values[i]);
  return varied;
}

/** The parameters that can move this requirement's boundary. */
export function parametersAffecting(parameters: readonly UncertainParameter[], requirementId: string): UncertainParameter[] {
  return parameters.filter((p) => !p.requirementIds || p.requirementIds.includes(requirementId));
}
