/**
 * The grid a probability map is computed on for drawing: exactly the
 * diagram's own domains (in SI), so the contours cover the whole plot and
 * line up with the boundaries drawn over them.
 */
// @ts-nocheck

import type { Evaluation } from '../../core/evaluation';
import type { ProbabilityGrid } from '../../core/studies/probability-grid';
import { fromDisplay, type UnitSystem } from '../../core/units/display';
import { chartData, type ChartDataOptions } from './data';
import { chartDomains } from './scales';

/** The diagram's wing-loading and loading domains as a grid of nx by ny points (SI). */
export function diagramGrid(evaluation: Evaluation, options: ChartDataOptions & { nx?: number; ny?: number } = {}): ProbabilityGrid {
  const system: UnitSystem = options.system ?? 'si';
  const domains = chartDomains(chartData(evaluation, options));
  const w1 = fromDisplay(domains.x[1], 'wingLoading', system);
  // The map needs a positive lower wing loading; a range that starts at 0 starts one part in a thousand above it.
  const w0 = Math.max(fromDisplay(domains.x[0], 'wingLoading', system), w1 / 1000);
  const y0 = fromDisplay(domains.y[0], evaluation.axis, system);
  const y1 = fromDisplay(domains.y[1], evaluation.axis, system);
  return { wingLoading: [w0, w1], loading: [y0, y1], nx: options.nx ?? 200, ny: options.ny ?? 160 };
}
