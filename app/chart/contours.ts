/**
 * Probability contours as plot series: the Monte Carlo map of the chance of
 * meeting every requirement (core `probabilityMap`, SI, row-major by
 * loading) traced at 50, 90 and 95 % with d3's marching squares, in display
 * units. Each level also carries its frontier (the least loading reaching
 * the level at each wing loading) for placing its label on the line.
 */
import { contours } from 'd3';
import { probabilityFrontier, PROBABILITY_LEVELS } from '../../core/studies/probability-grid';
import type { LoadingAxis } from '../../core/model';
import { toDisplay, type UnitSystem } from '../../core/units/display';
import type { XY } from './clip';

export interface ProbabilityGridValues {
  /** Evenly spaced wing loadings [Pa], ascending. */
  wingLoadings: ArrayLike<number>;
  /** Evenly spaced loadings (W/N or T/W), ascending. */
  loadings: ArrayLike<number>;
  /** probability[j * nx + i] at (wingLoadings[i], loadings[j]). */
  probability: ArrayLike<number>;
}

export interface ContourSeries {
  level: number;
  /** Closed rings around the region at or above the level, display units. */
  rings: XY[][];
  /** [wing loading, least loading at the level or null], display units. */
  frontier: Array<[number, number | null]>;
  /**
   * Half a row above the map's last row, display units: a ring point above it lies in the padding
   * beyond the map, where the chance is taken as the last row's (more power can only raise it).
   */
  beyondTop?: number;
}

/**
 * The grid padded by one cell on every side with copies of its edge values,
 * so that a ring's run along the grid's border falls outside the plotted
 * range (and is clipped away) instead of drawing over the plot frame.
 */
function padded(values: ArrayLike<number>, nx: number, ny: number): number[] {
  const out = new Array<number>((nx + 2) * (ny + 2));
  for (let j = 0; j < ny + 2; j++) {
    const sj = Math.min(Math.max(j - 1, 0), ny - 1);
    for (let i = 0; i < nx + 2; i++) {
      const si = Math.min(Math.max(i - 1, 0), nx - 1);
      const p = values[sj * nx + si];
      out[j * (nx + 2) + i] = Number.isFinite(p) ? p : 0;
    }
  }
  return out;
}

/** Contours of the map at `levels` (default 50, 90, 95 %); a level the map never reaches has no rings. */
export function probabilityContours(
  map: ProbabilityGridValues,
  axis: LoadingAxis,
  system: UnitSystem,
  levels: readonly number[] = PROBABILITY_LEVELS,
): ContourSeries[] {
  const nx = map.wingLoadings.length;
  const ny = map.loadings.length;
  if (nx < 2 || ny < 2 || map.probability.length < nx * ny) return [];
  const [w0, w1] = [map.wingLoadings[0], map.wingLoadings[nx - 1]];
  const [y0, y1] = [map.loadings[0], map.loadings[ny - 1]];
  const dw = (w1 - w0) / (nx - 1);
  const dy = (y1 - y0) / (ny - 1);
  // d3 places grid value k at coordinate k + 0.5; the padding shifts indices by one.
  const toXY = ([cx, cy]: number[]): XY => [
    toDisplay(w0 + (cx - 1.5) * dw, 'wingLoading', system),
    toDisplay(y0 + (cy - 1.5) * dy, axis, system),
  ];
  const generator = contours()
    .size([nx + 2, ny + 2])
    .thresholds([...levels]);
  const traced = generator(padded(map.probability, nx, ny));
  return levels.map((level, k) => {
    const geometry = traced[k];
    const rings = geometry ? geometry.coordinates.flatMap((polygon) => polygon.map((ring) => ring.map(toXY))) : [];
    const line = probabilityFrontier(map, level);
    const frontier = Array.from(line, (y, i): [number, number | null] => [
      toDisplay(map.wingLoadings[i], 'wingLoading', system),
      Number.isFinite(y) ? toDisplay(y, axis, system) : null,
    ]);
    return { level, rings, frontier, beyondTop: toDisplay(y1 + dy / 2, axis, system) };
  });
}

/** "95 %" */
export function levelText(level: number): string {
  return `${Math.round(level * 100)} %`;
}
