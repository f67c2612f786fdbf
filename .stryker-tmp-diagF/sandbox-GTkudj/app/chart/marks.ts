/**
 * The constraint diagram as a list of marks: every line, shape and word of
 * the plot as a plain description (an SVG tag, its attributes, its text).
 * The one drawing of the diagram: the window renders these marks as Svelte
 * elements (app/renderer/lib/diagram/Marks.svelte) and the SVG writer as
 * markup (markup.ts), so markers, the power-loading view, overlays and labels
 * are the same wherever the diagram appears. Pure.
 */
// @ts-nocheck

import type { Geometry } from './geometry';
import type { LabelPlacement } from './labels';
import { CHART_INKS } from './palette';
import type { CurveSeries, LimitSeries } from './series-types';

export type MarkTag = 'g' | 'path' | 'line' | 'circle' | 'rect' | 'text' | 'tspan' | 'title' | 'defs' | 'clipPath';

/** What a mark stands for; written as data-role, so tests and readers can count the diagram's parts. */
export type MarkRole =
  | 'grid'
  | 'frame'
  | 'ticks'
  | 'axis-title'
  | 'region'
  | 'overlay'
  | 'overlay-optimum'
  | 'limit'
  | 'curve'
  | 'curve-end'
  | 'optimum'
  | 'design-point'
  | 'label'
  | 'note'
  | 'leader'
  | 'band'
  | 'contour'
  | 'contour-label'
  | 'part';

export interface Mark {
  tag: MarkTag;
  role: MarkRole;
  attrs: Readonly<Record<string, string | number>>;
  text?: string;
  children?: readonly Mark[];
}

/** The diagram's marks by depth; the plot's clip holds `behind`, the study layers, `boundaries` and `markers`. */
export interface DiagramMarks {
  grid: Mark[];
  /** Older versions' boundaries and the feasible region. */
  behind: Mark[];
  /** Limits, curves and the open circle where a curve stops. */
  boundaries: Mark[];
  /** The older versions' optima and the optimum. */
  markers: Mark[];
  axes: Mark[];
  /** Boundary labels on the plot, then notes beside the marked points with their leaders. */
  labels: Mark[];
  /** The design point's mark drawn around (0, 0), and where it goes in pixels. */
  designPoint: { mark: Mark; x: number; y: number } | null;
}

/** Pixels with at most two decimals. */
export const px = (value: number): number => Math.round(value * 100) / 100;

const part = (tag: MarkTag, attrs: Mark['attrs'], text?: string): Mark => ({ tag, role: 'part', attrs, ...(text !== undefined ? { text } : {}) });

/** A diamond of half-diagonal `r` around (x, y). */
function diamond(x: number, y: number, r: number): string {
  return `M${px(x)},${px(y - r)}L${px(x + r)},${px(y)}L${px(x)},${px(y + r)}L${px(x - r)},${px(y)}Z`;
}

/** The optimum: a filled diamond with a white edge. */
function optimumMark(x: number, y: number, title?: string): Mark {
  return {
    tag: 'path',
    role: 'optimum',
    attrs: { d: diamond(x, y, 7), fill: CHART_INKS.optimum, stroke: '#ffffff', 'stroke-width': 1.5 },
    ...(title ? { children: [part('title', {}, title)] } : {}),
  };
}

/** An older version's optimum: the same diamond, open, in the overlay ink. */
function overlayOptimumMark(x: number, y: number): Mark {
  return { tag: 'path', role: 'overlay-optimum', attrs: { d: diamond(x, y, 6), fill: 'none', stroke: CHART_INKS.overlay, 'stroke-width': 1.4 } };
}

/** The design point around (0, 0): a white ring with a dot; the ring is dashed when the point misses a requirement. */
export function designPointMark(feasible: boolean): Mark {
  const ink = CHART_INKS.designPoint;
  return {
    tag: 'g',
    role: 'design-point',
    attrs: {},
    children: [
      { tag: 'circle', role: 'part', attrs: { class: 'ring', r: 7, fill: '#ffffff', stroke: ink, 'stroke-width': 2.5, ...(feasible ? {} : { 'stroke-dasharray': '3 2' }) } },
      { tag: 'circle', role: 'part', attrs: { class: 'dot', r: 2.2, fill: ink } },
    ],
  };
}

function gridMarks({ scales }: Geometry): Mark[] {
  const { plot } = scales;
  const lines = [
    ...scales.xTicks.map((t) => part('line', { x1: px(scales.x(t)), y1: px(plot.top), x2: px(scales.x(t)), y2: px(plot.bottom) })),
    ...scales.yTicks.map((t) => part('line', { x1: px(plot.left), y1: px(scales.y(t)), x2: px(plot.right), y2: px(scales.y(t)) })),
  ];
  return [{ tag: 'g', role: 'grid', attrs: { stroke: CHART_INKS.grid, 'stroke-width': 1 }, children: lines }];
}

function axisMarks({ scales, fontSize }: Geometry): Mark[] {
  const { plot } = scales;
  const ink = CHART_INKS.axis;
  const words = { stroke: 'none', fill: ink, 'font-size': fontSize };
  const x = scales.xTicks.flatMap((t) => [
    part('line', { x1: px(scales.x(t)), y1: px(plot.bottom), x2: px(scales.x(t)), y2: px(plot.bottom + 5) }),
    part('text', { x: px(scales.x(t)), y: px(plot.bottom + fontSize + 7), 'text-anchor': 'middle', ...words }, scales.formatX(t)),
  ]);
  const y = scales.yTicks.flatMap((t) => [
    part('line', { x1: px(plot.left - 5), y1: px(scales.y(t)), x2: px(plot.left), y2: px(scales.y(t)) }),
    part('text', { x: px(plot.left - 8), y: px(scales.y(t) + 4), 'text-anchor': 'end', ...words }, scales.formatY(t)),
  ]);
  const ticks = { stroke: ink, 'stroke-width': 1, 'font-variant-numeric': 'tabular-nums' };
  const title = { 'text-anchor': 'middle', 'font-size': fontSize + 1, 'font-weight': 600, fill: CHART_INKS.text };
  const yMid = plot.top + plot.height / 2;
  return [
    { tag: 'rect', role: 'frame', attrs: { x: px(plot.left), y: px(plot.top), width: px(plot.width), height: px(plot.height), fill: 'none', stroke: CHART_INKS.plotFrame, 'stroke-width': 1 } },
    { tag: 'g', role: 'ticks', attrs: { 'data-axis': 'x', ...ticks }, children: x },
    { tag: 'g', role: 'ticks', attrs: { 'data-axis': 'y', ...ticks }, children: y },
    { tag: 'text', role: 'axis-title', attrs: { 'data-axis': 'x', x: px(plot.left + plot.width / 2), y: px(plot.bottom + 36), ...title }, text: scales.xTitle },
    {
      tag: 'text',
      role: 'axis-title',
      attrs: { 'data-axis': 'y', transform: `translate(${px(plot.left - 54)},${px(yMid)}) rotate(-90)`, ...title },
      text: scales.yTitle,
    },
  ];
}

function limitMark(limit: LimitSeries, geometry: Geometry, role: 'limit' | 'overlay'): Mark {
  const { scales } = geometry;
  const x = px(scales.x(limit.wingLoading));
  const style =
    role === 'limit'
      ? { stroke: limit.colour, 'stroke-width': limit.binding ? 2.6 : 1.7, ...(limit.dash ? { 'stroke-dasharray': limit.dash } : {}) }
      : OVERLAY_STYLE;
  return { tag: 'line', role, attrs: { 'data-id': limit.id, x1: x, y1: px(scales.plot.top), x2: x, y2: px(scales.plot.bottom), ...style } };
}

const OVERLAY_STYLE = { stroke: CHART_INKS.overlay, 'stroke-width': 1.4, 'stroke-dasharray': '5 4', opacity: 0.75 };

/** Open circles where a curve stops on the plot because the requirement cannot be met beyond. */
function curveEnds(curve: CurveSeries, geometry: Geometry): Mark[] {
  const { scales } = geometry;
  const [lo, hi] = scales.y.domain();
  const { points } = curve;
  return points
    .filter((point, i) => {
      if (point[1] === null || point[1] < lo || point[1] > hi) return false;
      const before = points[i - 1];
      const after = points[i + 1];
      return (before !== undefined && before[1] === null) || (after !== undefined && after[1] === null);
    })
    .map(([x, y]) => ({
      tag: 'circle' as const,
      role: 'curve-end' as const,
      attrs: { 'data-id': curve.id, cx: px(scales.x(x)), cy: px(scales.y(y as number)), r: 3, fill: '#ffffff', stroke: curve.colour, 'stroke-width': 1.5 },
    }));
}

function labelMark(label: LabelPlacement, role: 'label' | 'note', fontSize: number): Mark {
  const transform: Record<string, string> = label.rotate !== 0 ? { transform: `rotate(${label.rotate} ${px(label.x)} ${px(label.y)})` } : {};
  const lines: Mark[] = label.lines.map((text, i) =>
    i === 0 ? part('tspan', { x: px(label.x), y: px(label.y) }, text) : part('tspan', { x: px(label.x), dy: '1.25em', 'font-weight': 400 }, text),
  );
  return {
    tag: 'text',
    role,
    attrs: {
      'data-id': label.id,
      'text-anchor': label.anchor,
      fill: label.colour,
      'font-size': fontSize,
      'font-weight': 600,
      stroke: '#ffffff',
      'stroke-width': 3.5,
      'stroke-linejoin': 'round',
      'paint-order': 'stroke',
      ...transform,
    },
    children: lines,
  };
}

/** A thin line from a marked point to its note when the note had to move away from it. */
function leaderMark(label: LabelPlacement, geometry: Geometry): Mark | null {
  const note = geometry.notes.find((candidate) => candidate.id === label.id);
  if (!note) return null;
  const { scales } = geometry;
  const x = scales.x(note.at.wingLoading);
  const y = scales.y(note.at.loading);
  const cx = Math.min(Math.max(x, label.box.x0), label.box.x1);
  const cy = Math.min(Math.max(y, label.box.y0), label.box.y1);
  const length = Math.hypot(cx - x, cy - y);
  if (length < 22) return null;
  const sx = x + ((cx - x) / length) * 8;
  const sy = y + ((cy - y) / length) * 8;
  return { tag: 'line', role: 'leader', attrs: { 'data-id': label.id, x1: px(sx), y1: px(sy), x2: px(cx), y2: px(cy), stroke: label.colour, 'stroke-width': 0.9, 'stroke-opacity': 0.8 } };
}

export interface MarkOptions {
  /** The optimum's tooltip (the window shows it on hover). */
  optimumTitle?: string;
}

/** Every mark of the diagram for one geometry. */
export function diagramMarks(geometry: Geometry, options: MarkOptions = {}): DiagramMarks {
  const { data, scales } = geometry;
  const pathOf = new Map(geometry.curvePaths.map((entry) => [entry.id, entry.d]));
  const behind: Mark[] = [
    ...geometry.overlayPaths.filter((overlay) => overlay.d !== '').map((overlay): Mark => ({ tag: 'path', role: 'overlay', attrs: { 'data-id': overlay.id, d: overlay.d, fill: 'none', ...OVERLAY_STYLE } })),
    ...data.overlays.flatMap((overlay) => overlay.limits.map((limit) => limitMark({ ...limit, id: `${overlay.name}:${limit.id}` }, geometry, 'overlay'))),
    ...geometry.regionPaths.map((d): Mark => ({ tag: 'path', role: 'region', attrs: { d, fill: CHART_INKS.feasibleFill, 'fill-opacity': 0.85, stroke: 'none' } })),
  ];
  const boundaries: Mark[] = [
    ...data.limits.map((limit) => limitMark(limit, geometry, 'limit')),
    ...data.curves.flatMap((curve): Mark[] => {
      const d = pathOf.get(curve.id) ?? '';
      if (d === '') return [];
      const style = { stroke: curve.colour, 'stroke-width': curve.binding ? 2.6 : 1.7, 'stroke-linejoin': 'round', ...(curve.dash ? { 'stroke-dasharray': curve.dash } : {}) };
      return [{ tag: 'path', role: 'curve', attrs: { 'data-id': curve.id, d, fill: 'none', ...style } }, ...curveEnds(curve, geometry)];
    }),
  ];
  const markers: Mark[] = [
    ...data.overlays.flatMap((overlay) => (overlay.optimum ? [overlayOptimumMark(scales.x(overlay.optimum.wingLoading), scales.y(overlay.optimum.loading))] : [])),
    ...(data.optimum ? [optimumMark(scales.x(data.optimum.wingLoading), scales.y(data.optimum.loading), options.optimumTitle)] : []),
  ];
  const labels: Mark[] = [
    ...geometry.labels.boundaries.filter((label) => label.onPlot).map((label) => labelMark(label, 'label', geometry.fontSize)),
    ...geometry.labels.notes.flatMap((label) => [leaderMark(label, geometry), labelMark(label, 'note', geometry.fontSize)].filter((mark): mark is Mark => mark !== null)),
  ];
  const point = data.designPoint;
  return {
    grid: gridMarks(geometry),
    behind,
    boundaries,
    markers,
    axes: axisMarks(geometry),
    labels,
    designPoint: point ? { mark: designPointMark(point.feasible), x: px(scales.x(point.wingLoading)), y: px(scales.y(point.loading)) } : null,
  };
}
