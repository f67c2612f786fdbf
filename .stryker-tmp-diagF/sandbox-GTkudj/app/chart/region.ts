/**
 * The feasible region: wing loading at or below every limit and loading at or
 * above every curve (core/methods.md section 7), as polygons in display units,
 * clipped to the plotted loading range.
 */
// @ts-nocheck

import type { ChartData } from './data';
import { isDefinedPoint, valueAt, type XY } from './clip';

/**
 * Polygons of the feasible region below `loadingTop`. More than one when a
 * curve cannot be met over part of the range; none when nothing is feasible.
 */
export function feasibleRegion(data: ChartData, loadingTop: number): XY[][] {
  const [start] = data.wingLoadingRange;
  const limit = data.wingLoadingLimit;
  if (!(loadingTop > 0) || !(limit > start)) return [];
  return definedPieces(envelopeUpTo(data.envelope, limit))
    .map((piece) => polygonAbove(piece, loadingTop))
    .filter((polygon): polygon is XY[] => polygon !== null);
}

/** The envelope's samples up to the limit, ending exactly on it. */
function envelopeUpTo(envelope: ChartData['envelope'], limit: number): Array<[number, number | null]> {
  const kept = envelope.filter(([x]) => x <= limit);
  const last = kept[kept.length - 1];
  if (last && last[0] < limit) {
    const y = valueAt(envelope, limit);
    if (y !== null) kept.push([limit, y]);
  }
  return kept;
}

function definedPieces(samples: Array<[number, number | null]>): XY[][] {
  const pieces: XY[][] = [];
  let piece: XY[] = [];
  for (const point of samples) {
    if (isDefinedPoint(point)) {
      piece.push([point[0], point[1]]);
    } else {
      if (piece.length > 1) pieces.push(piece);
      piece = [];
    }
  }
  if (piece.length > 1) pieces.push(piece);
  return pieces;
}

/** The lower edge clamped to `top` (with exact crossings), closed along `top`; null if empty. */
function polygonAbove(piece: XY[], top: number): XY[] | null {
  const edge: XY[] = [];
  piece.forEach((point, i) => {
    const previous = piece[i - 1];
    if (previous && (previous[1] - top) * (point[1] - top) < 0) {
      const t = (top - previous[1]) / (point[1] - previous[1]);
      edge.push([previous[0] + (point[0] - previous[0]) * t, top]);
    }
    edge.push([point[0], Math.min(point[1], top)]);
  });
  if (edge.every(([, y]) => y >= top)) return null;
  const first = edge[0];
  const last = edge[edge.length - 1];
  return [...edge, [last[0], top], [first[0], top]];
}
