/**
 * How far a point on the diagram is from each requirement (core/methods.md
 * section 7). Positive means met.
 */
import type { Boundary, Design, DesignPoint } from '../model';
import type { MarginJson } from '../evaluation';
import { requirementBoundaries, type RequirementBoundary } from './boundaries';

/** Margins within this of zero still count as met, so the optimum itself is feasible. */
export const FEASIBLE_TOLERANCE = 1e-9;

/**
 * Limit: 1 - w/w_lim. Curve: y/y_i(w) - 1, which is -1 where the curve cannot
 * be met at any loading. A non-positive required loading is no requirement an
 * aircraft can have (the concept reader rejects the inputs that give one), so
 * it counts as not met (-1) rather than as met by any margin.
 */
export function marginOf(boundary: Boundary, wingLoadingPa: number, loading: number): number {
  if (boundary.type === 'limit') {
    const limit = boundary.wingLoadingMaxPa;
    return limit > 0 ? 1 - wingLoadingPa / limit : -1;
  }
  // Past a curve's stall line it is a limit: 1 - w/w_stall, not "no thrust can meet it".
  const stall = boundary.stallLimitPa;
  if (stall !== undefined && stall > 0 && wingLoadingPa > stall) return 1 - wingLoadingPa / stall;
  const required = boundary.required(wingLoadingPa);
  if (!Number.isFinite(required) || !(required > 0)) return -1;
  const margin = loading / required - 1;
  return Number.isFinite(margin) ? margin : -1;
}

export function marginsFor(entries: readonly RequirementBoundary[], wingLoadingPa: number, loading: number): MarginJson[] {
  return entries.map(({ boundary }) => ({ id: boundary.id, margin: marginOf(boundary, wingLoadingPa, loading) }));
}

/** True when every margin is met (within FEASIBLE_TOLERANCE). */
export function allMet(margins: readonly MarginJson[]): boolean {
  return margins.every((m) => m.margin >= -FEASIBLE_TOLERANCE);
}

/** The margin of every enabled requirement at a point of the diagram. */
export function marginsAt(design: Design, point: DesignPoint): MarginJson[] {
  return marginsFor(requirementBoundaries(design), point.wingLoadingPa, point.loading);
}
