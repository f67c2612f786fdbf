/**
 * The chance of meeting every requirement: a seeded Monte Carlo over the
 * ranged assumptions giving, at each point of a grid on the diagram, the
 * fraction of sampled designs that meet every enabled requirement there, and
 * the same at the design point, for all requirements and for each one.
 *
 * For each sample the boundaries are built once and counted column by
 * column (column-counts.ts). Samples come in blocks of MONTE_CARLO_BLOCK,
 * block b drawing from MT19937 keyed [seed, b] (init_by_array), so any range
 * of samples can be run on its own: parts run apart (on several cores) and
 * absorbed into one run give the very counts of one run. Same seed, same
 * samples, same grid: bit-identical results, however the run is split into
 * chunks or parts.
 */
import { boundaryOf } from '../constraints';
import { FEASIBLE_TOLERANCE, marginOf, sampleWingLoadings } from '../diagram';
import type { Boundary, Design, DesignPoint } from '../model';
import { STUDY_CAUTION } from './caution';
import { applyValues, parametersAffecting } from './corners';
import { spreadOf, type Spread } from './percentiles';
import { mersenneTwisterByArray, quantile, type RandomStream } from './random';
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
  /** Run only samples [first, end) of the `samples`, as one part of a run split across workers. */
  part?: { first: number; end: number };
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

/** What a part of a run counted: plain numbers and typed arrays, to pass between threads. */
export interface ProbabilityPart {
  first: number;
  /** One past the last sample counted. */
  end: number;
  counts: Uint32Array;
  metEach: Uint32Array;
  metAll: number;
  /** Per sample from `first`: least-loading grid point's wing loading and loading (NaN off the grid). */
  optimumW: Float64Array;
  optimumY: Float64Array;
}

export interface ProbabilityMapRun {
  /** Samples this run (or part) covers. */
  readonly total: number;
  done(): number;
  /** Run up to `count` more samples; true when all are done. */
  step(count: number): boolean;
  /** The counts so far, for another run to absorb. */
  part(): ProbabilityPart;
  /** Adds the counts of a part run elsewhere (same design, ranges, seed and grid; its samples not run here). */
  absorb(part: ProbabilityPart): void;
  /** The map of the samples run or absorbed so far (all of them once step returned true). */
  result(): ProbabilityMap;
}

/** Samples per random block: block b draws from MT19937 keyed [seed, b]. */
export const MONTE_CARLO_BLOCK = 500;

/** [0, samples) in up to `parts` contiguous ranges of whole blocks, as even as blocks allow. */
export function sampleParts(samples: number, parts: number): Array<{ first: number; end: number }> {
  const blocks = Math.ceil(samples / MONTE_CARLO_BLOCK);
  const count = Math.max(1, Math.min(Math.floor(parts), blocks));
  const out: Array<{ first: number; end: number }> = [];
  for (let k = 0; k < count; k++) {
    const first = Math.min(samples, Math.round((blocks * k) / count) * MONTE_CARLO_BLOCK);
    const end = Math.min(samples, Math.round((blocks * (k + 1)) / count) * MONTE_CARLO_BLOCK);
    if (end > first) out.push({ first, end });
  }
  return out;
}

/** Start a run that a worker can advance chunk by chunk, reporting progress and stopping between chunks. */
export function probabilityMapRun(design: Design, parameters: readonly UncertainParameter[], options: ProbabilityMapOptions): ProbabilityMapRun {
  const { seed, samples } = options;
  if (!Number.isInteger(samples) || samples < 1) throw new RangeError(`samples is ${samples}; give a whole number of 1 or more`);
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) throw new RangeError(`seed is ${seed}; give a whole number from 0 to 4294967295`);
  const first = options.part?.first ?? 0;
  const end = options.part?.end ?? samples;
  if (!Number.isInteger(first) || !Number.isInteger(end) || first < 0 || end > samples || end < first) {
    throw new RangeError(`part is [${first}, ${end}); give whole numbers 0 <= first <= end <= ${samples}`);
  }
  const total = end - first;
  let stream: RandomStream | null = null;
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

  const optimumW = new Float64Array(total).fill(NaN);
  const optimumY = new Float64Array(total).fill(NaN);
  const values = new Float64Array(parameters.length);
  const limits: number[] = [];
  const curves: Array<(w: number) => number> = [];
  let done = 0;

  /** The stream at sample s: a new block starts its own; a run starting mid-block skips the block's earlier draws. */
  function streamAt(s: number): RandomStream {
    const offset = s % MONTE_CARLO_BLOCK;
    if (stream && offset !== 0) return stream;
    stream = mersenneTwisterByArray([seed, Math.floor(s / MONTE_CARLO_BLOCK)]);
    for (let skip = 0; skip < offset * parameters.length; skip++) stream.nextUnit();
    return stream;
  }

  /** Sample s (an index into the whole run) counted at slot s - first. */
  function runSample(s: number): void {
    const stream = streamAt(s);
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
    if (best) [optimumW[s - first], optimumY[s - first]] = [ws[best.column], best.loading];
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
    // Samples run here and absorbed parts fill their own slots, not always the first `done`;
    // a slot not yet filled is NaN, as is one off the grid, so every slot is read.
    const onGrid = optimumW.filter((x) => x === x).length;
    if (onGrid > 0) {
      map.optimumSpread = {
        samplesOnGrid: onGrid,
        resolutionPa: (grid.wingLoading[1] - grid.wingLoading[0]) / (nx - 1),
        wingLoadingPa: spreadOf(optimumW),
        loading: spreadOf(optimumY),
      };
    }
    return map;
  }

  return {
    total,
    done: () => done,
    step(count: number): boolean {
      const stop = Math.min(total, done + Math.max(1, Math.floor(count)));
      for (; done < stop; done++) runSample(first + done);
      return done >= total;
    },
    part(): ProbabilityPart {
      return {
        first,
        end: first + done,
        counts: tally.counts.slice(),
        metEach: metEach.slice(),
        metAll,
        optimumW: optimumW.slice(0, done),
        optimumY: optimumY.slice(0, done),
      };
    },
    absorb(other: ProbabilityPart): void {
      if (other.counts.length !== tally.counts.length || other.metEach.length !== metEach.length) {
        throw new RangeError('the part was counted on another grid or another concept');
      }
      for (let i = 0; i < other.counts.length; i++) tally.counts[i] += other.counts[i];
      for (let j = 0; j < metEach.length; j++) metEach[j] += other.metEach[j];
      metAll += other.metAll;
      optimumW.set(other.optimumW, other.first - first);
      optimumY.set(other.optimumY, other.first - first);
      done += other.end - other.first;
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
