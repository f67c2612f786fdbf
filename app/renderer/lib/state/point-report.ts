/**
 * What the right-hand panel shows for a point on the diagram: each
 * requirement's margin (tightest first), whether the point is feasible, and
 * the wing area, installed power or thrust and characteristic speeds it means.
 * The boundaries are built once per design, so a drag only evaluates them at
 * one point.
 */
import {
  allMet,
  marginOf,
  reportedSpeeds,
  requirementBoundaries,
  sizingAt,
  atClosedMass,
  type Design,
  type Evaluation,
  type MarginJson,
  type SizingJson,
  type SpeedsJson,
} from '../../../../core';

export interface PointReport {
  /** 'design point' when the concept has one, else 'optimum'. */
  source: 'design point' | 'optimum';
  wingLoadingPa: number;
  loading: number;
  feasible: boolean;
  /** Tightest (smallest) margin first. */
  margins: MarginJson[];
  sizing: SizingJson | null;
  speeds: SpeedsJson;
}

export type PointReporter = (point: { wingLoadingPa: number; loading: number } | null) => PointReport | null;

export function tightestFirst(margins: readonly MarginJson[]): MarginJson[] {
  const key = (margin: number) => (Number.isFinite(margin) ? margin : -Infinity);
  return [...margins].sort((a, b) => key(a.margin) - key(b.margin));
}

/** A reporter for one design: the optimum's report when given no point. */
export function pointReporter(written: Design, evaluation: Evaluation): PointReporter {
  // Sizing at the mass the evaluation closed from the mission, where there is one (held while a point is dragged).
  const design = atClosedMass(written, evaluation);
  const entries = requirementBoundaries(design);
  const axis = evaluation.axis;
  return (point) => {
    if (point === null) {
      const optimum = evaluation.optimum;
      const loading = optimum?.[axis];
      if (!optimum || typeof loading !== 'number') return null;
      return {
        source: 'optimum',
        wingLoadingPa: optimum.wingLoading,
        loading,
        feasible: true,
        margins: tightestFirst(optimum.margins),
        sizing: evaluation.sizing,
        speeds: evaluation.speeds,
      };
    }
    const { wingLoadingPa, loading } = point;
    const margins = entries.map(({ boundary }) => ({ id: boundary.id, margin: marginOf(boundary, wingLoadingPa, loading) }));
    return {
      source: 'design point',
      wingLoadingPa,
      loading,
      feasible: allMet(margins),
      margins: tightestFirst(margins),
      sizing: sizingAt(design.aircraft, axis, wingLoadingPa, loading),
      speeds: reportedSpeeds(design.aircraft, wingLoadingPa, design.requirements),
    };
  };
}
