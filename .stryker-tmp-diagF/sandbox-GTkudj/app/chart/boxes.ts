/**
 * Boxes in pixel space for the label placer: how much room a text takes
 * (estimated, so no DOM is needed) and whether boxes, the plot and line
 * segments meet.
 */
// @ts-nocheck

import type { XY } from './clip';
import type { PlotArea } from './scales';

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Average advance of a sans-serif glyph, as a fraction of the font size. */
const GLYPH_WIDTH = 0.56;
/** Clearance between a label and its line, px. */
export const GAP = 4;
/** Clearance between a label and the plot's edge, px. */
export const PAD = 3;

export function textWidth(text: string, fontSize: number): number {
  return [...text].length * fontSize * GLYPH_WIDTH;
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

export function boxInside(box: Box, plot: PlotArea, pad = PAD): boolean {
  return box.x0 >= plot.left + pad && box.x1 <= plot.right - pad && box.y0 >= plot.top + pad && box.y1 <= plot.bottom - pad;
}

/** Whether segment a-b passes through the box (Liang-Barsky). */
export function segmentHitsBox(a: XY, b: XY, box: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const edges: Array<[number, number]> = [
    [-dx, a[0] - box.x0],
    [dx, box.x1 - a[0]],
    [-dy, a[1] - box.y0],
    [dy, box.y1 - a[1]],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const t = q / p;
      if (p < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
      if (t0 > t1) return false;
    }
  }
  return true;
}

