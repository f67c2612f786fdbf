/**
 * Trade studies: ranges on the assumptions, boundary bands, the tornado of
 * what moves the design point, the Monte Carlo chance of meeting every
 * requirement, what each requirement costs, and requirement templates from
 * published rules. Pure computation, SI inside.
 */
// @ts-nocheck

export { STUDY_CAUTION } from './caution';
export { mersenneTwister, uniformQuantile, triangularQuantile, quantile, type Distribution, type RandomStream } from './random';
export {
  uncertaintySchema,
  resolveUncertainty,
  DEFAULT_SEED as DEFAULT_STUDY_SEED,
  DEFAULT_SAMPLES as DEFAULT_STUDY_SAMPLES,
  type UncertaintyBlock,
  type UncertainParameter,
  type UncertaintyIssue,
  type ResolvedUncertainty,
} from './uncertainty-schema';
export { rangeableFields, fieldRef as uncertainFieldRef, type FieldRef as UncertainFieldRef } from './uncertain-fields';
export { typicalRange, typicalUncertainty, type TypicalRange } from './typical-ranges';
export { cornerValues, applyValues, MAX_CORNER_PARAMETERS, type CornerMethod } from './corners';
export { boundaryBands, type BoundaryBand, type LimitBand, type CurveBand } from './bands';
export { tornado, type Tornado, type TornadoBar, type TornadoEnd, type TornadoOrder } from './tornado';
export {
  probabilityMap,
  probabilityMapRun,
  sampleParts,
  MONTE_CARLO_BLOCK,
  type ProbabilityMap,
  type ProbabilityMapOptions,
  type ProbabilityPart,
  type ProbabilityMapRun,
  type PointProbability,
  type OptimumSpread,
} from './monte-carlo';
export { defaultProbabilityGrid, probabilityFrontier, PROBABILITY_LEVELS, type ProbabilityGrid } from './probability-grid';
export { spreadOf, type Spread } from './percentiles';
export { requirementCosts, type RequirementCosts, type RequirementCost, type CostCase } from './costs';
export { optimumOf as studyOptimum, plotRangeOf, type StudyOptimum } from './study-optimum';
export { REQUIREMENT_TEMPLATES, APPLICABILITY_NOTE, type RequirementTemplate, type TemplateRequirement } from './templates';
export { templateRequirement, type TemplateTarget, type TemplateInsertion } from './template-requirement';
