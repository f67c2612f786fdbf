/**
 * The optimum and the design point of an evaluation, in display units;
 * null when the evaluation has none or its numbers are not finite.
 */
// @ts-nocheck

import type { Evaluation } from '../../core/evaluation';
import type { LoadingAxis } from '../../core/model';
import { toDisplay, type UnitSystem } from '../../core/units/display';
import type { ChartData } from './series-types';

function axisValue(point: { powerToWeight?: number; thrustToWeight?: number }, axis: LoadingAxis): number | undefined {
  const value = point[axis];
  return typeof value === 'number' && Number.isFinite(value) ? value : undefined;
}

export function optimumPoint(evaluation: Evaluation, system: UnitSystem): ChartData['optimum'] {
  const optimum = evaluation.optimum;
  if (!optimum) return null;
  const loading = axisValue(optimum, evaluation.axis);
  if (loading === undefined || !Number.isFinite(optimum.wingLoading)) return null;
  return {
    wingLoading: toDisplay(optimum.wingLoading, 'wingLoading', system),
    loading: toDisplay(loading, evaluation.axis, system),
    unbounded: optimum.unbounded === true,
    active: [...optimum.active],
  };
}

export function designPointOf(evaluation: Evaluation, system: UnitSystem): ChartData['designPoint'] {
  const point = evaluation.designPoint;
  if (!point) return null;
  const loading = axisValue(point, evaluation.axis);
  if (loading === undefined || !Number.isFinite(point.wingLoading)) return null;
  return {
    wingLoading: toDisplay(point.wingLoading, 'wingLoading', system),
    loading: toDisplay(loading, evaluation.axis, system),
    feasible: point.feasible,
  };
}
