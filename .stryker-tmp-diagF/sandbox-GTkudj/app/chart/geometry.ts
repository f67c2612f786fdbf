/**
 * The diagram's geometry for one frame and view: the chart data as plotted
 * (inverted for the power-loading view), its scales, the boundary, region and
 * overlay paths in pixels and the placed labels. The window (any size, zoomed
 * or panned) and the SVG writer both draw from it. Pure.
 */
// @ts-nocheck

import { line } from 'd3';
import { clipToBand, type XY } from './clip';
import { placeLabels, type Labels, type PointNote } from './labels';
import { defaultDomains, inverted, powerLoadingFactor, showsPowerLoading, type Domains } from './power-loading';
import { feasibleRegion } from './region';
import { scalesOver, type ChartFrame, type ChartScales } from './scales';
import type { ChartData } from './series-types';

export interface Geometry {
  /** The data as plotted (inverted for W/P). */
  data: ChartData;
  scales: ChartScales;
  powerLoading: boolean;
  curvePaths: Array<{ id: string; d: string }>;
  regionPaths: string[];
  overlayPaths: Array<{ id: string; d: string }>;
  labels: Labels;
  /** The notes placed beside marked points (empty unless asked for). */
  notes: PointNote[];
  /** Font size of the words on the plot, px. */
  fontSize: number;
}

export interface GeometryOptions {
  /** The zoomed or panned view; none: the whole diagram. */
  view?: Domains | null;
  /** W/P on the vertical axis when the aircraft has propellers. */
  powerLoading?: boolean;
  fontSize?: number;
  /** Pixels between vertical-axis ticks, roughly. */
  yTickSpacing?: number;
  /** Notes beside the optimum and the design point, made from the plotted data. */
  notes?: (plotted: ChartData, powerLoading: boolean) => PointNote[];
}

const f = (v: number) => (Math.round(v * 10) / 10).toString();

function runsPath(points: ReadonlyArray<readonly [number, number | null]>, scales: ChartScales): string {
  const [lo, hi] = scales.y.domain();
  const span = hi - lo;
  // Clip a little beyond the view so lines leave the plot cleanly instead of stopping at its edge.
  const runs = clipToBand(points, lo - span, hi + span);
  const joined: Array<XY | null> = runs.flatMap((run, i) => (i === 0 ? run : [null, ...run]));
  return (
    line<XY | null>()
      .defined((d) => d !== null)
      .x((d) => scales.x((d as XY)[0]))
      .y((d) => scales.y((d as XY)[1]))
      .digits(1)(joined) ?? ''
  );
}

function polygonPath(polygon: XY[], scales: ChartScales): string {
  return polygon.length > 2 ? `M${polygon.map(([x, y]) => `${f(scales.x(x))},${f(scales.y(y))}`).join('L')}Z` : '';
}

/** Feasible polygons in the plotted quantity: above the curves for P/W or T/W, below them for W/P. */
function region(source: ChartData, powerLoading: boolean, domains: Domains): XY[][] {
  if (!powerLoading) return feasibleRegion(source, Math.max(domains.y[1], 0));
  const k = powerLoadingFactor(source.system);
  // The W/P region reaches down to W/P = 0, which is P/W without bound: a very tall P/W band.
  const bottom = Math.max(domains.y[0], 0);
  const top = bottom > 0 ? k / bottom : 1e12;
  return feasibleRegion(source, top).map((polygon) => polygon.map(([x, y]): XY => [x, y > 0 ? Math.max(k / y, bottom) : bottom]));
}

export function diagramGeometry(source: ChartData, frame: ChartFrame, options: GeometryOptions = {}): Geometry {
  const powerLoading = showsPowerLoading(source, options.powerLoading ?? false);
  const data = powerLoading ? inverted(source) : source;
  const domains = options.view ?? defaultDomains(source, powerLoading);
  const fontSize = options.fontSize ?? 11;
  const scales = scalesOver(data, frame, domains, {
    ...(options.yTickSpacing ? { yTickSpacing: options.yTickSpacing } : {}),
    ...(powerLoading ? { yTitle: `Power loading W/P [${data.units.loading}]` } : {}),
  });
  const notes = options.notes?.(data, powerLoading) ?? [];
  return {
    data,
    scales,
    powerLoading,
    curvePaths: data.curves.map((curve) => ({ id: curve.id, d: runsPath(curve.points, scales) })),
    regionPaths: region(source, powerLoading, domains).map((polygon) => polygonPath(polygon, scales)).filter((d) => d !== ''),
    overlayPaths: data.overlays.flatMap((overlay) => overlay.curves.map((curve) => ({ id: `${overlay.name}:${curve.id}`, d: runsPath(curve.points, scales) }))),
    labels: placeLabels(data, scales, { fontSize, notes }),
    notes,
    fontSize,
  };
}
