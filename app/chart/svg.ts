/**
 * The constraint diagram as a standalone SVG document: data -> scales ->
 * drawing, with markup built as strings (no browser). Every piece of user
 * text is escaped; the result is well-formed XML.
 */
import type { Evaluation } from '../../core/evaluation';
import { SIZING_CAUTION } from './caution';
import { chartData, type ChartData, type ChartDataOptions } from './data';
import { placeLabels, type Labels, type PointNote } from './labels';
import { legendRows, type LegendRow } from './legend';
import { CHART_INKS } from './palette';
import { chartScales, type ChartScales } from './scales';
import { LEGEND_WIDTH, legend } from './svg-legend';
import { labelText, leader } from './svg-labels';
import { n } from './svg-number';
import { axes, curvePath, grid, limitLine, markers, nothingFeasible, overlays, region } from './svg-plot';
import { escapeXml, formatDisplayed, shorten } from './text';

export interface SvgOptions extends ChartDataOptions {
  width?: number;
  height?: number;
  /** Extra layers, e.g. boundary bands and probability contours; without them the output is the plain diagram. */
  layers?: SvgLayers;
}

/** Markup drawn into the diagram at fixed depths, given the diagram's data, scales and placed labels. */
export interface SvgLayers {
  /** Inside the plot's clip, above the feasible region and below the boundaries. */
  behind?: (data: ChartData, scales: ChartScales) => string;
  /** Inside the plot's clip, above the boundaries. */
  above?: (data: ChartData, scales: ChartScales) => string;
  /** Outside the clip, after every label; may steer clear of the labels already placed. */
  top?: (data: ChartData, scales: ChartScales, labels: Labels) => string;
  /** Rows added at the end of the legend. */
  legend?: (data: ChartData) => LegendRow[];
  /** Replaces the line under the title. */
  subtitle?: string;
}

const FONT = "'Inter', 'Segoe UI', 'Helvetica Neue', Arial, sans-serif";

/** A complete SVG document (XML declaration included) of the evaluation's constraint diagram. */
export function constraintDiagramSvg(evaluation: Evaluation, options: SvgOptions = {}): string {
  const width = options.width ?? 1040;
  const height = options.height ?? 700;
  const data = chartData(evaluation, options);
  const scales = chartScales(data, {
    width,
    height,
    margin: { top: 74, right: LEGEND_WIDTH + 24, bottom: 96, left: 82 },
  });
  const notes = pointNotes(data);
  const labels = placeLabels(data, scales, { fontSize: 12, notes });
  const title = data.title.trim() || 'Untitled concept';
  const layers = options.layers ?? {};
  const parts = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${escapeXml(FONT)}" font-size="12">`,
    `<title>${escapeXml(`${title} — constraint diagram`)}</title>`,
    `<desc>${escapeXml(SIZING_CAUTION)}</desc>`,
    `<defs><clipPath id="plot-area"><rect x="${n(scales.plot.left)}" y="${n(scales.plot.top)}" width="${n(scales.plot.width)}" height="${n(scales.plot.height)}"/></clipPath></defs>`,
    `<rect width="${width}" height="${height}" fill="${CHART_INKS.background}"/>`,
    heading(title, data, scales, layers.subtitle),
    grid(scales),
    `<g clip-path="url(#plot-area)">`,
    overlays(data, scales),
    region(data, scales),
    layers.behind?.(data, scales) ?? '',
    ...data.limits.map((limit) => limitLine(limit, scales)),
    ...data.curves.map((curve) => curvePath(curve, scales)),
    layers.above?.(data, scales) ?? '',
    `</g>`,
    axes(scales),
    markers(data, scales),
    nothingFeasible(data, scales),
    ...labels.notes.map((label) => leader(label, notes, scales)),
    ...labels.notes.map((label) => labelText(label, 'note')),
    ...labels.boundaries.filter((label) => label.onPlot).map((label) => labelText(label, 'boundary')),
    layers.top?.(data, scales, labels) ?? '',
    legend([...legendRows(data), ...(layers.legend?.(data) ?? [])], scales, width),
    `<text x="${width / 2}" y="${height - 16}" text-anchor="middle" font-size="12" font-weight="600" fill="${CHART_INKS.caution}">${escapeXml(SIZING_CAUTION)}</text>`,
    `</svg>`,
  ];
  return `${parts.filter((part) => part !== '').join('\n')}\n`;
}

function heading(title: string, data: ChartData, scales: ChartScales, given?: string): string {
  const what = data.axis === 'thrustToWeight' ? 'thrust-to-weight' : 'power-to-weight';
  const units = data.system === 'us' ? 'US customary units' : 'SI units';
  const subtitle = given ?? `Constraint diagram: ${what} against wing loading · sea-level rated, take-off weight · ${units}`;
  return [
    `<text x="${scales.plot.left}" y="30" font-size="18" font-weight="700" fill="${CHART_INKS.text}">${escapeXml(shorten(title, 80))}</text>`,
    `<text x="${scales.plot.left}" y="50" font-size="12" fill="${CHART_INKS.mutedText}">${escapeXml(subtitle)}</text>`,
  ].join('\n');
}

function pointNotes(data: ChartData): PointNote[] {
  const loading = (value: number) =>
    data.axis === 'thrustToWeight'
      ? `T/W ${formatDisplayed(value, 'thrustToWeight', data.system)}`
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
