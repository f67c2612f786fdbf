/**
 * The window's diagram geometry: the shared chart data (app/chart) seen
 * through the window's own view, which may be zoomed or panned and, for
 * propeller aircraft, may show power loading W/P (the inverse of P/W) on the
 * vertical axis. Pure: data in, scales, paths and labels out.
 */
import { line, scaleLinear } from 'd3';
import {
  chartDomains,
  clipToBand,
  feasibleRegion,
  placeLabels,
  scalesOver,
  type ChartData,
  type ChartFrame,
  type ChartScales,
  type Labels,
  type XY,
} from '../../../chart';

export interface Domains {
  x: [number, number];
  y: [number, number];
}

/** Power loading W/P per displayed P/W: N/kW from W/N, lb/hp from hp/lb. */
export function powerLoadingFactor(system: 'si' | 'us'): number {
  return system === 'si' ? 1000 : 1;
}

export function powerLoadingUnit(system: 'si' | 'us'): string {
  return system === 'si' ? 'N/kW' : 'lb/hp';
}

/** True when the vertical axis shows W/P: asked for, and the aircraft has propellers. */
export function showsPowerLoading(data: ChartData, asked: boolean): boolean {
  return asked && data.axis === 'powerToWeight';
}

const invert = (k: number) => (y: number | null): number | null => (y === null || !(y > 0) ? null : k / y);

/** The chart data with every loading replaced by its inverse, for the power-loading view. */
export function inverted(data: ChartData): ChartData {
  const k = powerLoadingFactor(data.system);
  const flip = invert(k);
  const point = <T extends { loading: number }>(p: T | null): T | null => (p && p.loading > 0 ? { ...p, loading: k / p.loading } : null);
  return {
    ...data,
    units: { ...data.units, loading: powerLoadingUnit(data.system) },
    curves: data.curves.map((curve) => ({ ...curve, points: curve.points.map(([x, y]) => [x, flip(y)] as [number, number | null]) })),
    boundaries: data.boundaries.map((series) =>
      series.type === 'curve' ? { ...series, points: series.points.map(([x, y]) => [x, flip(y)] as [number, number | null]) } : series,
    ),
    optimum: point(data.optimum),
    designPoint: point(data.designPoint),
    envelope: data.envelope.map(([x, y]) => [x, flip(y)] as [number, number | null]),
    overlays: data.overlays.map((overlay) => ({
      ...overlay,
      curves: overlay.curves.map((curve) => ({ ...curve, points: curve.points.map(([x, y]) => [x, flip(y)] as [number, number | null]) })),
      optimum: point(overlay.optimum),
    })),
  };
}

/** The view shown before any zoom: the shared chart's domains, or for W/P a range that shows the feasible side. */
export function defaultDomains(data: ChartData, powerLoading: boolean): Domains {
  const base = chartDomains(data);
  if (!powerLoading) return base;
  const k = powerLoadingFactor(data.system);
  const flipped = inverted(data);
  const candidates: number[] = [];
  if (flipped.optimum) candidates.push(1.6 * flipped.optimum.loading);
  if (flipped.designPoint) candidates.push(1.25 * flipped.designPoint.loading);
  if (candidates.length === 0) candidates.push(k / Math.max(base.y[1] / 5, 1e-9));
  const top = Math.max(...candidates.filter(Number.isFinite));
  const y = scaleLinear().domain([0, top > 0 ? top : 1]).nice(8).domain() as [number, number];
  return { x: base.x, y };
}

export interface Geometry {
  /** The data as plotted (inverted for W/P). */
  data: ChartData;
  scales: ChartScales;
  powerLoading: boolean;
  curvePaths: Array<{ id: string; d: string }>;
  regionPaths: string[];
  overlayPaths: Array<{ id: string; d: string }>;
  labels: Labels;
}

export const DIAGRAM_MARGIN = { top: 14, right: 18, bottom: 48, left: 70 };

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
  return polygon.length > 2 ? `M${polygon.map(([x, y]) => `${scales.x(x).toFixed(1)},${scales.y(y).toFixed(1)}`).join('L')}Z` : '';
}

/** Feasible polygons in the plotted quantity: above the curves for P/W or T/W, below them for W/P. */
function region(source: ChartData, plotted: ChartData, powerLoading: boolean, domains: Domains): XY[][] {
  if (!powerLoading) return feasibleRegion(source, Math.max(domains.y[1], 0));
  const k = powerLoadingFactor(source.system);
  // The W/P region reaches down to W/P = 0, which is P/W without bound: a very tall P/W band.
  const bottom = Math.max(domains.y[0], 0);
  const top = bottom > 0 ? k / bottom : 1e12;
  return feasibleRegion(source, top).map((polygon) => polygon.map(([x, y]): XY => [x, y > 0 ? Math.max(k / y, bottom) : bottom]));
}

export function scalesFor(data: ChartData, frame: ChartFrame, domains: Domains): ChartScales {
  const powerLoading = data.units.loading === powerLoadingUnit(data.system) && data.axis === 'powerToWeight';
  return scalesOver(data, frame, domains, { yTickSpacing: 50, ...(powerLoading ? { yTitle: `Power loading W/P [${data.units.loading}]` } : {}) });
}

export function diagramGeometry(source: ChartData, size: { width: number; height: number }, view: Domains | null, askPowerLoading: boolean): Geometry {
  const powerLoading = showsPowerLoading(source, askPowerLoading);
  const data = powerLoading ? inverted(source) : source;
  const domains = view ?? defaultDomains(source, powerLoading);
  const scales = scalesFor(data, { width: size.width, height: size.height, margin: DIAGRAM_MARGIN }, domains);
  return {
    data,
    scales,
    powerLoading,
    curvePaths: data.curves.map((curve) => ({ id: curve.id, d: runsPath(curve.points, scales) })),
    regionPaths: region(source, data, powerLoading, domains).map((polygon) => polygonPath(polygon, scales)),
    overlayPaths: data.overlays.flatMap((overlay) => overlay.curves.map((curve) => ({ id: `${overlay.name}:${curve.id}`, d: runsPath(curve.points, scales) }))),
    labels: placeLabels(data, scales, { fontSize: 11 }),
  };
}
