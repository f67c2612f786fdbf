/**
 * What the right-hand panel shows for a point on the diagram: each
 * requirement's margin (tightest first), whether the point is feasible, and
 * the wing area, installed power or thrust and characteristic speeds it means.
 * The boundaries are built once per design, so a drag only evaluates them at
 * one point. With a mission the take-off mass is closed at the point's wing
 * loading (the mission flies the wing that wing loading gives), and the
 * sizing is at that mass, as the evaluation does it.
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
  type MassJson,
  type SizingJson,
  type SpeedsJson,
} from '../../../../core';
import { missionMass } from '../../../../core/mission';
import { missionProblem, notClosedText } from '../mission/mission-problem';

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
  /** The take-off mass closed from the mission at this point; null without a mission or when none closes. */
  mass: MassJson | null;
  /** Why the mission does not close here, in the engine's words; null when it closes or there is none. */
  massProblem: string | null;
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
  const problemOf = (warnings: Evaluation['warnings']) => missionProblem([], warnings);
  // The evaluation closed the mass at the design point's wing loading (else the optimum's): reuse it there.
  const evaluatedAt = evaluation.designPoint?.wingLoading ?? evaluation.optimum?.wingLoading;
  const closedAt = (wingLoadingPa: number): { mass: MassJson | null; massProblem: string | null } => {
    const mission = design.mission;
    if (!mission) return { mass: null, massProblem: null };
    if (wingLoadingPa === evaluatedAt) return { mass: evaluation.mass ?? null, massProblem: problemOf(evaluation.warnings) };
    // The drivers (a dozen closures) are for the sensitivity tab, which reads the evaluation's; a drag needs only the mass.
    const result = missionMass(mission, design.aircraft, wingLoadingPa, { drivers: false });
    return result.ok ? { mass: result.mass, massProblem: null } : { mass: null, massProblem: notClosedText(result.message) };
  };
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
        mass: evaluation.mass ?? null,
        massProblem: design.mission ? problemOf(evaluation.warnings) : null,
      };
    }
    const { wingLoadingPa, loading } = point;
    const margins = entries.map(({ boundary }) => ({ id: boundary.id, margin: marginOf(boundary, wingLoadingPa, loading) }));
    const closed = closedAt(wingLoadingPa);
    const aircraft = closed.mass ? { ...design.aircraft, takeoffMassKg: closed.mass.takeoff } : design.aircraft;
    // No closed mass and none written: nothing to size at.
    const sizing = design.mission && !closed.mass && !design.mission.takeoffMassGiven ? null : sizingAt(aircraft, axis, wingLoadingPa, loading);
    return {
      source: 'design point',
      wingLoadingPa,
      loading,
      feasible: allMet(margins),
      margins: tightestFirst(margins),
      sizing,
      speeds: reportedSpeeds(design.aircraft, wingLoadingPa, design.requirements),
      ...closed,
    };
  };
}
