/**
 * The diagram's key: one row per boundary (its name, its kind in words,
 * whether it binds, and its full label when the plot shows only the id),
 * then the feasible region, the optimum, the design point and any earlier
 * version drawn behind.
 */
// @ts-nocheck

import type { ChartData } from './data';
import { isDefinedPoint } from './clip';
import { CHART_INKS } from './palette';
import { wrapText } from './text';

export interface LegendRow {
  id: string;
  swatch: 'line' | 'area' | 'diamond' | 'ring';
  colour: string;
  dash: string;
  bold: boolean;
  title: string;
  /** Smaller lines under the title. */
  details: string[];
}

/** Characters per legend detail line. */
export const LEGEND_LINE_CHARS = 36;

/** The key of `data` as plotted; `powerLoading` when the vertical axis is W/P (the optimum is then the highest W/P). */
export function legendRows(data: ChartData, powerLoading = false): LegendRow[] {
  const [lo, hi] = data.wingLoadingRange;
  const rows: LegendRow[] = data.boundaries.map((series) => {
    const notes = [series.kindTitle];
    if (series.binding) notes.push('binding');
    if (series.type === 'limit' && (series.wingLoading < lo || series.wingLoading > hi)) notes.push('beyond the plotted range');
    if (series.type === 'curve' && !series.points.some(isDefinedPoint)) notes.push('cannot be met on this range');
    const fullLabel = series.plotLabel === series.label ? [] : wrapText(series.label, LEGEND_LINE_CHARS, 2);
    return {
      id: series.id,
      swatch: 'line',
      colour: series.colour,
      dash: series.dash,
      bold: series.binding,
      title: series.plotLabel,
      details: [notes.join(' · '), ...fullLabel],
    };
  });
  const plain = { dash: '', bold: false };
  rows.push({ id: 'feasible', swatch: 'area', colour: CHART_INKS.feasibleFill, ...plain, title: 'Feasible region', details: ['meets every requirement'] });
  if (data.optimum) {
    rows.push({ id: 'optimum', swatch: 'diamond', colour: CHART_INKS.optimum, ...plain, title: 'Optimum', details: [powerLoading ? 'highest power loading that meets all' : `least ${data.axis === 'thrustToWeight' ? 'thrust' : 'power'}-to-weight that meets all`] });
  }
  if (data.designPoint) {
    rows.push({
      id: 'design-point',
      swatch: 'ring',
      colour: CHART_INKS.designPoint,
      ...plain,
      title: 'Design point',
      details: [data.designPoint.feasible ? 'meets every requirement' : 'misses at least one requirement'],
    });
  }
  for (const overlay of data.overlays) {
    rows.push({ id: `overlay:${overlay.name}`, swatch: 'line', colour: CHART_INKS.overlay, dash: '5 4', bold: false, title: overlay.name, details: ['drawn behind for comparison'] });
  }
  return rows;
}
