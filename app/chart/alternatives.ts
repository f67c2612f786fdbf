/**
 * Design alternatives drawn over the diagram: each other concept's feasible
 * region as an outline and its optimum, in a colour of its own, so several
 * alternatives can be read on one plot. Pure; the window, its SVG export and
 * the report draw them through the same marks.
 */
import type { Evaluation } from '../../core/evaluation';
import type { LoadingAxis } from '../../core/model';
import type { UnitSystem } from '../../core/units/display';
import { upperEnvelope } from './envelope';
import { optimumPoint } from './points';
import { boundarySeries } from './series';
import { columnsOf } from '../../core/diagram/curve-columns';
import type { AlternativeSeries, ChartData, MarkedPoint } from './series-types';

export type { AlternativeSeries };
import { ALTERNATIVE_INKS } from './palette';

/** The n-th alternative's ink; after the last, they repeat. */
export function alternativeColour(index: number): string {
  return ALTERNATIVE_INKS[index % ALTERNATIVE_INKS.length];
}

export function alternativeSeries(name: string, index: number, evaluation: Evaluation, axis: LoadingAxis, system: UnitSystem): AlternativeSeries {
  const colour = alternativeColour(index);
  if (evaluation.axis !== axis) return { name, colour, drawn: false, source: null, optimum: null };
  const { curves, limits } = boundarySeries(evaluation.boundaries, axis, system, new Set(), columnsOf(evaluation));
  let lo = Infinity;
  let hi = -Infinity;
  for (const curve of curves) {
    for (const [x] of curve.points) {
      if (!Number.isFinite(x)) continue;
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
  }
  const range: [number, number] = hi > lo ? [lo, hi] : [0, Math.max(...limits.map((limit) => limit.wingLoading), 1) * 1.25];
  const wingLoadingLimit = Math.min(...limits.map((limit) => limit.wingLoading), range[1]);
  const optimum = optimumPoint(evaluation, system);
  return {
    name,
    colour,
    drawn: true,
    source: { system, axis, curves, limits, envelope: upperEnvelope(curves, range), wingLoadingRange: range, wingLoadingLimit },
    optimum: optimum ? { wingLoading: optimum.wingLoading, loading: optimum.loading } : null,
  };
}
