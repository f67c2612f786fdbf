/**
 * The chance of meeting every requirement: a seeded Monte Carlo over the
 * ranged assumptions giving, at each point of a grid on the diagram, the
 * fraction of sampled designs that meet every enabled requirement there, and
 * the same at the design point, for all requirements and for each one.
 *
 * For each sample the boundaries are built once and counted column by
 * column (column-counts.ts). Same seed, same samples, same grid:
 * bit-identical results, however the run is split into chunks.
 */
import { boundaryOf } from '../constraints';
import { FEASIBLE_TOLERANCE, marginOf, sampleWingLoadings } from '../diagram';
import type { Boundary, Design, DesignPoint } from '../model';
import { STUDY_CAUTION } from './caution';
import { applyValues, parametersAffecting } from './corners';
import { spreadOf, type Spread } from './percentiles';
import { mersenneTwister, quantile } from './random';
import { optimumOf } from './study-optimum';
import type { UncertainParameter } from './uncertainty-schema';
import { checkedGrid, type ProbabilityGrid } from './probability-grid';
import { columnCounts, countSample, probabilityOf } from './column-counts';

export interface ProbabilityMapOptions {
  seed: number;
  samples: number;
  grid: ProbabilityGrid;
  /** Point to report; default the concept's design point, else the nominal optimum. */
  point?: DesignPoint;
  /** Samples between progress reports and stop checks [500]. */
  chunkSize?: number;
  onProgress?: (done: number, total: number) => void;
  /** Checked between chunks; returning true ends the run with no result. */
  shouldStop?: () => boolean;
}

export interface PointProbability {
  wingLoadingPa: number;
  loading: number;
  source: 'design point' | 'optimum';
  /** Fraction of samples meeting every enabled requirement there. */
  probability: number;
  /** Binomial standard error sqrt(p(1-p)/N). */
  standardError: number;
  byRequirement: Array<{ id: string; probability: number }>;
}

export interface OptimumSpread {
  /** Samples whose least-loading grid point lies on the grid. */
  samplesOnGrid: number;
  /** Read on the grid's wing loadings: resolution one column. */
  resolutionPa: number;
  wingLoadingPa: Spread;
  loading: Spread;
}

export interface ProbabilityMap {
  caution: string;
  seed: number;
  samples: number;
  wingLoadings: Float64Array;
  loadings: Float64Array;
  /** P at (wingLoadings[i], loadings[j]) is probability[j * nx + i] (row-major by loading). */
  probability: Float32Array;
  designPoint?: PointProbability;
  optimumSpread?: OptimumSpread;
}

export interface ProbabilityMapRun {
  readonly total: number;
  done(): number;
  /** Run up to `count` more samples; true when all are done. */
  step(count: number): boolean;
  /** The map of the samples run so far (all of them once step returned true). */
  result(): ProbabilityMap;
}

/** Start a run that a worker can advance chunk by chunk, reporting progress and stopping between chunks. */
export function probabilityMapRun(design: Design, parameters: readonly UncertainParameter[], options: ProbabilityMapOptions): ProbabilityMapRun {
  const { seed, samples } = options;
  if (!Number.isInteger(samples) || samples < 1) throw new RangeError(`samples is ${samples}; give a whole number of 1 or more`);
  const stream = mersenneTwister(seed);
  const grid = checkedGrid(options.grid);
  const ws = sampleWingLoadings(grid.wingLoading, grid.nx);
  const ys = sampleWingLoadings(grid.loading, grid.ny);
  const { nx } = grid;

  const enabled = design.requirements.map((r, index) => ({ r, index })).filter(({ r }) => r.enabled);
  const boundaries: Boundary[] = enabled.map(({ r }) => boundaryOf(r, design.aircraft));
  const moving = enabled.map(({ r }) => parametersAffecting(parameters, r.id).length > 0);
  const tally = columnCounts(ws, ys, boundaries.filter((_, j) => !moving[j]));

  const point = options.point ?? design.designPoint ?? pointOfOptimum(design);
  const pointSource: PointProbability['source'] = options.point || design.designPoint ? 'design point' : 'optimum';
  const metEach = new Uint32Array(enabled.length);
  let metAll = 0;

  const optimumW = new Float64Array(samples).fill(NaN);
  const optimumY = new Float64Array(samples).fill(NaN);
  const values = new Float64Array(parameters.length);
  const limits: number[] = [];
  const curves: Array<(w: number) => number> = [];
  let done = 0;

  function runSample(s: number): void {
    for (let i = 0; i < parameters.length; i++) {
      const p = parameters[i];
      values[i] = quantile(stream.nextUnit(), p.distribution, p.low, p.nominal, p.high);
    }
    const varied = applyValues(design, parameters, values);
    limits.length = 0;
    curves.length = 0;
    for (let j = 0; j < enabled.length; j++) {
      if (!moving[j]) continue;
      const b = boundaryOf(varied.requirements[enabled[j].index], varied.aircraft);
      boundaries[j] = b;
      if (b.type === 'limit') limits.push(b.wingLoadingMaxPa);
      else curves.push(b.required);
    }
    const best = countSample(tally, limits, curves);
    if (best) [optimumW[s], optimumY[s]] = [ws[best.column], best.loading];
    if (point) {
      let all = true;
      for (let j = 0; j < enabled.length; j++) {
        const met = marginOf(boundaries[j], point.wingLoadingPa, point.loading) >= -FEASIBLE_TOLERANCE;
        if (met) metEach[j]++;
        all &&= met;
      }
      if (all) metAll++;
    }
  }

  function result(): ProbabilityMap {
    const n = Math.max(done, 1);
    const probability = probabilityOf(tally, done);
    const map: ProbabilityMap = { caution: STUDY_CAUTION, seed, samples: done, wingLoadings: ws.slice(), loadings: ys.slice(), probability };
    if (point) {
      const p = metAll / n;
      map.designPoint = {
        wingLoadingPa: point.wingLoadingPa,
        loading: point.loading,
        source: pointSource,
        probability: p,
        standardError: Math.sqrt((p * (1 - p)) / n),
        byRequirement: enabled.map(({ r }, j) => ({ id: r.id, probability: metEach[j] / n })),
      };
    }
    const w = optimumW.subarray(0, done);
    const onGrid = w.filter((x) => x === x).length;
    if (onGrid > 0) {
      map.optimumSpread = {
        samplesOnGrid: onGrid,
        resolutionPa: (grid.wingLoading[1] - grid.wingLoading[0]) / (nx - 1),
        wingLoadingPa: spreadOf(w),
        loading: spreadOf(optimumY.subarray(0, done)),
      };
    }
    return map;
  }

  return {
    total: samples,
    done: () => done,
    step(count: number): boolean {
      const end = Math.min(samples, done + Math.max(1, Math.floor(count)));
      for (; done < end; done++) runSample(done);
      return done >= samples;
    },
    result,
  };
}

function pointOfOptimum(design: Design): DesignPoint | undefined {
  const optimum = optimumOf(design);
  return optimum ? { wingLoadingPa: optimum.wingLoadingPa, loading: optimum.loading } : undefined;
}

/** The whole run at once, with progress and stop checks between chunks; null when stopped. */
export function probabilityMap(design: Design, parameters: readonly UncertainParameter[], options: ProbabilityMapOptions): ProbabilityMap | null {
  const run = probabilityMapRun(design, parameters, options);
  const chunk = options.chunkSize ?? 500;
  let finished = false;
  while (!finished) {
    if (options.shouldStop?.()) return null;
    finished = run.step(chunk);
    options.onProgress?.(run.done(), run.total);
  }
  return run.result();
}
