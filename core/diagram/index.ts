/**
 * The sizing engine's public face: evaluate a design, draw its boundaries,
 * read the diagram at a wing loading, and the pieces beneath.
 */
export { evaluateDesign, ACTIVE_TOLERANCE } from './evaluate';
export { boundariesOf, requirementBoundaries, type RequirementBoundary } from './boundaries';
export { readAt, type ReadOut, type ReadOutEntry } from './read-out';
export { marginsAt, marginOf, allMet, FEASIBLE_TOLERANCE } from './margins';
export { sampleWingLoadings } from './sampling';
export { sampleCurves, columnsOf, columnPoints, type CurveColumns } from './curve-columns';
export { evaluationJsonText } from './evaluation-text';
export { defaultWingLoadingRange } from './default-range';
export { envelopeAt, wingLoadingCap, type CurveBoundary, type LimitBoundary, type RequiredLoading } from './envelope';
export { findOptimum, SEARCH_GRID_POINTS, COARSE_GRID_POINTS, TIE_TOLERANCE, type Optimum, type EnvelopeSamples } from './optimum';
export { reportedSpeeds, APPROACH_SPEED_FACTOR } from './speeds';
export { sizingAt } from './sizing';
export { impossibleInputs, type ImpossibleInput } from './impossible-inputs';
export { assumptionWarnings } from './assumption-warnings';

export * from '../aero';
export * from '../propulsion';
export * from '../constraints';
