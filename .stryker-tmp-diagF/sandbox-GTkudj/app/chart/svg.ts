/**
 * The constraint diagram as a standalone SVG document: data -> scales ->
 * drawing, with markup built as strings (no browser). Every piece of user
 * text is escaped; the result is well-formed XML.
 */
// @ts-nocheck

import type { Evaluation } from '../../core/evaluation';
import { SIZING_CAUTION } from './caution';
import { chartData, type ChartData, type ChartDataOptions } from './data';
import { diagramGeometry, type Geometry } from './geometry';
import type { PointNote } from './labels';
import { legendRows, type LegendRow } from './legend';
import { markSvg, marksSvg } from './markup';
import { diagramMarks } from './marks';
import { CHART_INKS } from './palette';
import type { Domains } from './power-loading';
import type { ChartScales } from './scales';
import { LEGEND_WIDTH, legend } from './svg-legend';
import { n } from './svg-number';
import { escapeXml, formatDisplayed, shorten } from './text';

export interface SvgOptions extends ChartDataOptions {
  width?: number;
  height?: number;
  /** Power loading W/P on the vertical axis (propeller aircraft only), as the window may show it. */
  powerLoading?: boolean;
  /** The window's zoomed or panned view, display units; none: the whole diagram. */
  view?: Domains | null;
  /** Extra layers, e.g. boundary bands and probability contours; without them the output is the plain diagram. */
  layers?: SvgLayers;
}

/** Markup drawn into the diagram at fixed depths, given its geometry (data as plotted, scales, placed labels). */
export interface SvgLayers {
  /** Inside the plot's clip, above the feasible region and below the boundaries. */
  behind?: (geometry: Geometry) => string;
  /** Inside the plot's clip, above the boundaries. */
  above?: (geometry: Geometry) => string;
  /** Outside the clip, after every label; may steer clear of the labels already placed. */
  top?: (geometry: Geometry) => string;
  /** Rows added at the end of the legend. */
  legend?: (data: ChartData) => LegendRow[];
  /** Replaces the line under the title. */
  subtitle?: string;
}

const FONT = "'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif";

/**
 * A complete SVG document (XML declaration included) of the evaluation's
 * constraint diagram: the marks the window draws (app/chart/marks.ts), framed
 * by a title, a legend, notes beside the optimum and the design point, and
 * the caution.
 */
export function constraintDiagramSvg(evaluation: Evaluation, options: SvgOptions = {}): string {
  const width = options.width ?? 1040;
  const height = options.height ?? 700;
  const source = chartData(evaluation, options);
  const geometry = diagramGeometry(
    source,
    { width, height, margin: { top: 74, right: LEGEND_WIDTH + 24, bottom: 96, left: 82 } },
    { view: options.view ?? null, powerLoading: options.powerLoading ?? false, fontSize: 12, notes: pointNotes },
  );
  const { data, scales } = geometry;
  const marks = diagramMarks(geometry);
  const title = data.title.trim() || 'Untitled concept';
  const layers = options.layers ?? {};
  const point = marks.designPoint;
  const parts = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${escapeXml(FONT)}" font-size="12">`,
    `<title>${escapeXml(`${title} — constraint diagram`)}</title>`,
    `<desc>${escapeXml(SIZING_CAUTION)}</desc>`,
    `<defs><clipPath id="plot-area"><rect x="${n(scales.plot.left)}" y="${n(scales.plot.top)}" width="${n(scales.plot.width)}" height="${n(scales.plot.height)}"/></clipPath></defs>`,
    `<rect width="${width}" height="${height}" fill="${CHART_INKS.background}"/>`,
    heading(title, data, scales, geometry.powerLoading, layers.subtitle),
    marksSvg(marks.grid),
    `<g clip-path="url(#plot-area)">`,
    marksSvg(marks.behind),
    layers.behind?.(geometry) ?? '',
    marksSvg(marks.boundaries),
    layers.above?.(geometry) ?? '',
    marksSvg(marks.markers),
    `</g>`,
    marksSvg(marks.axes),
    nothingFeasible(data, scales),
    marksSvg(marks.labels),
    layers.top?.(geometry) ?? '',
    point ? `<g transform="translate(${point.x} ${point.y})">${markSvg(point.mark)}</g>` : '',
    legend([...legendRows(data, geometry.powerLoading), ...(layers.legend?.(data) ?? [])], scales, width),
    `<text x="${width / 2}" y="${height - 16}" text-anchor="middle" font-size="12" font-weight="600" fill="${CHART_INKS.caution}">${escapeXml(SIZING_CAUTION)}</text>`,
    `</svg>`,
  ];
  return `${parts.filter((part) => part !== '').join('\n')}\n`;
}

function nothingFeasible(data: ChartData, scales: ChartScales): string {
  if (data.optimum) return '';
  const { plot } = scales;
  return `<text x="${n(plot.left + plot.width / 2)}" y="${n(plot.top + 26)}" text-anchor="middle" font-size="14" font-weight="600" fill="${CHART_INKS.designPoint}">Nothing on the diagram meets every requirement</text>`;
}

function heading(title: string, data: ChartData, scales: ChartScales, powerLoading: boolean, given?: string): string {
  const what = data.axis === 'thrustToWeight' ? 'thrust-to-weight' : powerLoading ? 'power loading W/P' : 'power-to-weight';
  const units = data.system === 'us' ? 'US customary units' : data.system === 'kt-ft' ? 'knots and feet, SI for mass, area, force and power' : 'SI units';
  const subtitle = given ?? `Constraint diagram: ${what} against wing loading · sea-level rated, take-off weight · ${units}`;
  return [
    `<text x="${scales.plot.left}" y="30" font-size="18" font-weight="700" fill="${CHART_INKS.text}">${escapeXml(shorten(title, 80))}</text>`,
    `<text x="${scales.plot.left}" y="50" font-size="12" fill="${CHART_INKS.mutedText}">${escapeXml(subtitle)}</text>`,
  ].join('\n');
}

/** Notes beside the optimum and the design point, in the plotted quantity. */
function pointNotes(data: ChartData, powerLoading: boolean): PointNote[] {
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
