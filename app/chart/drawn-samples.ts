/**
 * The render budget: a diagram draws at most about DRAWN_SAMPLES points per
 * boundary, whatever the evaluation sampled (up to 40,000). A plot a few
 * hundred pixels wide shows no more; the optimum, margins and sizing are
 * computed from every sample and are not affected. Every curve keeps the
 * same sample positions (so the envelope is taken point by point), and the
 * samples on either side of a gap (a requirement that cannot be met there)
 * are kept so gaps are drawn where they are.
 */
import type { BoundaryJson } from '../../core/evaluation';

export const DRAWN_SAMPLES = 500;

/** A sampled curve as the budget sees it: its length and where it has a value. */
interface Sampled {
  length: number;
  defined(i: number): boolean;
}

function indicesOf(curves: readonly Sampled[], budget: number): number[] | undefined {
  const count = curves.reduce((most, curve) => Math.max(most, curve.length), 0);
  if (count <= budget) return undefined;
  const stride = Math.ceil(count / budget);
  const keep = new Uint8Array(count);
  for (let i = 0; i < count; i += stride) keep[i] = 1;
  keep[count - 1] = 1;
  for (const curve of curves) {
    let definedBefore = curve.length > 0 && curve.defined(0);
    for (let i = 1; i < curve.length; i++) {
      const definedHere = curve.defined(i);
      if (definedBefore !== definedHere) {
        keep[i - 1] = 1;
        keep[i] = 1;
      }
      definedBefore = definedHere;
    }
  }
  const indices: number[] = [];
  for (let i = 0; i < count; i++) if (keep[i]) indices.push(i);
  return indices;
}

/** Indices of the samples to draw, shared by every curve; undefined when all are drawn. */
export function drawnIndices(boundaries: readonly BoundaryJson[], budget = DRAWN_SAMPLES): number[] | undefined {
  const curves = boundaries.flatMap((boundary) => ('points' in boundary ? [boundary.points] : []));
  return indicesOf(
    curves.map((points) => ({
      length: points.length,
      defined: (i: number) => {
        const y = points[i][1];
        return y !== null && Number.isFinite(y);
      },
    })),
    budget,
  );
}

/** The same indices from the engine's columns (NaN where a curve has no value). */
export function drawnColumnIndices(columns: readonly Float64Array[], budget = DRAWN_SAMPLES): number[] | undefined {
  return indicesOf(columns.map((column) => ({ length: column.length, defined: (i: number) => column[i] === column[i] })), budget);
}
