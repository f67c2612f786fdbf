/**
 * The ranges studies as marks of the one drawing: each boundary's band (a
 * faint fill with thin edges, under the boundary lines) and the 50, 90 and
 * 95 % contours of the chance of meeting every requirement, each labelled on
 * its line. The window and the SVG writer draw the same marks, in the P/W,
 * T/W or W/P view of the geometry.
 */
// @ts-nocheck

import { toDisplay } from '../../core/units/display';
import type { BandSeries } from './bands';
import type { ContourSeries, ProbabilityGridValues } from './contours';
import type { Geometry } from './geometry';
import { px, type Mark } from './marks';
import { powerLoadingFactor } from './power-loading';
import { bandShapes, contourLabels, contourShapes, mapBox, type LoadingView } from './study-geometry';
import { BAND_EDGE, BAND_OPACITY, CONTOUR_INK } from './study-style';

/** How the geometry shows a loading: as itself, or as W/P. */
function loadingView(geometry: Geometry): LoadingView {
  return geometry.powerLoading ? { powerLoading: true, factor: powerLoadingFactor(geometry.data.system) } : { powerLoading: false };
}

/** One group per band with width: the fill (class "band") and its two edges. */
export function bandMarks(bands: readonly BandSeries[], geometry: Geometry): Mark[] {
  return bandShapes(bands, geometry.scales, loadingView(geometry)).map((shape): Mark => ({
    tag: 'g',
    role: 'band',
    attrs: { 'data-id': shape.id },
    children: [
      { tag: 'path' as const, role: 'part' as const, attrs: { class: 'band', d: shape.area, fill: shape.colour, 'fill-opacity': BAND_OPACITY, stroke: 'none' } },
      { tag: 'path', role: 'part', attrs: { d: shape.edges, fill: 'none', stroke: shape.colour, 'stroke-width': BAND_EDGE.width, 'stroke-opacity': BAND_EDGE.opacity } },
    ],
  }));
}

export interface ContourMarks {
  /** The contour lines, clipped to the part of the plot the map covers (its edge is not a contour). */
  lines: Mark[];
  /** "95 %" on each line, clear of the boundary labels. */
  labels: Mark[];
}

export interface ContourMarkOptions {
  /** Id of the clip path around the map, unique in its document. */
  clipId: string;
  /** The contours' ink; the window greys them when the concept has changed since the study ran. */
  ink?: string;
}

export function contourMarks(map: ProbabilityGridValues, contours: readonly ContourSeries[], geometry: Geometry, options: ContourMarkOptions): ContourMarks {
  const view = loadingView(geometry);
  const { axis, system } = geometry.data;
  const ink = options.ink ?? CONTOUR_INK;
  const w = map.wingLoadings;
  const y = map.loadings;
  const box = mapBox(
    [toDisplay(w[0], 'wingLoading', system), toDisplay(w[w.length - 1], 'wingLoading', system)],
    [toDisplay(y[0], axis, system), toDisplay(y[y.length - 1], axis, system)],
    geometry.scales,
    view,
  );
  const paths: Mark[] = contourShapes(contours, geometry.scales, view).map((shape) => ({
    tag: 'path',
    role: 'contour',
    attrs: { 'data-level': shape.level, d: shape.d, fill: 'none', stroke: ink, 'stroke-width': shape.width, 'stroke-linejoin': 'round', ...(shape.dash ? { 'stroke-dasharray': shape.dash } : {}) },
  }));
  const clip: Mark = {
    tag: 'defs',
    role: 'part',
    attrs: {},
    children: [{ tag: 'clipPath', role: 'part', attrs: { id: options.clipId }, children: [{ tag: 'rect', role: 'part', attrs: { x: px(box.x), y: px(box.y), width: px(box.width), height: px(box.height) } }] }],
  };
  const labels: Mark[] = contourLabels(contours, geometry.scales, geometry.labels, view).map((label) => ({
    tag: 'text',
    role: 'contour-label',
    attrs: {
      'data-level': label.level,
      x: px(label.x),
      y: px(label.y),
      'text-anchor': 'middle',
      'font-size': 11,
      'font-weight': 600,
      fill: ink,
      stroke: '#ffffff',
      'stroke-width': 3.5,
      'stroke-linejoin': 'round',
      'paint-order': 'stroke',
    },
    text: label.text,
  }));
  return { lines: paths.length > 0 ? [clip, { tag: 'g', role: 'part', attrs: { 'clip-path': `url(#${options.clipId})` }, children: paths }] : [], labels };
}
