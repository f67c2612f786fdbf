/**
 * What every section of the report reads: the design, its evaluation, the
 * display units, and the words for the diagram's vertical axis.
 */
// @ts-nocheck

import { formatMargin, formatQuantity, type Design, type Evaluation, type MarginJson, type UnitSystem } from '../../core';

export interface ReportContext {
  design: Design;
  evaluation: Evaluation;
  system: UnitSystem;
  /** "power-to-weight" or "thrust-to-weight". */
  axisWords: string;
  /** "P/W" or "T/W". */
  axisSymbol: string;
  /** A loading in display units: "10.52 W/N", "0.297". */
  loading: (value: number | null | undefined) => string;
  wingLoading: (value: number | null | undefined) => string;
}

export function reportContext(design: Design, evaluation: Evaluation, system: UnitSystem): ReportContext {
  const thrust = evaluation.axis === 'thrustToWeight';
  return {
    design,
    evaluation,
    system,
    axisWords: thrust ? 'thrust-to-weight' : 'power-to-weight',
    axisSymbol: thrust ? 'T/W' : 'P/W',
    loading: (value) => formatQuantity(value, evaluation.axis, system),
    wingLoading: (value) => formatQuantity(value, 'wingLoading', system),
  };
}

/** The optimum's or design point's loading on the evaluation's axis. */
export function loadingOf(point: { powerToWeight?: number; thrustToWeight?: number } | null | undefined, evaluation: Evaluation): number | undefined {
  const value = point?.[evaluation.axis];
  return typeof value === 'number' ? value : undefined;
}

export function marginText(margins: readonly MarginJson[] | undefined, id: string): string {
  const found = margins?.find((margin) => margin.id === id);
  return found ? formatMargin(found.margin) : '—';
}

export function marginValue(margins: readonly MarginJson[] | undefined, id: string): number {
  const found = margins?.find((margin) => margin.id === id);
  return found && Number.isFinite(found.margin) ? found.margin : NaN;
}

export function capitalise(value: string): string {
  return value.charAt(0).toUpperCase() + value.slice(1);
}
