/**
 * The ranges studies in the diagram's pixels (window and SVG writer alike): boundary bands as filled
 * shapes with thin edges, probability contours as outlines, and a place for
 * each contour's label on its line clear of the boundary labels. Takes the
 * shared series (app/chart bands.ts and contours.ts, display units of P/W or
 * T/W) and, for the power-loading view, shows them as W/P. Pure.
 */
import { clampToView, curveBandRuns, type BandPoint, type BandSeries, type CurveBandSeries } from './bands';
import { boxesOverlap, boxInside, textWidth, type Box } from './boxes';
import type { XY } from './clip';
import { levelText, type ContourSeries } from './contours';
import type { Labels } from './labels';
import type { ChartScales } from './scales';
import { contourStyle } from './study-style';

/** How the plotted loading is read from a displayed P/W (or T/W): itself, or W/P = k / (P/W). */
export type LoadingView = { powerLoading: false } | { powerLoading: true; factor: number };

export interface BandShape {
  id: string;
  colour: string;
  /** The filled area. */
  area: string;
  /** Its two long edges, drawn thin. */
  edges: string;
}

export interface ContourShape {
  level: number;
  d: string;
  dash: string;
  width: number;
}

export interface ContourLabel {
  level: number;
  text: string;
  x: number;
  y: number;
}

const f = (v: number) => (Math.round(v * 10) / 10).toString();

/** A displayed loading as plotted; +Infinity stands for "above everything", null for nothing to draw. */
function plotted(y: number | null, view: LoadingView): number | null {
  if (y === null || !Number.isFinite(y)) return y === Infinity ? Infinity : null;
  if (!view.powerLoading) return y;
  return y > 0 ? view.factor / y : Infinity;
}

/** A curve band's [x, low, high] in plotted values; an open top (some combination cannot meet it) reaches the view's far edge. */
function plottedBandRuns(band: CurveBandSeries, view: LoadingView): BandPoint[][] {
  return curveBandRuns(band, (lower, upper) => {
    const a = plotted(lower, view);
    const b = view.powerLoading ? (upper === null ? 0 : plotted(upper, view)) : upper === null ? Infinity : plotted(upper, view);
    return a === null || b === null ? null : [Math.min(a, b), Math.max(a, b)];
  });
}

export function bandShapes(bands: readonly BandSeries[], scales: ChartScales, view: LoadingView): BandShape[] {
  const { plot } = scales;
  const shapes: BandShape[] = [];
  for (const band of bands) {
    if (band.type === 'limit') {
      const [x0, x1] = [scales.x(band.range[0]), scales.x(band.range[1])];
      // A band narrower than a line is still shown, one pixel either side of it.
      const [left, right] = x1 - x0 < 2 ? [x0 - 1, x1 + 1] : [x0, x1];
      shapes.push({
        id: band.id,
        colour: band.colour,
        area: `M${f(left)},${f(plot.top)}H${f(right)}V${f(plot.bottom)}H${f(left)}Z`,
        edges: `M${f(left)},${f(plot.top)}V${f(plot.bottom)}M${f(right)},${f(plot.top)}V${f(plot.bottom)}`,
      });
      continue;
    }
    const runs = plottedBandRuns(band, view);
    if (runs.length === 0) continue;
    let area = '';
    let edges = '';
    for (const points of runs) {
      const high = points.map(([x, , hi]) => `${f(scales.x(x))},${f(scales.y(clampToView(hi, scales.y.domain())))}`);
      const low = points.map(([x, lo]) => `${f(scales.x(x))},${f(scales.y(clampToView(lo, scales.y.domain())))}`);
      area += `M${high.join('L')}L${[...low].reverse().join('L')}Z`;
      edges += `M${high.join('L')}M${low.join('L')}`;
    }
    shapes.push({ id: band.id, colour: band.colour, area, edges });
  }
  return shapes;
}

/**
 * A contour's rings as a path. In power loading, where W/P runs down to 0 (power without limit), a
 * ring's run beyond the map's last row is drawn at W/P = 0: above that row the chance is taken as the
 * row's own, which more power can only raise, so the region drawn is never larger than the true one.
 */
function ringPath(rings: readonly XY[][], scales: ChartScales, view: LoadingView, beyondTop = Infinity): string {
  let d = '';
  for (const ring of rings) {
    if (ring.length < 3) continue;
    const points: string[] = [];
    for (const [x, y] of ring) {
      const shown = view.powerLoading && y > beyondTop ? 0 : plotted(y, view);
      if (shown === null) continue;
      points.push(`${f(scales.x(x))},${f(scales.y(clampToView(shown, scales.y.domain())))}`);
    }
    if (points.length > 2) d += `M${points.join('L')}Z`;
  }
  return d;
}

/** Each contour as closed outlines, dashed by level as in the report. */
export function contourShapes(contours: readonly ContourSeries[], scales: ChartScales, view: LoadingView): ContourShape[] {
  return contours.flatMap((contour, i) => {
    const d = ringPath(contour.rings, scales, view, contour.beyondTop);
    return d ? [{ level: contour.level, d, ...contourStyle(i) }] : [];
  });
}

/**
 * The part of the plot the probability map covers, in pixels: the contours
 * are clipped to it, so the outline a contour takes along the map's edge
 * (where the map simply stops) is never drawn as if it were a contour.
 * `wingLoadings` and `loadings` are the map's ends in display units. In
 * power loading it reaches down to W/P = 0, where the contours continue
 * (ringPath).
 */
export function mapBox(
  wingLoadings: readonly [number, number],
  loadings: readonly [number, number],
  scales: ChartScales,
  view: LoadingView,
): { x: number; y: number; width: number; height: number } {
  const { plot } = scales;
  const xs = wingLoadings.map((w) => scales.x(w));
  const ys = loadings.map((y) => {
    const shown = plotted(y, view);
    return shown === null ? plot.bottom : Number.isFinite(shown) ? scales.y(shown) : shown > 0 ? -Infinity : Infinity;
  });
  const left = Math.max(plot.left, Math.min(...xs));
  const right = Math.min(plot.right, Math.max(...xs));
  const top = Math.max(plot.top, Math.min(...ys));
  const bottom = view.powerLoading ? plot.bottom : Math.min(plot.bottom, Math.max(...ys));
  return { x: left, y: top, width: Math.max(0, right - left), height: Math.max(0, bottom - top) };
}

const LABEL_FONT = 11;
/** Where along a contour's line a label is tried first, as fractions of its run on the plot. */
const PLACES = [0.86, 0.74, 0.62, 0.5, 0.38, 0.26, 0.14, 0.94];

/** "95 %" on each contour's line where it is on the plot and clear of the boundary labels and of each other. */
export function contourLabels(contours: readonly ContourSeries[], scales: ChartScales, labels: Labels, view: LoadingView): ContourLabel[] {
  const taken: Box[] = [...labels.notes, ...labels.boundaries.filter((label) => label.onPlot)].map((label) => label.box);
  const out: ContourLabel[] = [];
  // Highest level first: it lies innermost, where space is tightest.
  for (const contour of [...contours].reverse()) {
    if (contour.rings.length === 0) continue;
    const text = levelText(contour.level);
    const width = textWidth(text, LABEL_FONT) + 4;
    const onPlot: Array<[number, number]> = [];
    for (const [x, y] of contour.frontier) {
      const shown = plotted(y, view);
      if (shown === null || !Number.isFinite(shown)) continue;
      const px = scales.x(x);
      const py = scales.y(shown);
      if (px >= scales.plot.left && px <= scales.plot.right && py >= scales.plot.top && py <= scales.plot.bottom) onPlot.push([px, py]);
    }
    for (const place of PLACES) {
      if (onPlot.length === 0) break;
      const [px, py] = onPlot[Math.min(onPlot.length - 1, Math.floor(place * onPlot.length))];
      const box = { x0: px - width / 2, y0: py - LABEL_FONT * 0.75, x1: px + width / 2, y1: py + LABEL_FONT * 0.45 };
      if (!boxInside(box, scales.plot) || taken.some((other) => boxesOverlap(box, other))) continue;
      taken.push(box);
      out.push({ level: contour.level, text, x: px, y: py + LABEL_FONT * 0.35 });
      break;
    }
  }
  return out;
}
