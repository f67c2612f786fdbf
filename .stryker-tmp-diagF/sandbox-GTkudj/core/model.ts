/**
 * The resolved design model: what the engine computes with.
 *
 * Every number is SI (m, kg, s, N, W, Pa, K). The concept file's strings with
 * units are turned into this model once, by core/concept/resolve.ts; nothing
 * downstream parses units. The requirement kinds come from their descriptors
 * (core/requirements), the propulsion kinds from theirs (core/propulsion/kinds).
 */
// @ts-nocheck

import type { BoundaryOf } from './boundary';
import type { WarningJson } from './evaluation';
import type { Requirement, RequirementKind } from './requirements';

export { loadingAxis, type Aircraft, type ConfigurationPolar, type LoadingAxis, type Propulsion, type PropulsionKind } from './aircraft';
export { PROPULSION_KINDS } from './propulsion/kinds';
export { REQUIREMENT_KINDS, type Requirement, type RequirementKind, type RequirementCommon } from './requirements';
import type { Aircraft } from './aircraft';

export interface DesignPoint {
  wingLoadingPa: number;
  /** W/N for propeller kinds, dimensionless T/W for turbofan. */
  loading: number;
}

/** A whole concept, resolved to SI. */
export interface Design {
  name: string;
  aircraft: Aircraft;
  requirements: Requirement[];
  diagram: {
    /** Absent: the engine picks a range that shows every boundary. */
    wingLoadingRangePa?: [number, number];
    samples: number;
  };
  designPoint?: DesignPoint;
  /** Notes from resolving the concept (a defaulted configuration that fell back to clean, an ignored field). */
  warnings?: WarningJson[];
}

/** A requirement turned into a boundary on the wing-loading plane (core/boundary.ts). */
export type Boundary = BoundaryOf<RequirementKind>;
