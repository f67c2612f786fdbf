/**
 * One-dimensional searches used to refine the optimum between grid points.
 */

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** y plus its relative tolerance: values up to this tie with y. */
export function tieBand(y: number, relative: number): number {
  return y + Math.abs(y) * relative;
}

/** Golden-section minimum of f on [a, b] (Kiefer 1953), NaN counted as +Infinity; stops at 1e-7 relative width. */
export function goldenMinimum(f: (w: number) => number, a: number, b: number): [number, number] {
  const value = (w: number): number => {
    const y = f(w);
    return y <= Infinity ? y : Infinity;
  };
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = value(c);
  let fd = value(d);
  while (b - a > 1e-7 * b) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = value(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = value(d);
    }
  }
  return fc <= fd ? [c, fc] : [d, fd];
}

/**
 * The largest w in [from, to] with f(w) <= limit, by bisection, assuming one
 * crossing; `from` must qualify. A first probe 1e-4 x from right of `from`
 * settles the common case, a strict minimum, without bisecting; but when f is
 * level 1e-4 x from left of `from` too (a plateau), the crossing is bisected
 * for even when it lies between `from` and that probe.
 */
export function lastWithin(f: (w: number) => number, from: number, to: number, limit: number): number {
  const probe = Math.min(to, from * (1 + 1e-4));
  let ok = from;
  let bad = probe;
  if (f(probe) <= limit) {
    if (f(to) <= limit) return to;
    ok = probe;
    bad = to;
  } else {
    // A plateau only if f 1e-4 left of `from` equals f(from) to within the band.
    const here = f(from);
    const left = f(from * (1 - 1e-4));
    if (!(left <= limit && left >= here - (limit - here))) return from;
  }
  while (bad - ok > 1e-9 * bad) {
    const mid = 0.5 * (ok + bad);
    if (f(mid) <= limit) ok = mid;
    else bad = mid;
  }
  return ok;
}
