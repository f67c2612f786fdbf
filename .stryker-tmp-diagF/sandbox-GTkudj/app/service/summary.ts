/**
 * The compact evaluation kept beside each version: enough to list, show and
 * compare versions without re-evaluating (a few hundred bytes, not the curves).
 */
// @ts-nocheck

import type { Evaluation, MarginJson } from '../../core';
import type { EvaluationSummary, MarginValue } from './contract';

const MAX_WARNINGS = 20;

/** A finite number or null: NaN and infinities never reach JSON or a screen. */
function finiteOrNull(value: unknown): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

function margins(list: readonly MarginJson[] | undefined): MarginValue[] {
  return (list ?? []).map((entry) => ({ id: entry.id, margin: finiteOrNull(entry.margin) }));
}

function loadingOf(point: Record<string, unknown>, axis: EvaluationSummary['axis']): number | null {
  return finiteOrNull(point[axis]);
}

export function summarise(evaluation: Evaluation): EvaluationSummary {
  const axis = evaluation.axis;
  const optimum = evaluation.optimum;
  const optimumLoading = optimum ? loadingOf(optimum as unknown as Record<string, unknown>, axis) : null;
  const design = evaluation.designPoint;
  const designLoading = design ? loadingOf(design as unknown as Record<string, unknown>, axis) : null;
  const sizing = evaluation.sizing;
  const speeds = evaluation.speeds;
  return {
    format: 'loftpoint-version-summary/1',
    axis,
    optimum:
      optimum && finiteOrNull(optimum.wingLoading) !== null && optimumLoading !== null
        ? {
            wingLoading: optimum.wingLoading,
            loading: optimumLoading,
            active: [...optimum.active],
            margins: margins(optimum.margins),
            ...(optimum.unbounded ? { unbounded: true } : {}),
          }
        : null,
    designPoint:
      design && finiteOrNull(design.wingLoading) !== null && designLoading !== null
        ? { wingLoading: design.wingLoading, loading: designLoading, feasible: design.feasible, margins: margins(design.margins) }
        : null,
    sizing:
      sizing && finiteOrNull(sizing.wingArea) !== null
        ? {
            wingArea: sizing.wingArea,
            ...(finiteOrNull(sizing.power) !== null ? { power: sizing.power } : {}),
            ...(finiteOrNull(sizing.thrust) !== null ? { thrust: sizing.thrust } : {}),
          }
        : null,
    speeds:
      speeds && [speeds.stall, speeds.minimumDrag, speeds.minimumPower].every((v) => finiteOrNull(v) !== null)
        ? { stall: speeds.stall, minimumDrag: speeds.minimumDrag, minimumPower: speeds.minimumPower }
        : null,
    warningCount: evaluation.warnings.length,
    warnings: evaluation.warnings
      .slice(0, MAX_WARNINGS)
      .map((warning) => (warning.field ? `${warning.field}: ${warning.message}` : warning.message)),
  };
}

/** The summary of a valid concept the engine failed on: the version is still kept. */
export function failedSummary(axis: EvaluationSummary['axis'], message: string): EvaluationSummary {
  return {
    format: 'loftpoint-version-summary/1',
    axis,
    optimum: null,
    designPoint: null,
    sizing: null,
    speeds: null,
    warningCount: 0,
    warnings: [],
    error: message.split('\n')[0],
  };
}
