/**
 * The window's diagram geometry: the shared geometry (app/chart/geometry.ts)
 * at the window's size, in its own view, which may be zoomed or panned and,
 * for propeller aircraft, may show power loading W/P. Pure.
 */
// @ts-nocheck

import { diagramGeometry as chartGeometry, type Geometry } from '../../../chart/geometry';
import type { Domains } from '../../../chart/power-loading';
import type { ChartData } from '../../../chart';

export { defaultDomains, powerLoadingFactor, powerLoadingUnit, type Domains } from '../../../chart/power-loading';
export type { Geometry } from '../../../chart/geometry';

const DIAGRAM_MARGIN = { top: 14, right: 18, bottom: 48, left: 70 };

export function diagramGeometry(source: ChartData, size: { width: number; height: number }, view: Domains | null, askPowerLoading: boolean): Geometry {
  return chartGeometry(source, { ...size, margin: DIAGRAM_MARGIN }, { view, powerLoading: askPowerLoading, fontSize: 11, yTickSpacing: 50 });
}
