/**
 * The study layers of the SVG diagram as markup: boundary bands (shaded
 * behind their nominal lines), probability contours (above them), contour
 * labels placed on their lines clear of the other words, and legend rows.
 */
import { clampToView, curveBandRuns, type BandSeries, type CurveBandSeries } from './bands';
import { boxesOverlap, boxInside, textWidth, type Box } from './boxes';
import type { XY } from './clip';
import { levelText, type ContourSeries } from './contours';
import type { Labels } from './labels';
import type { LegendRow } from './legend';
import type { ChartScales } from './scales';
import { n } from './svg-number';
import { escapeXml } from './text';

/** Ink and line style of the probability contours, one per level (lowest level first). */
export const CONTOUR_INK = '#2d3a66';
const CONTOUR_STYLES: ReadonlyArray<{ dash: string; width: number }> = [
  { dash: '2 3', width: 1.4 },
  { dash: '7 3', width: 1.5 },
  { dash: '', width: 1.5 },
];
export const BAND_OPACITY = 0.1;
/** The band's edges, drawn thin so overlapping bands stay readable. */
const EDGE = 'stroke-width="0.9" stroke-opacity="0.55"';

export function contourStyle(index: number): { dash: string; width: number } {
  return CONTOUR_STYLES[Math.min(index, CONTOUR_STYLES.length - 1)];
}

function curveBandShapes(band: CurveBandSeries, scales: ChartScales): string[] {
  const top = scales.y.domain()[1] * 1.2;
  const clamp = (y: number) => clampToView(y, scales.y.domain());
  const runs = curveBandRuns(band, (lower, upper) => [clamp(lower), clamp(upper ?? top)]);
  return runs.flatMap((points) => {
    const upperEdge = points.map(([x, , upper]) => `${n(scales.x(x))},${n(scales.y(upper))}`);
    const lowerEdge = points.map(([x, lower]) => `${n(scales.x(x))},${n(scales.y(lower))}`);
    return [
      `<polygon points="${[...upperEdge, ...[...lowerEdge].reverse()].join(' ')}"/>`,
      `<polyline class="band-edge" points="${upperEdge.join(' ')}" fill="none" stroke="${band.colour}" ${EDGE}/>`,
      `<polyline class="band-edge" points="${lowerEdge.join(' ')}" fill="none" stroke="${band.colour}" ${EDGE}/>`,
    ];
  });
}

/** Each band as a translucent fill in its boundary's colour. */
export function bandLayer(bands: readonly BandSeries[], scales: ChartScales): string {
  const { plot } = scales;
  return bands
    .map((band) => {
      const open = `<g class="band" data-id="${escapeXml(band.id)}" fill="${band.colour}" fill-opacity="${BAND_OPACITY}" stroke="none">`;
      if (band.type === 'limit') {
        const [x0, x1] = [scales.x(band.range[0]), scales.x(band.range[1])];
        // A band narrower than a line is still shown, one pixel either side of it.
        const [left, right] = x1 - x0 < 2 ? [x0 - 1, x1 + 1] : [x0, x1];
        const edges = [left, right]
          .map((x) => `<line class="band-edge" x1="${n(x)}" y1="${n(plot.top)}" x2="${n(x)}" y2="${n(plot.bottom)}" stroke="${band.colour}" ${EDGE}/>`)
          .join('');
        return `${open}<rect x="${n(left)}" y="${n(plot.top)}" width="${n(right - left)}" height="${n(plot.height)}"/>${edges}</g>`;
      }
      const polygons = curveBandShapes(band, scales);
      return polygons.length > 0 ? `${open}${polygons.join('')}</g>` : '';
    })
    .filter((part) => part !== '')
    .join('\n');
}

function ringPath(rings: XY[][], scales: ChartScales): string {
  return rings
    .filter((ring) => ring.length > 2)
    .map((ring) => `M${ring.map(([x, y]) => `${n(scales.x(x))},${n(scales.y(clampToView(y, scales.y.domain())))}`).join('L')}Z`)
    .join('');
}

/** Each contour as a closed outline (the parts along the grid's border fall outside the clip). */
export function contourLayer(contours: readonly ContourSeries[], scales: ChartScales): string {
  return contours
    .map((contour, i) => {
      const d = ringPath(contour.rings, scales);
      if (!d) return '';
      const { dash, width } = contourStyle(i);
      return `<path class="contour" data-level="${contour.level}" d="${d}" fill="none" stroke="${CONTOUR_INK}" stroke-width="${width}" stroke-linejoin="round"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
    })
    .filter((part) => part !== '')
    .join('\n');
}

const LABEL_FONT = 11;
/** Where along a frontier a label is tried first, as fractions of its defined run. */
const PLACES = [0.86, 0.74, 0.62, 0.5, 0.38, 0.26, 0.14, 0.94];

/** "95 %" written on each contour, where it is on the plot and clear of the other words. */
export function contourLabels(contours: readonly ContourSeries[], scales: ChartScales, labels: Labels): string {
  const taken: Box[] = [...labels.notes, ...labels.boundaries.filter((label) => label.onPlot)].map((label) => label.box);
  const parts: string[] = [];
  // Highest level first: it lies innermost, where space is tightest.
  [...contours].reverse().forEach((contour) => {
    const text = levelText(contour.level);
    const width = textWidth(text, LABEL_FONT) + 4;
    const defined = contour.frontier.filter((point): point is [number, number] => point[1] !== null);
    if (defined.length === 0) return;
    for (const place of PLACES) {
      const [x, y] = defined[Math.min(defined.length - 1, Math.floor(place * defined.length))];
      const px = scales.x(x);
      const py = scales.y(y);
      const box = { x0: px - width / 2, y0: py - LABEL_FONT * 0.75, x1: px + width / 2, y1: py + LABEL_FONT * 0.45 };
      if (!boxInside(box, scales.plot) || taken.some((other) => boxesOverlap(box, other))) continue;
      taken.push(box);
      parts.push(
        `<text class="contour-label" data-level="${contour.level}" x="${n(px)}" y="${n(py + LABEL_FONT * 0.35)}" text-anchor="middle" font-size="${LABEL_FONT}" font-weight="600" fill="${CONTOUR_INK}" stroke="#ffffff" stroke-width="3.5" stroke-linejoin="round" paint-order="stroke">${escapeXml(text)}</text>`,
      );
      return;
    }
  });
  return parts.join('\n');
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
