/**
 * The diagram's scales: data -> scales -> drawing, second step. Domains,
 * d3 linear scales, ticks and axis titles for a plot area of a given size.
 */
// @ts-nocheck

import { scaleLinear, type ScaleLinear } from 'd3';
import type { ChartData } from './data';
import { isDefinedPoint } from './clip';
import { toDisplay } from '../../core/units/display';

export interface ChartMargin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

export interface ChartFrame {
  width: number;
  height: number;
  margin: ChartMargin;
}

export interface PlotArea {
  left: number;
  top: number;
  right: number;
  bottom: number;
  width: number;
  height: number;
}

export interface ChartScales {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  plot: PlotArea;
  xTicks: number[];
  yTicks: number[];
  formatX: (value: number) => string;
  formatY: (value: number) => string;
  xTitle: string;
  yTitle: string;
}

/** How far above the optimum's loading the plot reaches: enough to read the curves' shapes. */
export const LOADING_HEADROOM = 2.5;

/**
 * Top of the loading axis before rounding: LOADING_HEADROOM times the optimum's
 * loading (or the least loading the envelope reaches when nothing is feasible),
 * always above the design point and the lowest part of every curve. The steep
 * low-wing-loading ends of the curves never set it.
 */
export function loadingTop(data: ChartData): number {
  const envelopeValues = data.envelope.filter(isDefinedPoint).map(([, y]) => y).filter((y) => y > 0);
  const curveMinima = data.curves
    .map((curve) => curve.points.filter(isDefinedPoint).map(([, y]) => y))
    .filter((values) => values.length > 0)
    .map((values) => Math.min(...values));
  const base =
    data.optimum && data.optimum.loading > 0
      ? data.optimum.loading
      : envelopeValues.length > 0
        ? Math.min(...envelopeValues)
        : curveMinima.length > 0
          ? Math.max(...curveMinima)
          : 0;
  const candidates = [LOADING_HEADROOM * base, ...curveMinima.map((y) => 1.15 * y)];
  if (data.designPoint) candidates.push(1.2 * data.designPoint.loading);
  for (const overlay of data.overlays) if (overlay.optimum) candidates.push(1.2 * overlay.optimum.loading);
  const top = Math.max(...candidates.filter(Number.isFinite));
  if (top > 0) return top;
  return data.axis === 'thrustToWeight' ? 1 : fallbackPowerTop(data);
}

/** 20 W/N, a generous propeller loading, in the display unit. */
function fallbackPowerTop(data: ChartData): number {
  return toDisplay(20, 'powerToWeight', data.system);
}

export function chartDomains(data: ChartData): { x: [number, number]; y: [number, number] } {
  const [lo, hi] = data.wingLoadingRange;
  const y = scaleLinear().domain([0, loadingTop(data)]).nice(8).domain() as [number, number];
  return { x: [lo, hi], y };
}

export function plotArea(frame: ChartFrame): PlotArea {
  const { width, height, margin } = frame;
  const left = margin.left;
  const top = margin.top;
  const right = Math.max(left + 1, width - margin.right);
  const bottom = Math.max(top + 1, height - margin.bottom);
  return { left, top, right, bottom, width: right - left, height: bottom - top };
}

export function axisTitles(data: ChartData): { x: string; y: string } {
  const x = `Wing loading W/S [${data.units.wingLoading}]`;
  const y = data.axis === 'thrustToWeight' ? 'Thrust-to-weight T/W [–]' : `Power-to-weight P/W [${data.units.loading}]`;
  return { x, y };
}

export interface ScaleOptions {
  /** Pixels between vertical-axis ticks, roughly. */
  yTickSpacing?: number;
  /** A title for the vertical axis other than the data's own (e.g. power loading). */
  yTitle?: string;
}

/** Scales over given domains (the window's zoomed view); `chartScales` picks the domains from the data. */
export function scalesOver(data: ChartData, frame: ChartFrame, domains: { x: [number, number]; y: [number, number] }, options: ScaleOptions = {}): ChartScales {
  const plot = plotArea(frame);
  const x = scaleLinear().domain(domains.x).range([plot.left, plot.right]);
  const y = scaleLinear().domain(domains.y).range([plot.bottom, plot.top]);
  const xCount = Math.max(2, Math.round(plot.width / 90));
  const yCount = Math.max(2, Math.round(plot.height / (options.yTickSpacing ?? 55)));
  const titles = axisTitles(data);
  return {
    x,
    y,
    plot,
    xTicks: x.ticks(xCount),
    yTicks: y.ticks(yCount),
    formatX: x.tickFormat(xCount),
    formatY: y.tickFormat(yCount),
    xTitle: titles.x,
    yTitle: options.yTitle ?? titles.y,
  };
}

export function chartScales(data: ChartData, frame: ChartFrame): ChartScales {
  return scalesOver(data, frame, chartDomains(data));
}
