/**
 * The envelope of the curves, E(w) = max_i y_i(w), and the wing-loading cap
 * of the limits (core/methods.md section 7).
 */
import type { Boundary } from '../model';

export type CurveBoundary = Extract<Boundary, { type: 'curve' }>;
export type LimitBoundary = Extract<Boundary, { type: 'limit' }>;
/** Required loading at a wing loading; NaN where it cannot be met. */
export type RequiredLoading = (wingLoadingPa: number) => number;

/** E(w) = max_i y_i(w) (core/methods.md section 7); NaN where any curve cannot be met; 0 with no curves. */
export function envelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  let top = 0;
  for (let i = 0; i < required.length; i++) {
    const y = required[i](wingLoadingPa);
    if (!Number.isFinite(y)) return NaN;
    if (i === 0 || y > top) top = y;
  }
  return top;
}

/** The largest of the curves that can be met at w, ignoring those that cannot; NaN when none can. */
export function definedEnvelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  let top = NaN;
  for (let i = 0; i < required.length; i++) {
    const y = required[i](wingLoadingPa);
    if (Number.isFinite(y) && !(y <= top)) top = y;
  }
  return top;
}

/** The smallest wing-loading limit; Infinity with none. */
export function wingLoadingCap(limits: readonly LimitBoundary[]): number {
  let cap = Infinity;
  for (const limit of limits) if (limit.wingLoadingMaxPa < cap) cap = limit.wingLoadingMaxPa;
  return cap;
}
