/**
 * The wing-loading range drawn when the concept gives none: one that shows
 * every boundary.
 *
 * - Upper end: 1.3 x the largest wing-loading limit, so every limit line
 *   stands clear of the right edge. With no limit, twice the wing loading at
 *   which the envelope is lowest (searched over 50 Pa to 10 kPa), within
 *   250 Pa to 20 kPa; 150 psf when no curve can be met anywhere.
 * - Lower end: a tenth of the upper end, raised to where the envelope has
 *   climbed to 5 x its lowest value, so the steep left branch of the curves
 *   does not squash the rest of the picture.
 * - Both ends widen to keep a design point inside, then round outwards to
 *   two significant figures.
 */
// @ts-nocheck

import { PSF_PA } from '../units/factors';
import { definedEnvelopeAt, envelopeAt, type RequiredLoading } from './envelope';

const LIMIT_HEADROOM = 1.3;
const LOWER_FRACTION = 0.1;
const STEEP_RATIO = 5;
const FALLBACK_UPPER_PA = 150 * PSF_PA;
const SEARCH_PA: [number, number] = [50, 10000];

/** Wing loading at which f is lowest on a log grid, ties to the largest; NaN when f is never finite. */
function lowestOnLogGrid(f: (w: number) => number, [lo, hi]: [number, number], points: number): number {
  let best = Infinity;
  let at = NaN;
  for (let i = 0; i < points; i++) {
    const w = lo * Math.pow(hi / lo, i / (points - 1));
    const y = f(w);
    if (y <= best * (1 + 1e-9) + 1e-300) {
      if (y < best) best = y;
      at = w;
    }
  }
  return at;
}

function upperEnd(required: readonly RequiredLoading[], limitsPa: readonly number[]): number {
  const finite = limitsPa.filter((w) => Number.isFinite(w) && w > 0);
  if (finite.length > 0) return LIMIT_HEADROOM * Math.max(...finite);
  const strict = lowestOnLogGrid((w) => envelopeAt(required, w), SEARCH_PA, 61);
  const lowest = Number.isFinite(strict) ? strict : lowestOnLogGrid((w) => definedEnvelopeAt(required, w), SEARCH_PA, 61);
  if (!Number.isFinite(lowest)) return FALLBACK_UPPER_PA;
  return Math.min(Math.max(2 * lowest, 250), 20000);
}

function lowerEnd(required: readonly RequiredLoading[], hi: number): number {
  const lo = LOWER_FRACTION * hi;
  const points = 81;
  const values = new Float64Array(points);
  let lowest = Infinity;
  for (let i = 0; i < points; i++) {
    values[i] = definedEnvelopeAt(required, lo + ((hi - lo) * i) / (points - 1));
    if (values[i] < lowest) lowest = values[i];
  }
  if (!Number.isFinite(lowest) || lowest <= 0) return lo;
  for (let i = 0; i < points; i++) {
    if (values[i] <= STEEP_RATIO * lowest) return lo + ((hi - lo) * Math.max(0, i - 1)) / (points - 1);
  }
  return lo;
}

function roundDown(x: number): number {
  const unit = Math.pow(10, Math.floor(Math.log10(x)) - 1);
  return Math.floor(x / unit) * unit;
}

function roundUp(x: number): number {
  const unit = Math.pow(10, Math.floor(Math.log10(x)) - 1);
  return Math.ceil(x / unit) * unit;
}

/** [lo, hi] in Pa, finite and 0 < lo < hi. */
export function defaultWingLoadingRange(
  required: readonly RequiredLoading[],
  limitsPa: readonly number[],
  designPointPa?: number,
): [number, number] {
  let hi = upperEnd(required, limitsPa);
  let lo = lowerEnd(required, hi);
  if (designPointPa !== undefined && Number.isFinite(designPointPa) && designPointPa > 0) {
    hi = Math.max(hi, 1.1 * designPointPa);
    lo = Math.min(lo, 0.9 * designPointPa);
  }
  return [roundDown(lo), roundUp(hi)];
}
