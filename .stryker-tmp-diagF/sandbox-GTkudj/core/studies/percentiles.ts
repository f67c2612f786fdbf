/**
 * Summaries of a sampled quantity.
 */
// @ts-nocheck


export interface Spread {
  mean: number;
  p5: number;
  p50: number;
  p95: number;
}

/** Nearest-rank percentile of ascending values: the ceil(p N)-th smallest (common practice). */
function nearestRank(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  return sorted[Math.min(n - 1, Math.max(0, Math.ceil(p * n) - 1))];
}

/** Mean and 5th, 50th and 95th percentiles of the finite values; NaN when there are none. */
export function spreadOf(values: ArrayLike<number>): Spread {
  const finite = Float64Array.from(values).filter((x) => Number.isFinite(x)).sort();
  let sum = 0;
  for (let i = 0; i < finite.length; i++) sum += finite[i];
  return {
    mean: finite.length > 0 ? sum / finite.length : NaN,
    p5: nearestRank(finite, 0.05),
    p50: nearestRank(finite, 0.5),
    p95: nearestRank(finite, 0.95),
  };
}
