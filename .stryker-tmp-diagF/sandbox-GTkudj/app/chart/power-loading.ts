/**
 * The power-loading view of a propeller aircraft's diagram: W/P (the inverse
 * of P/W) on the vertical axis, feasible below the curves. The same view in
 * the window, its export, the command line's SVG and the report.
 */
// @ts-nocheck

import { scaleLinear } from 'd3';
import { chartDomains } from './scales';
import type { ChartData } from './series-types';

export interface Domains {
  x: [number, number];
  y: [number, number];
}

/** Power loading W/P per displayed P/W: N/kW from W/N, lb/hp from hp/lb. */
export function powerLoadingFactor(system: 'si' | 'us' | 'kt-ft'): number {
  return system === 'us' ? 1 : 1000;
}

export function powerLoadingUnit(system: 'si' | 'us' | 'kt-ft'): string {
  return system === 'us' ? 'lb/hp' : 'N/kW';
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
