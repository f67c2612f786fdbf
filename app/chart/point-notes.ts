/**
 * The notes written beside the optimum and the design point: their names and
 * where they are, in the plotted quantity. The exported diagram and the
 * window place them with the boundary labels (labels.ts).
 */
import type { ChartData } from './series-types';
import type { PointNote } from './labels';
import { CHART_INKS } from './palette';
import { formatDisplayed } from './text';

/** Notes beside the optimum and the design point, in the plotted quantity. */
export function pointNotes(data: ChartData, powerLoading: boolean): PointNote[] {
  const loading = (value: number) =>
    data.axis === 'thrustToWeight'
      ? `T/W ${formatDisplayed(value, 'thrustToWeight', data.system)}`
      : powerLoading
        ? `W/P ${value.toFixed(1)} ${data.units.loading}`
        : formatDisplayed(value, 'powerToWeight', data.system);
  const notes: PointNote[] = [];
  if (data.optimum) {
    notes.push({
      id: 'optimum',
      lines: [
        data.optimum.unbounded ? 'Optimum (at the end of the range)' : 'Optimum',
        `${formatDisplayed(data.optimum.wingLoading, 'wingLoading', data.system)} · ${loading(data.optimum.loading)}`,
      ],
      colour: CHART_INKS.optimum,
      at: data.optimum,
    });
  }
  if (data.designPoint) {
    notes.push({
      id: 'design-point',
      lines: [
        data.designPoint.feasible ? 'Design point' : 'Design point: not feasible',
        `${formatDisplayed(data.designPoint.wingLoading, 'wingLoading', data.system)} · ${loading(data.designPoint.loading)}`,
      ],
      colour: CHART_INKS.designPoint,
      at: data.designPoint,
    });
  }
  return notes;
}
