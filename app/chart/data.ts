/**
 * The diagram's data: an evaluation (SI) turned into plot series in display
 * units. First step of data -> scales -> drawing; no DOM, no Node, so the
 * designer window and the SVG writer draw from the same model.
 */
import type { Evaluation } from '../../core/evaluation';
import type { LoadingAxis } from '../../core/model';
import { displayUnit, toDisplay, type UnitSystem } from '../../core/units/display';
import { upperEnvelope } from './envelope';
import { designPointOf, optimumPoint } from './points';
import { boundarySeries, overlaySeries } from './series';
import { columnsOf } from '../../core/diagram/curve-columns';
import { alternativeSeries } from './alternatives';
import type { ChartData, CurveSeries, LimitSeries } from './series-types';

export { upperEnvelope } from './envelope';
export { PLOT_LABEL_CHARS } from './series';

export type { BoundarySeries, ChartData, CurveSeries, LimitSeries, MarkedPoint, OverlaySeries, SeriesCommon } from './series-types';

export interface ChartDataOptions {
  system?: UnitSystem;
  /** Concept name shown as the diagram's title. */
  title?: string;
  /** Other evaluations drawn faintly behind this one, e.g. an earlier version. */
  overlays?: ReadonlyArray<{ name: string; evaluation: Evaluation }>;
  /** Design alternatives (other concepts) whose region outline and optimum are drawn over this one, each in its own colour. */
  alternatives?: ReadonlyArray<{ name: string; evaluation: Evaluation }>;
}

export function chartData(evaluation: Evaluation, options: ChartDataOptions = {}): ChartData {
  const system = options.system ?? 'si';
  const axis = evaluation.axis;
  const active = new Set(evaluation.optimum?.active ?? []);
  const { curves, limits, boundaries } = boundarySeries(evaluation.boundaries, axis, system, active, columnsOf(evaluation));
  const wingLoadingRange = evaluatedRange(curves, limits, evaluation, system);
  const tightest = Math.min(...limits.map((limit) => limit.wingLoading), wingLoadingRange[1]);
  return {
    title: options.title ?? '',
    system,
    axis,
    units: { wingLoading: displayUnit('wingLoading', system).unit, loading: displayUnit(axis, system).unit },
    curves,
    limits,
    boundaries,
    optimum: optimumPoint(evaluation, system),
    designPoint: designPointOf(evaluation, system),
    wingLoadingRange,
    wingLoadingLimit: tightest,
    envelope: upperEnvelope(curves, wingLoadingRange),
    overlays: (options.overlays ?? []).map(({ name, evaluation: other }) => overlaySeries(name, other, axis, system)),
    alternatives: (options.alternatives ?? []).map(({ name, evaluation: other }, index) => alternativeSeries(name, index, other, axis, system)),
  };
}

/** The sampled wing-loading range; with no curves, a range that shows the limits and points. */
function evaluatedRange(curves: CurveSeries[], limits: LimitSeries[], evaluation: Evaluation, system: UnitSystem): [number, number] {
  // A loop, not Math.min(...xs): 25 curves of 5,000 samples are more arguments than the call stack holds.
  let lo = Infinity;
  let hi = -Infinity;
  for (const curve of curves) {
    for (const [x] of curve.points) {
      if (!Number.isFinite(x)) continue;
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
  }
  if (hi > lo) return [lo, hi];
  const siMarks = [evaluation.optimum?.wingLoading, evaluation.designPoint?.wingLoading]
    .filter((w): w is number => w !== undefined)
    .map((w) => toDisplay(w, 'wingLoading', system));
  const marks = [...limits.map((limit) => limit.wingLoading), ...siMarks].filter((w) => Number.isFinite(w) && w > 0);
  const top = marks.length > 0 ? Math.max(...marks) * 1.25 : toDisplay(2000, 'wingLoading', system);
  return [0, top];
}
