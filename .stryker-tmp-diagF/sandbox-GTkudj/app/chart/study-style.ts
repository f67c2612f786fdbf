/**
 * How the ranges studies look wherever the diagram is drawn: the bands'
 * opacity, the probability contours' ink and line styles, and their legend
 * rows.
 */
// @ts-nocheck

import { levelText, type ContourSeries } from './contours';
import type { LegendRow } from './legend';

/** Ink and line style of the probability contours, one per level (lowest level first). */
export const CONTOUR_INK = '#2d3a66';
/** The contours' ink once the concept has changed since the study ran. */
export const STALE_CONTOUR_INK = '#98a2ad';
const CONTOUR_STYLES: ReadonlyArray<{ dash: string; width: number }> = [
  { dash: '2 3', width: 1.4 },
  { dash: '7 3', width: 1.5 },
  { dash: '', width: 1.5 },
];
export const BAND_OPACITY = 0.1;
/** The band's edges, drawn thin so overlapping bands stay readable. */
export const BAND_EDGE = { width: 0.9, opacity: 0.55 } as const;

export function contourStyle(index: number): { dash: string; width: number } {
  return CONTOUR_STYLES[Math.min(index, CONTOUR_STYLES.length - 1)];
}

/** Legend rows for the bands and each contour level drawn. */
export function studyLegendRows(options: { bands: boolean; contours: readonly ContourSeries[]; runNote?: string }): LegendRow[] {
  const rows: LegendRow[] = [];
  if (options.bands) {
    rows.push({
      id: 'bands',
      swatch: 'area',
      colour: '#dfe4ea',
      dash: '',
      bold: false,
      title: 'Band around a boundary',
      details: ['its spread over the assumption ranges'],
    });
  }
  options.contours.forEach((contour, i) => {
    if (contour.rings.length === 0) return;
    rows.push({
      id: `contour:${contour.level}`,
      swatch: 'line',
      colour: CONTOUR_INK,
      dash: contourStyle(i).dash,
      bold: false,
      title: `${levelText(contour.level)} chance of meeting all`,
      details: i === 0 && options.runNote ? [options.runNote] : [],
    });
  });
  return rows;
}
