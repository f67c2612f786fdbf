/**
 * The plot area of the SVG diagram as markup: grid, feasible region, limits,
 * curves (with a mark where a curve stops because it cannot be met beyond),
 * earlier versions drawn behind, axes, the optimum and the design point.
 */
import { line } from 'd3';
import { clipToBand, type XY } from './clip';
import type { ChartData, CurveSeries, LimitSeries } from './data';
import { CHART_INKS } from './palette';
import { feasibleRegion } from './region';
import type { ChartScales } from './scales';
import { n } from './svg-number';
import { escapeXml } from './text';

export function grid(scales: ChartScales): string {
  const { plot } = scales;
  const vertical = scales.xTicks.map((t) => `<line x1="${n(scales.x(t))}" y1="${n(plot.top)}" x2="${n(scales.x(t))}" y2="${n(plot.bottom)}"/>`);
  const horizontal = scales.yTicks.map((t) => `<line x1="${n(plot.left)}" y1="${n(scales.y(t))}" x2="${n(plot.right)}" y2="${n(scales.y(t))}"/>`);
  return `<g stroke="${CHART_INKS.grid}" stroke-width="1">\n${[...vertical, ...horizontal].join('\n')}\n</g>`;
}

/** One SVG path through the runs of a curve that lie on the plot; gaps stay gaps. */
function runsPath(points: CurveSeries['points'], scales: ChartScales): string {
  const [lo, hi] = scales.y.domain();
  const runs = clipToBand(points, lo, hi);
  const joined: Array<XY | null> = runs.flatMap((run, i) => (i === 0 ? run : [null, ...run]));
  const path = line<XY | null>()
    .defined((d) => d !== null)
    .x((d) => scales.x((d as XY)[0]))
    .y((d) => scales.y((d as XY)[1]))
    .digits(2)(joined);
  return path ?? '';
}

export function curvePath(curve: CurveSeries, scales: ChartScales): string {
  const d = runsPath(curve.points, scales);
  if (!d) return '';
  const dash = curve.dash ? ` stroke-dasharray="${curve.dash}"` : '';
  const path = `<path data-id="${escapeXml(curve.id)}" d="${d}" fill="none" stroke="${curve.colour}" stroke-width="${curve.binding ? 2.6 : 1.7}" stroke-linejoin="round"${dash}/>`;
  return [path, ...gapEnds(curve, scales)].join('\n');
}

/** A small open circle where a curve stops because the requirement cannot be met beyond it. */
function gapEnds(curve: CurveSeries, scales: ChartScales): string[] {
  const [lo, hi] = scales.y.domain();
  const { points } = curve;
  return points
    .filter((point, i) => {
      if (point[1] === null || point[1] < lo || point[1] > hi) return false;
      const before = points[i - 1];
      const after = points[i + 1];
      return (before !== undefined && before[1] === null) || (after !== undefined && after[1] === null);
    })
    .map(([x, y]) => `<circle cx="${n(scales.x(x))}" cy="${n(scales.y(y as number))}" r="3" fill="#ffffff" stroke="${curve.colour}" stroke-width="1.5"/>`);
}

export function limitLine(limit: LimitSeries, scales: ChartScales): string {
  const x = scales.x(limit.wingLoading);
  const dash = limit.dash ? ` stroke-dasharray="${limit.dash}"` : '';
  return `<line data-id="${escapeXml(limit.id)}" x1="${n(x)}" y1="${n(scales.plot.top)}" x2="${n(x)}" y2="${n(scales.plot.bottom)}" stroke="${limit.colour}" stroke-width="${limit.binding ? 2.6 : 1.7}"${dash}/>`;
}

export function region(data: ChartData, scales: ChartScales): string {
  const polygons = feasibleRegion(data, scales.y.domain()[1]);
  return polygons
    .map((polygon) => {
      const points = polygon.map(([x, y]) => `${n(scales.x(x))},${n(scales.y(y))}`).join(' ');
      return `<polygon class="feasible" points="${points}" fill="${CHART_INKS.feasibleFill}" fill-opacity="0.85" stroke="none"/>`;
    })
    .join('\n');
}

export function overlays(data: ChartData, scales: ChartScales): string {
  return data.overlays
    .flatMap((overlay) => [
      ...overlay.curves.map((curve) => {
        const d = runsPath(curve.points, scales);
        return d ? `<path d="${d}" fill="none" stroke="${CHART_INKS.overlay}" stroke-width="1.2" stroke-dasharray="5 4"/>` : '';
      }),
      ...overlay.limits.map((limit) => {
        const x = n(scales.x(limit.wingLoading));
        return `<line x1="${x}" y1="${n(scales.plot.top)}" x2="${x}" y2="${n(scales.plot.bottom)}" stroke="${CHART_INKS.overlay}" stroke-width="1.2" stroke-dasharray="5 4"/>`;
      }),
      overlay.optimum
        ? `<circle cx="${n(scales.x(overlay.optimum.wingLoading))}" cy="${n(scales.y(overlay.optimum.loading))}" r="4" fill="none" stroke="${CHART_INKS.overlay}" stroke-width="1.5"/>`
        : '',
    ])
    .filter((part) => part !== '')
    .join('\n');
}

export function axes(scales: ChartScales): string {
  const { plot } = scales;
  const ink = CHART_INKS.axis;
  const xTicks = scales.xTicks.map((t) => {
    const x = n(scales.x(t));
    return `<line x1="${x}" y1="${n(plot.bottom)}" x2="${x}" y2="${n(plot.bottom + 5)}"/><text x="${x}" y="${n(plot.bottom + 19)}" text-anchor="middle" stroke="none" fill="${ink}">${escapeXml(scales.formatX(t))}</text>`;
  });
  const yTicks = scales.yTicks.map((t) => {
    const y = n(scales.y(t));
    return `<line x1="${n(plot.left - 5)}" y1="${y}" x2="${n(plot.left)}" y2="${y}"/><text x="${n(plot.left - 8)}" y="${n(scales.y(t) + 4)}" text-anchor="end" stroke="none" fill="${ink}">${escapeXml(scales.formatY(t))}</text>`;
  });
  const yMid = plot.top + plot.height / 2;
  return [
    `<rect x="${n(plot.left)}" y="${n(plot.top)}" width="${n(plot.width)}" height="${n(plot.height)}" fill="none" stroke="${CHART_INKS.plotFrame}" stroke-width="1"/>`,
    `<g stroke="${ink}" stroke-width="1">`,
    ...xTicks,
    ...yTicks,
    `</g>`,
    `<text x="${n(plot.left + plot.width / 2)}" y="${n(plot.bottom + 44)}" text-anchor="middle" font-size="13" fill="${CHART_INKS.text}">${escapeXml(scales.xTitle)}</text>`,
    `<text transform="translate(${n(plot.left - 58)},${n(yMid)}) rotate(-90)" text-anchor="middle" font-size="13" fill="${CHART_INKS.text}">${escapeXml(scales.yTitle)}</text>`,
  ].join('\n');
}

export function markers(data: ChartData, scales: ChartScales): string {
  const parts: string[] = [];
  if (data.optimum) {
    const x = scales.x(data.optimum.wingLoading);
    const y = scales.y(data.optimum.loading);
    parts.push(
      `<path class="optimum" d="M${n(x)},${n(y - 7)}L${n(x + 7)},${n(y)}L${n(x)},${n(y + 7)}L${n(x - 7)},${n(y)}Z" fill="${CHART_INKS.optimum}" stroke="#ffffff" stroke-width="1.5"/>`,
    );
  }
  if (data.designPoint) {
    const x = n(scales.x(data.designPoint.wingLoading));
    const y = n(scales.y(data.designPoint.loading));
    const ink = CHART_INKS.designPoint;
    parts.push(
      `<g class="design-point" stroke="${ink}" stroke-width="2" fill="none"><circle cx="${x}" cy="${y}" r="6.5" fill="#ffffff"/><circle cx="${x}" cy="${y}" r="2" fill="${ink}" stroke="none"/></g>`,
    );
  }
  return parts.join('\n');
}

export function nothingFeasible(data: ChartData, scales: ChartScales): string {
  if (data.optimum) return '';
  const { plot } = scales;
  return `<text x="${n(plot.left + plot.width / 2)}" y="${n(plot.top + 26)}" text-anchor="middle" font-size="14" font-weight="600" fill="${CHART_INKS.designPoint}">Nothing on the diagram meets every requirement</text>`;
}
