/**
 * The evaluation, format `loftpoint-evaluation/1` (DESIGN.md): the JSON that
 * `loftpoint evaluate --json` prints and every front end draws from.
 *
 * All numbers SI. For turbofan concepts the key `thrustToWeight` stands where
 * `powerToWeight` stands here, and `sizing` has `thrust` instead of `power`;
 * the types use an index signature for that one key.
 */
// @ts-nocheck

import type { LoadingAxis } from './aircraft';
import type { RequirementKind } from './requirements';

export const EVALUATION_FORMAT = 'loftpoint-evaluation/1';

/** What each boundary adds at the optimum (absent without an optimum). */
interface AtOptimumJson {
  /** True airspeed [m/s] of the condition the requirement uses, at the optimum wing loading. */
  speedAtOptimum?: number;
  /** Distances [m] by segment at the optimum (take-off and landing distances). */
  segmentsAtOptimum?: Record<string, number>;
}

export interface LimitBoundaryJson extends AtOptimumJson {
  id: string;
  kind: RequirementKind;
  label?: string;
  wingLoadingMax: number;
  /** Flight Mach number of the requirement at the optimum's wing loading (TAS over the local speed of sound). */
  machAtOptimum?: number;
}

export interface CurveBoundaryJson extends AtOptimumJson {
  id: string;
  kind: RequirementKind;
  label?: string;
  /** [wing loading, required loading or null]. */
  points: Array<[number, number | null]>;
  /** Wing loading above which the requirement cannot be flown (a sustained turn that stalls), drawn as its stall line. */
  stallLimit?: number;
  /** Flight Mach number of the requirement at the optimum's wing loading (TAS over the local speed of sound). */
  machAtOptimum?: number;
}

export type BoundaryJson = LimitBoundaryJson | CurveBoundaryJson;

export interface MarginJson {
  id: string;
  /** Relative; negative means violated, -1 means no power can meet it there. */
  margin: number;
}

export interface OptimumJson {
  wingLoading: number;
  powerToWeight?: number;
  thrustToWeight?: number;
  active: string[];
  margins: MarginJson[];
  /** True when the optimum sits on the right edge of the plotted range. */
  unbounded?: boolean;
}

export interface DesignPointJson {
  wingLoading: number;
  powerToWeight?: number;
  thrustToWeight?: number;
  feasible: boolean;
  margins: MarginJson[];
}

export interface SpeedsJson {
  stall: number;
  minimumDrag: number;
  minimumPower: number;
  /** Additions beyond DESIGN.md's three. */
  approach?: number;
  /** How the approach speed was taken, in words (factor, configuration, mass). */
  approachBasis?: string;
  stallByConfiguration?: Record<string, number>;
}

export interface SizingJson {
  wingArea: number;
  power?: number;
  thrust?: number;
  perEngine?: number;
  takeoffWeight?: number;
}

export interface WarningJson {
  code: string;
  /** Concept field path the warning is about, e.g. `aircraft.aero.configurations.clean.oswaldEfficiency`. */
  field: string;
  message: string;
  /** "error" where the result cannot be trusted at all (a flight Mach above 1); absent: a warning. */
  severity?: 'error';
}

export interface Evaluation {
  format: typeof EVALUATION_FORMAT;
  axis: LoadingAxis;
  boundaries: BoundaryJson[];
  /** Null when no point on the diagram meets every requirement. */
  optimum: OptimumJson | null;
  designPoint?: DesignPointJson;
  speeds: SpeedsJson;
  sizing: SizingJson | null;
  warnings: WarningJson[];
}
