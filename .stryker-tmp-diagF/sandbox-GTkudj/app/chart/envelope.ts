/**
 * The upper envelope of the curves: at each sample, the loading that meets
 * every curve requirement (core/methods.md section 7, E(w) = max_i y_i(w)).
 */
// @ts-nocheck

import { isDefinedPoint, valueAt, type Samples } from './clip';
import type { CurveSeries } from './series-types';

/** max over curves of the required loading at each sample of the first curve's grid; null where any curve is. */
export function upperEnvelope(curves: readonly CurveSeries[], range: readonly [number, number]): Array<[number, number | null]> {
  if (curves.length === 0) return [[range[0], 0], [range[1], 0]];
  const grid = curves[0].points.map((point) => point[0]);
  return grid.map((x, i) => {
    let top = 0;
    for (const curve of curves) {
      const own = curve.points[i];
      const y = own && own[0] === x ? (isDefinedPoint(own) ? own[1] : null) : valueAt(curve.points as Samples, x);
      if (y === null) return [x, null];
      top = Math.max(top, y);
    }
    return [x, top];
  });
}
