/**
 * The enabled requirements of a design, each with its boundary.
 */
import { boundaryOf } from '../constraints';
import type { Boundary, Design, Requirement } from '../model';

export interface RequirementBoundary {
  /** Index in design.requirements (for field paths such as `requirements[2].speed`). */
  index: number;
  requirement: Requirement;
  boundary: Boundary;
}

/** Every enabled requirement with its boundary, in the design's order. */
export function requirementBoundaries(design: Design): RequirementBoundary[] {
  const out: RequirementBoundary[] = [];
  design.requirements.forEach((requirement, index) => {
    if (requirement.enabled) out.push({ index, requirement, boundary: boundaryOf(requirement, design.aircraft) });
  });
  return out;
}

/** The boundaries of the enabled requirements, in the design's order. */
export function boundariesOf(design: Design): Boundary[] {
  return requirementBoundaries(design).map((entry) => entry.boundary);
}
