/**
 * The trade studies a design review shows, run once: the boundary bands,
 * the tornado, the Monte Carlo map of the chance of meeting every
 * requirement (on the diagram's own grid), and what each requirement costs.
 *
 * Ranges come from the concept's `uncertainty` block. A concept without
 * ranges is studied on the typical ranges of core/methods.md (core
 * `typicalUncertainty`), and everything says so: an engineer still sees
 * which assumptions could move the point, but never mistakes handbook
 * spreads for the concept's own.
 */
import { atClosedMass } from '../../core/mission/mass';
import { columnsOf } from '../../core/diagram/curve-columns';
import {
  boundaryBands,
  DEFAULT_STUDY_SAMPLES,
  DEFAULT_STUDY_SEED,
  probabilityMap,
  requirementCosts,
  resolveUncertainty,
  sampleWingLoadings,
  tornado,
  typicalRange,
  typicalUncertainty,
  type BoundaryBand,
  type ConceptUncertainty,
  type Design,
  type Distribution,
  type Evaluation,
  type ProbabilityGrid,
  type ProbabilityMap,
  type RequirementCosts,
  type Tornado,
  type UncertainParameter,
  type UnitSystem,
} from '../../core';
import { diagramGrid } from '../chart/study-grid';

export interface StudyOptions {
  /** Relative step for the requirement costs [0.1]. */
  step?: number;
  /** Override the concept's seed and sample count. */
  seed?: number;
  samples?: number;
}

export interface RangeRow {
  field: string;
  label: string;
  low: number;
  nominal: number;
  high: number;
  distribution: Distribution;
  /** Where a typical range comes from (core/methods.md); absent for the concept's own ranges. */
  source?: string;
  /** Which typical range was used and why (core typicalRange); absent for the concept's own ranges. */
  basis?: string;
}

export interface ReportStudies {
  /** Whose ranges: the concept's own, or core/methods.md typical ranges because the concept gives none. */
  ranges: 'concept' | 'typical';
  rows: RangeRow[];
  seed: number;
  samples: number;
  step: number;
  grid: ProbabilityGrid;
  bands: BoundaryBand[];
  tornado: Tornado;
  /** Null when there is nothing ranged to sample. */
  map: ProbabilityMap | null;
  costs: RequirementCosts;
  /** Milliseconds each study took. */
  timings: { bands: number; tornado: number; monteCarlo: number; costs: number };
}

function timed<T>(run: () => T): [T, number] {
  const start = performance.now();
  const value = run();
  return [value, performance.now() - start];
}

/** The ranged assumptions studied: the concept's own, else the typical ones. */
export function rangedParameters(design: Design, concept: unknown, uncertainty: ConceptUncertainty | undefined): { ranges: ReportStudies['ranges']; parameters: UncertainParameter[] } {
  if (uncertainty && uncertainty.parameters.length > 0) return { ranges: 'concept', parameters: uncertainty.parameters };
  const typical = resolveUncertainty(typicalUncertainty(design), design, concept);
  return { ranges: 'typical', parameters: typical.ok ? typical.parameters : [] };
}

/** The wing loadings the bands are drawn at: the evaluation's own samples, else the grid's. */
function bandWingLoadings(evaluation: Evaluation, grid: ProbabilityGrid): number[] {
  const columns = columnsOf(evaluation);
  if (columns && columns.curves.length > 0 && columns.wingLoadingsPa.length > 1) return Array.from(columns.wingLoadingsPa);
  const curve = evaluation.boundaries.find((boundary) => 'points' in boundary);
  if (curve && 'points' in curve && curve.points.length > 1) return curve.points.map(([w]) => w);
  return Array.from(sampleWingLoadings(grid.wingLoading, 201));
}

export interface StudyInput {
  design: Design;
  concept: unknown;
  evaluation: Evaluation;
  uncertainty?: ConceptUncertainty;
  system: UnitSystem;
  options?: StudyOptions;
}

/** What the studies run on: the ranged assumptions, seed, sample count, cost step and the diagram's grid. */
export function studySettings(input: StudyInput) {
  const { design, evaluation, system } = input;
  const options = input.options ?? {};
  const { ranges, parameters } = rangedParameters(design, input.concept, input.uncertainty);
  const seed = options.seed ?? input.uncertainty?.seed ?? DEFAULT_STUDY_SEED;
  const samples = options.samples ?? input.uncertainty?.samples ?? DEFAULT_STUDY_SAMPLES;
  const step = options.step ?? 0.1;
  const grid = diagramGrid(evaluation, { system, title: design.name });
  return { ranges, parameters, seed, samples, step, grid };
}

/**
 * Every study, in this thread; `monteCarlo`, when given, is the map already
 * worked out elsewhere (on several cores) for these very settings, and its time.
 */
export function runStudies(input: StudyInput, monteCarlo?: { map: ProbabilityMap | null; ms: number }): ReportStudies {
  const { design, evaluation } = input;
  const { ranges, parameters, seed, samples, step, grid } = studySettings(input);
  const [bands, bandsMs] = timed(() => boundaryBands(design, parameters, bandWingLoadings(evaluation, grid)));
  const [moved, tornadoMs] = timed(() => tornado(design, parameters));
  const [map, monteCarloMs] = monteCarlo
    ? [monteCarlo.map, monteCarlo.ms]
    : timed(() => (parameters.length > 0 ? probabilityMap(design, parameters, { seed, samples, grid }) : null));
  const [costs, costsMs] = timed(() => requirementCosts(atClosedMass(design, evaluation), { step }));
  const rows = parameters.map((p): RangeRow => {
    const typical = ranges === 'typical' ? typicalRange(p.field, design) : null;
    return {
      field: p.field,
      label: p.label,
      low: p.low,
      nominal: p.nominal,
      high: p.high,
      distribution: p.distribution,
      ...(typical ? { source: typical.source, basis: typical.basis } : {}),
    };
  });
  return {
    ranges,
    rows,
    seed,
    samples,
    step,
    grid,
    bands,
    tornado: moved,
    map,
    costs,
    timings: { bands: bandsMs, tornado: tornadoMs, monteCarlo: monteCarloMs, costs: costsMs },
  };
}
