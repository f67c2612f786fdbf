/**
 * The render budget: a diagram draws at most about DRAWN_SAMPLES points per
 * boundary, whatever the evaluation sampled (up to 5,000). A plot a few
 * hundred pixels wide shows no more; the optimum, margins and sizing are
 * computed from every sample and are not affected. Every curve keeps the
 * same sample positions (so the envelope is taken point by point), and the
 * samples on either side of a gap (a requirement that cannot be met there)
 * are kept so gaps are drawn where they are.
 */
// @ts-nocheck

import type { BoundaryJson } from '../../core/evaluation';

export const DRAWN_SAMPLES = 500;

/** Indices of the samples to draw, shared by every curve; undefined when all are drawn. */
export function drawnIndices(boundaries: readonly BoundaryJson[], budget = DRAWN_SAMPLES): number[] | undefined {
  const curves = boundaries.flatMap((boundary) => ('points' in boundary ? [boundary.points] : []));
  const count = curves.reduce((most, points) => Math.max(most, points.length), 0);
  if (count <= budget) return undefined;
  const stride = Math.ceil(count / budget);
  const keep = new Uint8Array(count);
  for (let i = 0; i < count; i += stride) keep[i] = 1;
  keep[count - 1] = 1;
  for (const points of curves) {
    for (let i = 1; i < points.length; i++) {
      const before = points[i - 1][1];
      const here = points[i][1];
      const definedBefore = before !== null && Number.isFinite(before);
      const definedHere = here !== null && Number.isFinite(here);
      if (definedBefore !== definedHere) {
        keep[i - 1] = 1;
        keep[i] = 1;
      }
    }
  }
  const indices: number[] = [];
  for (let i = 0; i < count; i++) if (keep[i]) indices.push(i);
  return indices;
}
