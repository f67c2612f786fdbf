/**
 * Wing loadings at which the diagram's curves are given.
 */

/** `samples` points evenly spaced over [lo, hi], both ends included exactly. */
export function sampleWingLoadings(range: readonly [number, number], samples: number): Float64Array {
  const [lo, hi] = range;
  const count = Math.max(2, Math.floor(samples));
  const out = new Float64Array(count);
  const step = (hi - lo) / (count - 1);
  for (let i = 0; i < count - 1; i++) out[i] = lo + i * step;
  out[count - 1] = hi;
  return out;
}
