/**
 * The grid a probability map is computed on, and reading it: the row a
 * required loading falls in, and the probability contours as curves.
 */
import { loadingAxis, type Design } from '../model';
import { optimumOf, plotRangeOf } from './study-optimum';

export interface ProbabilityGrid {
  /** [lo, hi] wing loading [Pa], 0 < lo < hi. */
  wingLoading: [number, number];
  /** [lo, hi] loading (W/N or T/W), lo < hi. */
  loading: [number, number];
  nx: number;
  ny: number;
}

/** Contour levels drawn by default: 50 %, 90 %, 95 %. */
export const PROBABILITY_LEVELS: readonly number[] = [0.5, 0.9, 0.95];

/** Most points a grid may have along either axis. */
export const MOST_GRID_POINTS = 2000;

/** The grid, or a RangeError that names the bad value. */
export function checkedGrid(grid: ProbabilityGrid): ProbabilityGrid {
  const { wingLoading: [w0, w1], loading: [y0, y1], nx, ny } = grid;
  if (!(w0 > 0 && w1 > w0 && Number.isFinite(w1))) throw new RangeError(`grid.wingLoading is [${w0}, ${w1}]; give 0 < low < high`);
  if (!(Number.isFinite(y0) && Number.isFinite(y1) && y1 > y0)) throw new RangeError(`grid.loading is [${y0}, ${y1}]; give low < high`);
  for (const [name, n] of [['nx', nx], ['ny', ny]] as const) {
    if (!Number.isInteger(n) || n < 2 || n > MOST_GRID_POINTS) throw new RangeError(`grid.${name} is ${n}; give a whole number from 2 to ${MOST_GRID_POINTS}`);
  }
  return { wingLoading: [w0, w1], loading: [y0, y1], nx, ny };
}

/** Index of the first of the ascending, evenly spaced `ys` at or above v; ys.length when none (NaN counts as none). */
export function firstRowAtOrAbove(ys: Float64Array, v: number): number {
  const n = ys.length;
  if (v <= ys[0]) return 0;
  if (!(v <= ys[n - 1])) return n;
  let k = Math.ceil(((v - ys[0]) / (ys[n - 1] - ys[0])) * (n - 1));
  // The spacing is exact only up to rounding: settle on the true first row.
  while (k > 0 && ys[k - 1] >= v) k--;
  while (k < n && ys[k] < v) k++;
  return k;
}

/**
 * A grid that shows the study: the wing-loading range the diagram plots, and
 * loadings from 0 to twice the larger of the optimum's and the design
 * point's. When neither needs any loading (only limits, or no wing loading
 * can be met and there is no design point): 0 to 1 in thrust-to-weight, 0 to
 * 30 W/N in power-to-weight (above the 10-20 W/N of light propeller aircraft,
 * from memory).
 */
export function defaultProbabilityGrid(design: Design, nx = 200, ny = 200): ProbabilityGrid {
  const optimum = optimumOf(design);
  const reference = Math.max(optimum?.loading ?? 0, design.designPoint?.loading ?? 0);
  const top = reference > 0 ? 2 * reference : loadingAxis(design.aircraft.propulsion.kind) === 'thrustToWeight' ? 1 : 30;
  return { wingLoading: plotRangeOf(design), loading: [0, top], nx, ny };
}

/**
 * The contour of probability `level` as a curve: at each wing loading of the
 * map, the least loading at which the probability reaches the level,
 * interpolated linearly between grid rows; NaN where it never does. The
 * probability never falls as loading rises, so the contour is a function of
 * wing loading.
 */
export function probabilityFrontier(
  map: { wingLoadings: ArrayLike<number>; loadings: ArrayLike<number>; probability: ArrayLike<number> },
  level: number,
): Float64Array {
  const nx = map.wingLoadings.length;
  const ny = map.loadings.length;
  const out = new Float64Array(nx).fill(NaN);
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = map.probability[j * nx + i];
      if (p < level) continue;
      if (j === 0) out[i] = map.loadings[0];
      else {
        const below = map.probability[(j - 1) * nx + i];
        const t = (level - below) / (p - below);
        out[i] = map.loadings[j - 1] + t * (map.loadings[j] - map.loadings[j - 1]);
      }
      break;
    }
  }
  return out;
}
