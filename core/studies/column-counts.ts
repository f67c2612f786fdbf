/**
 * The tally behind a probability map. A sample meets (w, y) when w is at or
 * below every limit and its envelope E(w) = max_i y_i(w) is at or below y;
 * so each grid column only needs, per sample, the first grid loading at or
 * above E(w). Counting that row per column, then summing upwards, gives the
 * fraction of samples meeting every grid point.
 */
import type { Boundary } from '../model';
import { firstRowAtOrAbove } from './probability-grid';

interface ColumnCounts {
  ws: Float64Array;
  ys: Float64Array;
  /** counts[i * (ny + 1) + k]: samples whose first row at or above E(ws[i]) is k; k = ny means none. */
  counts: Uint32Array;
  /** Least limit and envelope of the boundaries no ranged assumption moves. */
  fixedCap: number;
  fixedEnvelope: Float64Array;
}

/** Empty counts, with the fixed boundaries worked out once. */
export function columnCounts(ws: Float64Array, ys: Float64Array, fixed: readonly Boundary[]): ColumnCounts {
  let fixedCap = Infinity;
  const fixedEnvelope = new Float64Array(ws.length);
  for (const b of fixed) {
    if (b.type === 'limit') fixedCap = Math.min(fixedCap, b.wingLoadingMaxPa);
    else for (let i = 0; i < ws.length; i++) {
      const y = b.required(ws[i]);
      fixedEnvelope[i] = y <= Infinity ? Math.max(fixedEnvelope[i], y) : Infinity;
    }
  }
  return { ws, ys, counts: new Uint32Array(ws.length * (ys.length + 1)), fixedCap, fixedEnvelope };
}

/**
 * Count one sample from its own limits and curves. Returns the grid column
 * of least envelope (ties to the larger wing loading) and that envelope, or
 * null when no column is met on the grid.
 */
export function countSample(
  tally: ColumnCounts,
  limits: readonly number[],
  curves: ReadonlyArray<(w: number) => number>,
): { column: number; loading: number } | null {
  const { ws, ys, counts, fixedEnvelope } = tally;
  const ny = ys.length;
  const top = ys[ny - 1];
  // Above this no envelope can tie with one on the grid (the tie band of the top row), nor be counted on it.
  const beyondTies = top + Math.abs(top) * 1e-9;
  let cap = tally.fixedCap;
  for (const limit of limits) cap = Math.min(cap, limit);
  let bestColumn = -1;
  let bestY = Infinity;
  for (let i = 0; i < ws.length; i++) {
    const w = ws[i];
    if (!(w <= cap)) {
      counts[i * (ny + 1) + ny]++;
      continue;
    }
    let e = fixedEnvelope[i];
    // Once beyond the top row's tie band the other curves change neither the count nor the optimum.
    for (let c = 0; c < curves.length && e <= beyondTies; c++) {
      const y = curves[c](w);
      e = y <= Infinity ? (y > e ? y : e) : Infinity;
    }
    counts[i * (ny + 1) + firstRowAtOrAbove(ys, e)]++;
    if (e <= bestY + Math.abs(bestY) * 1e-9) [bestColumn, bestY] = [i, Math.min(e, bestY)];
  }
  return bestColumn >= 0 && bestY <= top ? { column: bestColumn, loading: bestY } : null;
}

/** The fraction of `samples` meeting each grid point, row-major by loading: P(ws[i], ys[j]) at j * nx + i. */
export function probabilityOf(tally: ColumnCounts, samples: number): Float32Array {
  const nx = tally.ws.length;
  const ny = tally.ys.length;
  const probability = new Float32Array(nx * ny);
  const n = Math.max(samples, 1);
  for (let i = 0; i < nx; i++) {
    let cumulative = 0;
    for (let j = 0; j < ny; j++) {
      cumulative += tally.counts[i * (ny + 1) + j];
      probability[j * nx + i] = cumulative / n;
    }
  }
  return probability;
}
