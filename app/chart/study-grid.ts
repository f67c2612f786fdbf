/**
 * The grid a probability map is computed on for drawing: exactly the
 * diagram's own domains (in SI), so the contours cover the whole plot and
 * line up with the boundaries drawn over them. Asked to, it also covers the
 * power-loading view (W/P = k / (P/W)), whose low W/P are high P/W: the same
 * rows, continued upward.
 */
import type { Evaluation } from '../../core/evaluation';
import { MOST_GRID_POINTS, type ProbabilityGrid } from '../../core/studies/probability-grid';
import { fromDisplay, type UnitSystem } from '../../core/units/display';
import { chartData, type ChartDataOptions } from './data';
import { defaultDomains, powerLoadingFactor } from './power-loading';
import { chartDomains } from './scales';

/** How near W/P = 0 the map reaches in the power-loading view: this share of the view's height. */
const POWER_LOADING_REACH = 1 / 40;

export interface DiagramGridOptions extends ChartDataOptions {
  nx?: number;
  ny?: number;
  /**
   * Also cover the default power-loading view of a propeller aircraft down to 1/40 of its height
   * above W/P = 0, with rows as far apart as in the diagram's own range (at most 2000 rows). Below
   * that the contours are drawn as at the map's last row (app/chart/study-geometry.ts).
   */
  powerLoading?: boolean;
}

/** The diagram's wing-loading and loading domains as a grid of nx by ny points (SI). */
export function diagramGrid(evaluation: Evaluation, options: DiagramGridOptions = {}): ProbabilityGrid {
  const system: UnitSystem = options.system ?? 'si';
  const data = chartData(evaluation, options);
  const domains = chartDomains(data);
  const w1 = fromDisplay(domains.x[1], 'wingLoading', system);
  // The map needs a positive lower wing loading; a range that starts at 0 starts one part in a thousand above it.
  const w0 = Math.max(fromDisplay(domains.x[0], 'wingLoading', system), w1 / 1000);
  const y0 = fromDisplay(domains.y[0], evaluation.axis, system);
  const y1 = fromDisplay(domains.y[1], evaluation.axis, system);
  const nx = options.nx ?? 200;
  const ny = options.ny ?? 160;
  if (!options.powerLoading || evaluation.axis !== 'powerToWeight') return { wingLoading: [w0, w1], loading: [y0, y1], nx, ny };
  const lowestShown = defaultDomains(data, true).y[1] * POWER_LOADING_REACH;
  const reach = fromDisplay(powerLoadingFactor(system) / lowestShown, evaluation.axis, system);
  const step = (y1 - y0) / (ny - 1);
  const rows = Math.min(MOST_GRID_POINTS, Math.ceil((reach - y0) / step) + 1);
  return rows > ny ? { wingLoading: [w0, w1], loading: [y0, y0 + (rows - 1) * step], nx, ny: rows } : { wingLoading: [w0, w1], loading: [y0, y1], nx, ny };
}
