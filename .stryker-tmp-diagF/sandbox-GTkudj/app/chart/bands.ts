/**
 * Boundary bands as plot series: each requirement's boundary over its
 * assumptions' ranges (core `boundaryBands`, SI) turned into display units,
 * coloured like the boundary it surrounds. A limit becomes a strip between
 * its least and greatest wing loading; a curve a ribbon between its lower
 * and upper required loading.
 */
// @ts-nocheck

import type { BoundaryBand } from '../../core/studies/bands';
import type { LoadingAxis } from '../../core/model';
import { toDisplay, type UnitSystem } from '../../core/units/display';
import { kindColour } from './palette';

interface BandCommon {
  id: string;
  kind: string;
  colour: string;
  /** Assumptions that widen this band (concept-file paths); empty when none is ranged. */
  fields: string[];
}

export interface LimitBandSeries extends BandCommon {
  type: 'limit';
  /** [least, greatest] wing-loading limit, display units. */
  range: [number, number];
}

export interface CurveBandSeries extends BandCommon {
  type: 'curve';
  /**
   * [wing loading, lower, upper] in display units. `lower` null: no
   * combination of the ranges meets the requirement there; `upper` null: some
   * combination cannot, so the band is open above.
   */
  points: Array<[number, number | null, number | null]>;
}

export type BandSeries = LimitBandSeries | CurveBandSeries;

const shown = (value: number, quantity: 'wingLoading' | LoadingAxis, system: UnitSystem): number | null =>
  Number.isFinite(value) ? toDisplay(value, quantity, system) : null;

/** Bands in display units; a band whose numbers are all undefined is left out. */
export function bandSeries(bands: readonly BoundaryBand[], axis: LoadingAxis, system: UnitSystem): BandSeries[] {
  const out: BandSeries[] = [];
  for (const band of bands) {
    const common = { id: band.id, kind: band.kind, colour: kindColour(band.kind), fields: [...band.fields] };
    if (band.type === 'limit') {
      const [lo, hi] = band.limits;
      if (Number.isFinite(lo) && Number.isFinite(hi)) {
        out.push({ ...common, type: 'limit', range: [toDisplay(lo, 'wingLoading', system), toDisplay(hi, 'wingLoading', system)] });
      }
      continue;
    }
    const points = band.wingLoadings.map((w, i): [number, number | null, number | null] => [
      toDisplay(w, 'wingLoading', system),
      shown(band.lower[i], axis, system),
      shown(band.upper[i], axis, system),
    ]);
    if (points.some(([, lower]) => lower !== null)) out.push({ ...common, type: 'curve', points });
  }
  return out;
}

/** True when the band has width anywhere: some ranged assumption moves the boundary. */
export function bandHasWidth(band: BandSeries): boolean {
  if (band.type === 'limit') return band.range[1] > band.range[0];
  return band.points.some(([, lower, upper]) => lower !== null && (upper === null || upper > lower));
}

/** A point of a curve band as drawn: wing loading, lower and upper edge. */
export type BandPoint = [number, number, number];

/**
 * A curve band split into runs of two or more points where it is defined
 * (a null lower edge ends a run), each point placed by `place`, which may
 * also drop a point by returning null. Shared by the SVG and the window.
 */
export function curveBandRuns(band: CurveBandSeries, place: (lower: number, upper: number | null) => [number, number] | null): BandPoint[][] {
  const runs: BandPoint[][] = [];
  let run: BandPoint[] = [];
  for (const [x, lower, upper] of band.points) {
    if (lower === null) {
      if (run.length > 1) runs.push(run);
      run = [];
      continue;
    }
    const placed = place(lower, upper);
    if (placed) run.push([x, placed[0], placed[1]]);
  }
  if (run.length > 1) runs.push(run);
  return runs;
}

/** A plotted value kept within a tenth of the view's span beyond it, so paths stay short; the clip hides the rest. */
export function clampToView(y: number, domain: readonly number[]): number {
  const [lo, hi] = domain;
  const span = hi - lo;
  return Math.min(Math.max(y, lo - 0.1 * span), hi + 0.1 * span);
}
