// The median and spread of repeated timings, as the JavaScript benchmarks print them.

/** Median and 10th and 90th percentiles (nearest rank) of repeated timings. */
export function spread(xs) {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9) };
}

/** "412 ms (398-430)": a spread of milliseconds, whole. */
export const msText = (x) => `${Math.round(x.median)} ms (${Math.round(x.p10)}-${Math.round(x.p90)})`;
