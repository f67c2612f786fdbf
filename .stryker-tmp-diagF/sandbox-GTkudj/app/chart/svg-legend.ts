/**
 * The SVG diagram's legend column: a swatch, a title and smaller detail
 * lines per row, squeezed a little when many requirements would run past
 * the plot.
 */
// @ts-nocheck

import { LEGEND_LINE_CHARS, type LegendRow } from './legend';
import { CHART_INKS } from './palette';
import type { ChartScales } from './scales';
import { n } from './svg-number';
import { escapeXml, shorten } from './text';

/** Width of the legend column, px. */
export const LEGEND_WIDTH = 262;

export function legend(rows: LegendRow[], scales: ChartScales, width: number): string {
  const x = width - LEGEND_WIDTH - 8;
  const titleHeight = 15;
  const detailHeight = 12.5;
  const gap = 9;
  const natural = rows.reduce((sum, row) => sum + titleHeight + row.details.length * detailHeight + gap, 0);
  // Squeeze (never below readable) when many requirements would run past the plot.
  const room = scales.plot.height + 40;
  const scale = natural > room ? Math.max(0.8, room / natural) : 1;
  const parts = [`<g class="legend">`, `<text x="${x}" y="${n(scales.plot.top + 10)}" font-size="13" font-weight="700" fill="${CHART_INKS.text}">Requirements</text>`];
  let y = scales.plot.top + 34;
  for (const row of rows) {
    parts.push(legendSwatch(row, x, y));
    parts.push(`<text x="${x + 34}" y="${n(y)}" fill="${CHART_INKS.text}"${row.bold ? ' font-weight="600"' : ''}>${escapeXml(shorten(row.title, 30))}</text>`);
    row.details.forEach((detail, i) => {
      parts.push(`<text x="${x + 34}" y="${n(y + (i + 1) * detailHeight * scale)}" font-size="10.5" fill="${CHART_INKS.mutedText}">${escapeXml(shorten(detail, LEGEND_LINE_CHARS + 2))}</text>`);
    });
    y += (titleHeight + row.details.length * detailHeight + gap) * scale;
  }
  parts.push(`</g>`);
  return parts.join('\n');
}

function legendSwatch(row: LegendRow, x: number, y: number): string {
  const cy = n(y - 4);
  switch (row.swatch) {
    case 'line':
      return `<line x1="${x}" y1="${cy}" x2="${x + 26}" y2="${cy}" stroke="${row.colour}" stroke-width="${row.bold ? 2.6 : 1.7}"${row.dash ? ` stroke-dasharray="${row.dash}"` : ''}/>`;
    case 'area':
      return `<rect x="${x}" y="${n(y - 11)}" width="26" height="13" fill="${row.colour}" stroke="${CHART_INKS.feasibleEdge}" stroke-width="0.8"/>`;
    case 'diamond':
      return `<path d="M${x + 13},${n(y - 11)}L${x + 20},${cy}L${x + 13},${n(y + 3)}L${x + 6},${cy}Z" fill="${row.colour}"/>`;
    case 'ring':
      return `<circle cx="${x + 13}" cy="${cy}" r="6" fill="#ffffff" stroke="${row.colour}" stroke-width="2"/><circle cx="${x + 13}" cy="${cy}" r="2" fill="${row.colour}"/>`;
  }
}
