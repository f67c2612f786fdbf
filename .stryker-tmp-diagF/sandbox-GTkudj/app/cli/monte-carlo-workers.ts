/**
 * The report's Monte Carlo on every free core: the samples split into parts
 * of whole random blocks (core `sampleParts`), all but one part run in worker
 * threads, the last in this thread, each part's counts absorbed into one run.
 * Core keys each block's random stream by [seed, block], so the map is
 * bit-identical for a seed whatever the number of workers.
 *
 * A worker gets only plain data (the concept document, seed, samples, grid,
 * its part) and works out the design and the ranged assumptions as the
 * report does (app/report/studies.ts). This same module is the worker's
 * script: loaded in a worker thread with its marker in workerData, it runs
 * the part and posts the counts back.
 *
 * Workers run only from the JavaScript built ahead (out/cli); from the
 * TypeScript sources (tests, tsx) a worker thread could not load this file,
 * so everything runs in this thread, with the same result.
 */
// @ts-nocheck

import { availableParallelism, loadavg } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import {
  parseConcept,
  probabilityMapRun,
  sampleParts,
  type Design,
  type ProbabilityGrid,
  type ProbabilityMap,
  type ProbabilityPart,
  type UncertainParameter,
} from '../../core';
import { rangedParameters, studySettings, type StudyInput } from '../report/studies';

const MARKER = 'loftpoint-monte-carlo-part';

export interface MonteCarloJob {
  /** The concept document the design and ranges were read from. */
  concept: unknown;
  seed: number;
  samples: number;
  grid: ProbabilityGrid;
}

interface WorkerInput {
  marker: typeof MARKER;
  job: MonteCarloJob;
  part: { first: number; end: number };
}

/**
 * How many threads to use: LOFTPOINT_WORKERS when set (1 to 16), else the
 * cores not busy with other work by the 1-minute load average (this process
 * counting as one), at least 1. From the TypeScript sources always 1.
 */
export function monteCarloWorkers(env: NodeJS.ProcessEnv = process.env, built = import.meta.url.endsWith('.js')): number {
  if (!built) return 1;
  const asked = Number(env.LOFTPOINT_WORKERS);
  if (env.LOFTPOINT_WORKERS !== undefined && Number.isInteger(asked) && asked >= 1) return Math.min(asked, 16);
  const cores = availableParallelism();
  const others = Math.max(0, loadavg()[0] - 1);
  return Math.max(1, Math.min(cores, Math.floor(cores - others + 0.5)));
}

/** One part run to its end: the design and ranges worked out from the concept as the report does. */
function runPart(job: MonteCarloJob, part: { first: number; end: number }): ProbabilityPart {
  const parsed = parseConcept(job.concept);
  if (!parsed.ok) throw new Error('the concept no longer reads');
  const { parameters } = rangedParameters(parsed.design, job.concept, parsed.uncertainty);
  const run = probabilityMapRun(parsed.design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid, part });
  while (!run.step(5000));
  return run.part();
}

function inWorker(part: WorkerInput['part'], job: MonteCarloJob): Promise<ProbabilityPart> {
  return new Promise((resolve, reject) => {
    const input: WorkerInput = { marker: MARKER, job, part };
    const worker = new Worker(new URL(import.meta.url), { workerData: input });
    let answer: ProbabilityPart | undefined;
    worker.once('message', (message: ProbabilityPart | { error: string }) => {
      if ('error' in message) reject(new Error(message.error));
      else answer = message;
    });
    worker.once('error', reject);
    worker.once('exit', (code) => (answer ? resolve(answer) : reject(new Error(`a Monte Carlo worker ended (exit ${code}) without its counts`))));
  });
}

/**
 * The probability map of `design` and `parameters` (read from job.concept)
 * on `workers` threads; the same map, bit for bit, as one thread gives.
 */
export async function probabilityMapOnCores(job: MonteCarloJob, design: Design, parameters: readonly UncertainParameter[], workers = monteCarloWorkers()): Promise<ProbabilityMap> {
  const whole = probabilityMapRun(design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid });
  const parts = sampleParts(job.samples, workers);
  if (parts.length <= 1) {
    while (!whole.step(5000));
    return whole.result();
  }
  const elsewhere = parts.slice(0, -1).map((part) => inWorker(part, job));
  // This thread takes the last part while the workers start and run theirs.
  const here = probabilityMapRun(design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid, part: parts[parts.length - 1] });
  while (!here.step(5000));
  whole.absorb(here.part());
  for (const part of await Promise.all(elsewhere)) whole.absorb(part);
  return whole.result();
}

/** The report's Monte Carlo map (null when nothing is ranged) on `workers` threads, and the milliseconds it took. */
export async function reportProbabilityMap(input: StudyInput, workers = monteCarloWorkers()): Promise<{ map: ProbabilityMap | null; ms: number }> {
  const { seed, samples, grid, parameters } = studySettings(input);
  if (parameters.length === 0) return { map: null, ms: 0 };
  const started = performance.now();
  const map = await probabilityMapOnCores({ concept: input.concept, seed, samples, grid }, input.design, parameters, workers);
  return { map, ms: performance.now() - started };
}

if (!isMainThread && parentPort && (workerData as WorkerInput | undefined)?.marker === MARKER) {
  const { job, part } = workerData as WorkerInput;
  try {
    const counts = runPart(job, part);
    const buffers = [counts.counts.buffer, counts.metEach.buffer, counts.optimumW.buffer, counts.optimumY.buffer] as ArrayBuffer[];
    parentPort.postMessage(counts, buffers);
  } catch (error) {
    parentPort.postMessage({ error: error instanceof Error ? error.message : String(error) });
  }
}
