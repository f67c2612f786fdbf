/**
 * The window's diagram geometry: the shared geometry (app/chart/geometry.ts)
 * at the window's size, in its own view, which may be zoomed or panned and,
 * for propeller aircraft, may show power loading W/P. Pure.
 */
import { diagramGeometry as chartGeometry, type Geometry } from '../../../chart/geometry';
import type { Domains } from '../../../chart/power-loading';
import type { ChartData } from '../../../chart';
import { pointNotes } from '../../../chart/point-notes';

export { defaultDomains, powerLoadingFactor, powerLoadingUnit, type Domains } from '../../../chart/power-loading';
export type { Geometry } from '../../../chart/geometry';

const DIAGRAM_MARGIN = { top: 14, right: 18, bottom: 48, left: 70 };

/**
 * `labelPoints`: the optimum and the design point carry their notes, as in the
 * exported diagram; the design point's is left out while it is dragged (the
 * marker moves ahead of the evaluation).
 */
export function diagramGeometry(
  source: ChartData,
  size: { width: number; height: number },
  view: Domains | null,
  askPowerLoading: boolean,
  labelPoints: 'both' | 'optimum' | 'none' = 'both',
): Geometry {
  const notes =
    labelPoints === 'none'
      ? undefined
      : (plotted: ChartData, powerLoading: boolean) => pointNotes(plotted, powerLoading).filter((note) => labelPoints === 'both' || note.id === 'optimum');
  return chartGeometry(source, { ...size, margin: DIAGRAM_MARGIN }, { view, powerLoading: askPowerLoading, fontSize: 11, yTickSpacing: 50, ...(notes ? { notes } : {}) });
}
