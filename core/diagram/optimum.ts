/**
 * The design point of least power or thrust (core/methods.md section 7):
 * w* = argmin E(w) on (w_lo, w_lim], w_lim = min(limits, plot maximum);
 * ties (relative 1e-9) go to the largest wing loading.
 */
import { envelopeAt, type RequiredLoading } from './envelope';
import { goldenMinimum, lastWithin, tieBand } from './line-search';

/** core/methods.md section 7 searches a 4000-point grid; every search here is at least that fine near a minimum. */
export const SEARCH_GRID_POINTS = 4000;
/** Points of the coarse grid when the caller has no samples of the envelope to offer. */
export const COARSE_GRID_POINTS = 250;
/** Relative tolerance within which two loadings tie (core/methods.md section 7). */
export const TIE_TOLERANCE = 1e-9;
/** Local minima of the coarse grid within this fraction of the lowest one are all refined. */
const CANDIDATE_BAND = 1e-2;
const MAX_CANDIDATES = 8;

export interface Optimum {
  wingLoadingPa: number;
  loading: number;
  /** True when the optimum sits on the right edge of the plotted range. */
  unbounded: boolean;
}

/** The envelope already evaluated at increasing wing loadings (NaN where it cannot be met). */
export interface EnvelopeSamples {
  wingLoadingsPa: Float64Array;
  envelope: Float64Array;
}

type Envelope = (w: number) => number;

const tieLimit = (y: number): number => tieBand(y, TIE_TOLERANCE);

/** Index of the lowest finite value (ties to the largest index); -1 if none is finite. */
function lowestIndex(ys: Float64Array): number {
  let best = -1;
  for (let i = 0; i < ys.length; i++) {
    if (ys[i] <= Infinity && (best < 0 || ys[i] <= tieLimit(ys[best]))) best = i;
  }
  return best;
}

/** Indices of the low local minima of a grid, lowest first; a flat run is represented by its last point. */
function candidateMinima(ys: Float64Array, lowest: number): number[] {
  const band = lowest + Math.abs(lowest) * CANDIDATE_BAND;
  const out: number[] = [];
  for (let i = 0; i < ys.length; i++) {
    const y = ys[i];
    if (!(y <= band)) continue;
    const left = i > 0 ? ys[i - 1] : NaN;
    const next = i < ys.length - 1 ? ys[i + 1] : NaN;
    if (left < y - Math.abs(y) * TIE_TOLERANCE) continue; // not a local minimum; NaN neighbours count as higher
    if (next <= tieLimit(y)) continue;
    out.push(i);
  }
  return out.sort((p, q) => ys[p] - ys[q]).slice(0, MAX_CANDIDATES);
}

/**
 * One coarse minimum refined: a fine grid over [a, b] spaced like a
 * 4000-point grid over the span, golden section around its lowest point,
 * then right across any tie.
 */
function refine(f: Envelope, a: number, b: number, span: number): [number, number] {
  const n = Math.max(9, Math.ceil(((b - a) * (SEARCH_GRID_POINTS - 1)) / span) + 1);
  const ws = new Float64Array(n);
  const ys = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    ws[i] = i === n - 1 ? b : a + ((b - a) * i) / (n - 1);
    ys[i] = f(ws[i]);
  }
  const j = lowestIndex(ys);
  let w = ws[j];
  let y = ys[j];
  const [gw, gy] = goldenMinimum(f, ws[Math.max(0, j - 1)], ws[Math.min(n - 1, j + 1)]);
  if (gy < y) [w, y] = [gw, gy];
  if (j < n - 1) w = lastWithin(f, w, ws[j + 1], tieLimit(y));
  return [w, y];
}

/** The coarse grid: the caller's samples left of `right`, then `right` itself; else an even grid. */
function coarseGrid(f: Envelope, lo: number, right: number, samples?: EnvelopeSamples): [Float64Array, Float64Array] {
  if (samples) {
    let m = 0;
    while (m < samples.wingLoadingsPa.length && samples.wingLoadingsPa[m] < right) m++;
    const ws = new Float64Array(m + 1);
    const ys = new Float64Array(m + 1);
    ws.set(samples.wingLoadingsPa.subarray(0, m));
    ys.set(samples.envelope.subarray(0, m));
    ws[m] = right;
    ys[m] = f(right);
    return [ws, ys];
  }
  const ws = new Float64Array(COARSE_GRID_POINTS);
  const ys = new Float64Array(COARSE_GRID_POINTS);
  for (let i = 0; i < COARSE_GRID_POINTS; i++) {
    ws[i] = i === COARSE_GRID_POINTS - 1 ? right : lo + ((right - lo) * i) / (COARSE_GRID_POINTS - 1);
    ys[i] = f(ws[i]);
  }
  return [ws, ys];
}

/**
 * The optimum over [lo, min(cap, hi)]. A coarse grid (the plotted samples
 * when given, which must start at lo) finds the low local minima; each is
 * searched again on a fine grid as fine as the methods reference's (core/methods.md) 4000-point grid,
 * refined by golden section and moved right across any tie. Null when no
 * wing loading in the span can be met.
 *
 * A dip narrower than the coarse spacing can be missed, where a 4000-point
 * grid over the whole span would find it. Constraint envelopes are maxima of
 * smooth curves: their minima are crossings or broad valleys, never that narrow.
 */
export function findOptimum(
  required: readonly RequiredLoading[],
  capPa: number,
  range: readonly [number, number],
  samples?: EnvelopeSamples,
): Optimum | null {
  const [lo, hi] = range;
  const right = Math.min(capPa, hi);
  if (!(right >= lo)) return null;
  const f = (w: number): number => envelopeAt(required, w);
  const unbounded = (w: number): boolean => right === hi && w >= hi * (1 - 1e-6);
  if (required.length === 0) return { wingLoadingPa: right, loading: 0, unbounded: unbounded(right) };
  if (right === lo) {
    const y = f(lo);
    return y <= Infinity ? { wingLoadingPa: lo, loading: y, unbounded: unbounded(lo) } : null;
  }

  const [ws, ys] = coarseGrid(f, lo, right, samples);
  const first = lowestIndex(ys);
  if (first < 0) return null;
  let bestW = NaN;
  let bestY = Infinity;
  for (const i of candidateMinima(ys, ys[first])) {
    const [w, y] = refine(f, ws[Math.max(0, i - 1)], ws[Math.min(ws.length - 1, i + 1)], right - lo);
    const lower = !(bestY <= tieLimit(y));
    const tiesFurtherRight = y <= tieLimit(bestY) && w > bestW;
    if (lower || tiesFurtherRight) [bestW, bestY] = [w, y];
  }
  // The tie rule over the whole span: on a flat envelope the grid's rounding
  // wobble makes many local minima, and the one at the largest wing loading
  // need not be among the candidates. Any grid point right of the best that
  // ties with it wins, moved right across the tie.
  const limit = tieLimit(bestY);
  for (let i = ws.length - 1; i >= 0 && ws[i] > bestW; i--) {
    if (ys[i] <= limit) {
      bestW = i < ws.length - 1 ? lastWithin(f, ws[i], ws[i + 1], limit) : ws[i];
      break;
    }
  }
  return { wingLoadingPa: bestW, loading: f(bestW), unbounded: unbounded(bestW) };
}
