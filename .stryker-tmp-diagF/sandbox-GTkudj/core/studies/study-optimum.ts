/**
 * The optimum of a varied design, found by the engine's own search
 * (core/diagram findOptimum) over the range the diagram would plot for it.
 */
// @ts-nocheck

import { defaultWingLoadingRange, findOptimum, requirementBoundaries, wingLoadingCap, type RequirementBoundary } from '../diagram';
import type { Design } from '../model';
import { G0 } from '../units/factors';

export interface StudyOptimum {
  wingLoadingPa: number;
  /** W/N for propeller kinds, T/W for turbofan. */
  loading: number;
  /** True when it sits on the right edge of the plotted range. */
  unbounded: boolean;
}

/** The range evaluateDesign plots: the concept's own when valid, else one that shows every boundary. */
export function plotRangeOf(design: Design, entries: readonly RequirementBoundary[] = requirementBoundaries(design)): [number, number] {
  const given = design.diagram.wingLoadingRangePa;
  if (given && Number.isFinite(given[0]) && Number.isFinite(given[1]) && given[0] > 0 && given[1] > given[0]) {
    return [given[0], given[1]];
  }
  const curves = entries.flatMap(({ boundary }) => (boundary.type === 'curve' ? [boundary.required] : []));
  const limits = entries.flatMap(({ boundary }) => (boundary.type === 'limit' ? [boundary.wingLoadingMaxPa] : []));
  return defaultWingLoadingRange(curves, limits, design.designPoint?.wingLoadingPa);
}

/** The least-power (or thrust) point of the design; null when no plotted wing loading meets every requirement. */
export function optimumOf(design: Design): StudyOptimum | null {
  const entries = requirementBoundaries(design);
  const curves = entries.flatMap(({ boundary }) => (boundary.type === 'curve' ? [boundary.required] : []));
  const limits = entries.flatMap(({ boundary }) => (boundary.type === 'limit' ? [boundary] : []));
  const found = findOptimum(curves, wingLoadingCap(limits), plotRangeOf(design, entries));
  return found ? { wingLoadingPa: found.wingLoadingPa, loading: found.loading, unbounded: found.unbounded } : null;
}

/** Wing area [m^2] and installed sea-level power [W] or thrust [N] at take-off mass (S = W/w, P = y W; core/methods.md section 7). */
export function sizeOf(design: Design, point: StudyOptimum): { wingAreaM2: number; installed: number } {
  const weight = design.aircraft.takeoffMassKg * G0;
  return { wingAreaM2: weight / point.wingLoadingPa, installed: point.loading * weight };
}
