/**
 * Each requirement's boundary drawn as a band over its assumptions' ranges
 * instead of one line: the envelope of the boundary over the corners of the
 * ranges of the assumptions that affect it (see corners.ts for the rule
 * above 8 assumptions). For a boundary monotone in each assumption, the usual
 * case, the corners hold its extremes.
 */
import { boundaryOf } from '../constraints';
import { sampleCurves } from '../diagram/curve-columns';
import type { CurveBoundary } from '../diagram/envelope';
import type { Design, Requirement, RequirementKind } from '../model';
import { applyValues, cornerValues, parametersAffecting, type CornerMethod } from './corners';
import type { UncertainParameter } from './uncertainty-schema';

interface BandCommon {
  id: string;
  kind: RequirementKind;
  label?: string;
  /** Fields of the assumptions the band spans. */
  fields: string[];
  method: CornerMethod;
  /** Designs evaluated (nominal included). */
  evaluated: number;
}

export interface LimitBand extends BandCommon {
  type: 'limit';
  /** The nominal wing-loading limit [Pa]. */
  nominal: number;
  /** [least, greatest] limit over the ranges [Pa]. */
  limits: [number, number];
}

export interface CurveBand extends BandCommon {
  type: 'curve';
  wingLoadings: number[];
  nominal: number[];
  /** Least required loading at each wing loading; NaN where no combination can meet it. */
  lower: number[];
  /** Greatest required loading; NaN where some combination cannot meet it at any loading (the band is open above). */
  upper: number[];
}

export type BoundaryBand = LimitBand | CurveBand;

/** A band for each enabled requirement, in the design's order. */
export function boundaryBands(design: Design, parameters: readonly UncertainParameter[], wingLoadings: ArrayLike<number>): BoundaryBand[] {
  const ws = Array.from(wingLoadings);
  return design.requirements.filter((r) => r.enabled).map((requirement) => bandOf(design, requirement, parameters, ws));
}

function bandOf(design: Design, requirement: Requirement, all: readonly UncertainParameter[], ws: number[]): BoundaryBand {
  const parameters = parametersAffecting(all, requirement.id);
  const { method, sets } = cornerValues(parameters);
  const common = {
    id: requirement.id,
    kind: requirement.kind,
    ...(requirement.label === undefined ? {} : { label: requirement.label }),
    fields: parameters.map((p) => p.field),
    method,
    evaluated: sets.length,
  };
  const boundaries = sets.map((values) => {
    const varied = applyValues(design, parameters, values);
    const own = varied.requirements.find((r) => r.id === requirement.id) as Requirement;
    return boundaryOf(own, varied.aircraft);
  });
  const first = boundaries[0];
  if (first.type === 'limit') {
    const limits = boundaries.map((b) => (b.type === 'limit' ? b.wingLoadingMaxPa : NaN));
    return { ...common, type: 'limit', nominal: first.wingLoadingMaxPa, limits: [Math.min(...limits), Math.max(...limits)] };
  }
  // Every corner's curve sampled into a column (NaN where it cannot be met), as the diagram samples its own.
  const curves = boundaries.filter((b): b is CurveBoundary => b.type === 'curve');
  const { curves: columns } = sampleCurves(curves, Float64Array.from(ws));
  const n = ws.length;
  const nominal = Array.from(columns[0]);
  const lower = new Array<number>(n).fill(NaN);
  const upper = new Array<number>(n).fill(NaN);
  const open = new Array<boolean>(n).fill(false);
  for (const column of columns) {
    for (let i = 0; i < n; i++) {
      const y = column[i];
      if (y !== y) open[i] = true;
      else {
        if (!(y >= lower[i])) lower[i] = y;
        if (!(y <= upper[i])) upper[i] = y;
      }
    }
  }
  for (let i = 0; i < n; i++) if (open[i]) upper[i] = NaN;
  return { ...common, type: 'curve', wingLoadings: ws, nominal, lower, upper };
}
