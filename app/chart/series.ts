/**
 * Evaluation boundaries as plot series: display units, a label for the plot,
 * the kind's colour (a dash pattern for a second boundary of the same kind)
 * and whether each binds at the optimum.
 */
import type { BoundaryJson, Evaluation } from '../../core/evaluation';
import type { LoadingAxis } from '../../core/model';
import { toDisplay, type UnitSystem } from '../../core/units/display';
import type { BoundarySeries, CurveSeries, LimitSeries, OverlaySeries, SeriesCommon } from './series-types';
import { optimumPoint } from './points';
import { drawnColumnIndices, drawnIndices } from './drawn-samples';
import { columnsOf, type CurveColumns } from '../../core/diagram/curve-columns';
import { kindColour, kindDash, kindShade, kindTitle } from './palette';

/** Labels longer than this are written in the legend; the plot shows the id. */
export const PLOT_LABEL_CHARS = 26;

/** One column's drawn samples in display units, null where it is NaN. */
function columnSeries(ws: Float64Array, column: Float64Array, drawn: readonly number[] | undefined, axis: LoadingAxis, system: UnitSystem): CurveSeries['points'] {
  const count = drawn ? drawn.length : column.length;
  const out: CurveSeries['points'] = [];
  for (let k = 0; k < count; k++) {
    const i = drawn ? drawn[k] : k;
    if (i >= column.length) continue;
    const y = column[i];
    out.push([toDisplay(ws[i], 'wingLoading', system), y === y ? toDisplay(y, axis, system) : null]);
  }
  return out;
}

export function boundarySeries(
  boundaries: readonly BoundaryJson[],
  axis: LoadingAxis,
  system: UnitSystem,
  active: ReadonlySet<string>,
  /** The engine's columns of these boundaries, when known: the curves are read from them, not from their points. */
  columns?: CurveColumns,
): { curves: CurveSeries[]; limits: LimitSeries[]; boundaries: BoundarySeries[] } {
  const seenPerKind = new Map<string, number>();
  const curves: CurveSeries[] = [];
  const limits: LimitSeries[] = [];
  const ordered: BoundarySeries[] = [];
  const fromColumns = columns !== undefined && columns.curves.length === boundaries.filter((b) => 'points' in b).length ? columns : undefined;
  const drawn = fromColumns ? drawnColumnIndices(fromColumns.curves) : drawnIndices(boundaries);
  let curveIndex = 0;
  for (const boundary of boundaries) {
    const nth = seenPerKind.get(boundary.kind) ?? 0;
    seenPerKind.set(boundary.kind, nth + 1);
    const label = boundary.label?.trim() ? boundary.label.trim() : boundary.id;
    const common: SeriesCommon = {
      id: boundary.id,
      kind: boundary.kind,
      label,
      plotLabel: [...label].length <= PLOT_LABEL_CHARS ? label : boundary.id,
      kindTitle: kindTitle(boundary.kind),
      colour: kindShade(kindColour(boundary.kind), nth),
      dash: kindDash(nth),
      binding: active.has(boundary.id),
    };
    if ('wingLoadingMax' in boundary) {
      if (Number.isFinite(boundary.wingLoadingMax)) {
        const limit: LimitSeries = { ...common, type: 'limit', wingLoading: toDisplay(boundary.wingLoadingMax, 'wingLoading', system) };
        limits.push(limit);
        ordered.push(limit);
      }
    } else {
      const column = fromColumns?.curves[curveIndex++];
      const curve: CurveSeries = {
        ...common,
        type: 'curve',
        points:
          fromColumns && column
            ? columnSeries(fromColumns.wingLoadingsPa, column, drawn, axis, system)
            : (drawn ? drawn.flatMap((i) => (i < boundary.points.length ? [boundary.points[i]] : [])) : boundary.points).map(([w, y]) => [
                toDisplay(w, 'wingLoading', system),
                y === null || !Number.isFinite(y) ? null : toDisplay(y, axis, system),
              ]),
      };
      curves.push(curve);
      ordered.push(curve);
      // A requirement that cannot be flown past a wing loading (a turn that stalls) shows that line as a limit.
      if (boundary.stallLimit !== undefined && Number.isFinite(boundary.stallLimit)) {
        const stall: LimitSeries = {
          ...common,
          id: `${boundary.id}-stall`,
          label: `${label}: stalls beyond`,
          plotLabel: `${common.plotLabel} stall`,
          type: 'limit',
          wingLoading: toDisplay(boundary.stallLimit, 'wingLoading', system),
        };
        limits.push(stall);
        ordered.push(stall);
      }
    }
  }
  return { curves, limits, boundaries: ordered };
}

export function overlaySeries(name: string, evaluation: Evaluation, axis: LoadingAxis, system: UnitSystem): OverlaySeries {
  // An overlay on the other axis cannot share the plot; show nothing rather than mixing quantities.
  if (evaluation.axis !== axis) return { name, curves: [], limits: [], optimum: null };
  const { curves, limits } = boundarySeries(evaluation.boundaries, axis, system, new Set(), columnsOf(evaluation));
  const optimum = optimumPoint(evaluation, system);
  return { name, curves, limits, optimum: optimum ? { wingLoading: optimum.wingLoading, loading: optimum.loading } : null };
}
