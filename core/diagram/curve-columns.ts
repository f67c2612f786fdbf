/**
 * The diagram's curves sampled into columns: the wing loadings and one
 * Float64Array per curve, NaN where the curve cannot be met, with their
 * envelope. The evaluation's `points` ([w, y] pairs, null in the gaps) are
 * read from these columns only when something asks for them.
 */
import type { Evaluation } from '../evaluation';
import type { CurveBoundary } from './envelope';

export interface CurveColumns {
  /** Increasing wing loadings [Pa]. */
  wingLoadingsPa: Float64Array;
  /** Ids of the curves, in the evaluation's order of curve boundaries. */
  ids: string[];
  /** Required loading of each curve at each wing loading; NaN where it cannot be met. */
  curves: Float64Array[];
  /** max over the curves; NaN where any cannot be met; -Infinity with no curves. */
  envelope: Float64Array;
}

/** Every curve at every wing loading, and the envelope, in one pass per curve. */
export function sampleCurves(curves: readonly CurveBoundary[], wingLoadingsPa: Float64Array): CurveColumns {
  const n = wingLoadingsPa.length;
  const envelope = new Float64Array(n).fill(-Infinity);
  const columns = curves.map((curve) => {
    const column = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const y = curve.required(wingLoadingsPa[i]);
      if (Number.isFinite(y)) {
        column[i] = y;
        if (y > envelope[i]) envelope[i] = y; // NaN stays NaN
      } else {
        column[i] = NaN;
        envelope[i] = NaN;
      }
    }
    return column;
  });
  return { wingLoadingsPa, ids: curves.map((c) => c.id), curves: columns, envelope };
}

/** True when the column has a value somewhere. */
export function anyDefined(column: Float64Array): boolean {
  for (let i = 0; i < column.length; i++) if (column[i] === column[i]) return true;
  return false;
}

/** The [w, y] pairs of one column, null where it is NaN (the evaluation's `points`). */
export function columnPoints(wingLoadingsPa: Float64Array, column: Float64Array): Array<[number, number | null]> {
  const out: Array<[number, number | null]> = new Array(column.length);
  for (let i = 0; i < column.length; i++) {
    const y = column[i];
    out[i] = [wingLoadingsPa[i], y === y ? y : null];
  }
  return out;
}

const columnsByEvaluation = new WeakMap<Evaluation, CurveColumns>();
/** Curve boundaries whose points were replaced after the evaluation: their columns no longer say what they hold. */
const replacedPoints = new WeakSet<object>();

/** Notes that a curve boundary's points were replaced. */
export function markPointsReplaced(boundary: object): void {
  replacedPoints.add(boundary);
}

/** Remembers the columns an evaluation was made from. */
export function keepColumns(evaluation: Evaluation, columns: CurveColumns): void {
  columnsByEvaluation.set(evaluation, columns);
}

/**
 * The columns an evaluation was made from, when it came from evaluateDesign
 * in this process and its points were not replaced since; undefined for one
 * read back from JSON or passed between processes (use its `points` then).
 */
export function columnsOf(evaluation: Evaluation): CurveColumns | undefined {
  const columns = columnsByEvaluation.get(evaluation);
  if (!columns) return undefined;
  for (const boundary of evaluation.boundaries) if (replacedPoints.has(boundary)) return undefined;
  return columns;
}
