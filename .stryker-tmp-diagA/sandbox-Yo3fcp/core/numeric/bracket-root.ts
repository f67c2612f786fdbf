/**
 * A root of a monotone function of one variable by bracketing and
 * bisection: first widen an upper bracket, then halve it.
 */
// @ts-nocheck


/**
 * The x in [low, high·2^k] where f(x) crosses zero, for f that falls from
 * positive to negative with x (NaN or +Infinity count as positive, i.e. "not
 * reached yet"). The upper end doubles up to `maxHigh` until f is negative.
 * NaN when f is never negative below maxHigh, or already negative at low.
 * Bisection to a relative width of 1e-10 (at most 200 halvings).
 */
export function fallingRoot(f: (x: number) => number, low: number, high: number, maxHigh: number): number {
  const positive = (x: number): boolean => {
    const y = f(x);
    return !(y <= 0);
  };
  if (!(low < high) || !positive(low)) return NaN;
  let hi = high;
  while (positive(hi)) {
    if (hi >= maxHigh) return NaN;
    hi = Math.min(maxHigh, hi * 2);
  }
  let lo = low;
  for (let i = 0; i < 200 && hi - lo > 1e-10 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (positive(mid)) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
