/**
 * The report's Monte Carlo on every free core: this thread and worker
 * threads claim samples from a shared counter as they go (large claims
 * first, smaller towards the end), each claim run as a part of the whole run
 * (core `probabilityMapRun` with `part`), every part's counts absorbed into
 * one run. Core keys each block's random stream by [seed, block] and any
 * part can start mid-block, so the map is bit-identical for a seed whatever
 * the number of threads and whoever ran which samples. A worker still
 * starting, or a core busy with other work, simply leaves more samples to
 * the other threads.
 *
 * A worker gets only plain data (the concept document, seed, samples, grid,
 * the shared counter) and works out the design and the ranged assumptions as
 * the report does (app/report/studies.ts). This same module is the worker's
 * script: loaded in a worker thread with its marker in workerData, it runs
 * its claims and posts their counts back.
 *
 * Workers run only from the JavaScript built ahead (out/cli); from the
 * TypeScript sources (tests, tsx) a worker thread could not load this file,
 * so everything runs in this thread, with the same result.
 */
import { availableParallelism, loadavg } from 'node:os';
import { readFileSync } from 'node:fs';
import { isMainThread, parentPort, threadId, Worker, workerData } from 'node:worker_threads';
import {
  parseConcept,
  probabilityMapRun,
  type Design,
  type ProbabilityGrid,
  type ProbabilityMap,
  type ProbabilityPart,
  type UncertainParameter,
} from '../../core';
import { rangedParameters, studySettings, type StudyInput } from '../report/studies';

const MARKER = 'loftpoint-monte-carlo-part';

/** The fewest samples a thread claims at once: the most one thread can be left running after the others end. */
export const LEAST_CLAIM = 100;

export interface MonteCarloJob {
  /** The concept document the design and ranges were read from. */
  concept: unknown;
  seed: number;
  samples: number;
  grid: ProbabilityGrid;
}

/** When one thread of a run started, was ready, and ended (ms since the epoch), what it ran, and its own CPU time where the system tells it. */
export interface ThreadTiming {
  thread: string;
  /** The worker was asked for (main: the run began). */
  askedAt: number;
  /** Its code was loaded and running (main: the run began). */
  loadedAt: number;
  /** The design and ranges were worked out and its first claim began. */
  readyAt: number;
  /** Its last claim ended. */
  doneAt: number;
  samples: number;
  claims: number;
  /** CPU time of this thread alone at readyAt and doneAt (ms; NaN where the system does not tell). */
  cpuAtReady: number;
  cpuAtDone: number;
}

interface WorkerInput {
  marker: typeof MARKER;
  job: MonteCarloJob;
  /**
   * Int32 words shared by every thread of the run: [0] the next sample nobody
   * has claimed yet; [slot] set to 1 by this worker before its first claim.
   */
  shared: SharedArrayBuffer;
  slot: number;
  threads: number;
  askedAt: number;
}

type WorkerAnswer = { parts: ProbabilityPart[]; timing: ThreadTiming } | { error: string };

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

/**
 * Claims the next samples of the run for this thread, or null when all are
 * claimed: a share of what is left (half of it split over the threads, at
 * least LEAST_CLAIM), so claims start large and shrink towards the end and
 * the threads finish close together, whichever started late or runs slower.
 */
export function claimSamples(next: Int32Array, samples: number, threads: number): { first: number; end: number } | null {
  for (;;) {
    const first = Atomics.load(next, 0);
    if (first >= samples) return null;
    const size = Math.max(LEAST_CLAIM, Math.floor((samples - first) / (2 * threads)));
    const end = Math.min(samples, first + size);
    if (Atomics.compareExchange(next, 0, first, end) === first) return { first, end };
  }
}

/** The epoch in ms, comparable between threads. */
const now = () => performance.timeOrigin + performance.now();

/** This thread's own CPU time in ms, from Linux's per-thread scheduler figures; NaN elsewhere. */
function threadCpuMs(): number {
  try {
    return Number(readFileSync('/proc/thread-self/schedstat', 'utf8').split(' ')[0]) / 1e6;
  } catch {
    return NaN;
  }
}

/** Runs claims until none is left: each claim a part run of its own, its counts kept to be absorbed. */
function runClaims(design: Design, parameters: readonly UncertainParameter[], job: MonteCarloJob, next: Int32Array, threads: number, timing: ThreadTiming): ProbabilityPart[] {
  const parts: ProbabilityPart[] = [];
  timing.readyAt = now();
  timing.cpuAtReady = threadCpuMs();
  for (let part = claimSamples(next, job.samples, threads); part; part = claimSamples(next, job.samples, threads)) {
    const run = probabilityMapRun(design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid, part });
    run.step(run.total);
    parts.push(run.part());
    timing.samples += run.total;
    timing.claims++;
  }
  timing.doneAt = now();
  timing.cpuAtDone = threadCpuMs();
  return parts;
}

interface RunningWorker {
  worker: Worker;
  answer: Promise<{ parts: ProbabilityPart[]; timing: ThreadTiming }>;
}

function startWorker(job: MonteCarloJob, shared: SharedArrayBuffer, slot: number, threads: number): RunningWorker {
  const input: WorkerInput = { marker: MARKER, job, shared, slot, threads, askedAt: now() };
  const worker = new Worker(new URL(import.meta.url), { workerData: input });
  const answer = new Promise<{ parts: ProbabilityPart[]; timing: ThreadTiming }>((resolve, reject) => {
    let got: { parts: ProbabilityPart[]; timing: ThreadTiming } | undefined;
    worker.once('message', (message: WorkerAnswer) => {
      if ('error' in message) reject(new Error(message.error));
      else got = message;
    });
    worker.once('error', reject);
    worker.once('exit', (code) => (got ? resolve(got) : reject(new Error(`a Monte Carlo worker ended (exit ${code}) without its counts`))));
  });
  return { worker, answer };
}

/**
 * The probability map of `design` and `parameters` (read from job.concept)
 * on `workers` threads; the same map, bit for bit, as one thread gives. The
 * threads claim samples from a shared counter as they go, so a worker still
 * starting, or a core busy with other work, leaves more to the others.
 * `timings`, when given, receives each thread's timing.
 */
export async function probabilityMapOnCores(
  job: MonteCarloJob,
  design: Design,
  parameters: readonly UncertainParameter[],
  workers = monteCarloWorkers(),
  timings?: ThreadTiming[],
): Promise<ProbabilityMap> {
  const threads = Math.max(1, Math.min(Math.floor(workers), Math.ceil(job.samples / LEAST_CLAIM)));
  const askedAt = now();
  // Checks the settings (and throws on bad ones) before any worker starts; setting up takes well under a millisecond.
  const whole = probabilityMapRun(design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid });
  if (threads === 1) {
    whole.step(whole.total);
    return whole.result();
  }
  // The workers start now, to load while this thread runs its own claims.
  const shared = new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT * threads);
  const words = new Int32Array(shared);
  const running = Array.from({ length: threads - 1 }, (_, k) => startWorker(job, shared, k + 1, threads));
  const stopAll = () => {
    for (const { worker, answer } of running) {
      answer.catch(() => {});
      void worker.terminate();
    }
  };
  const timing: ThreadTiming = { thread: 'main', askedAt, loadedAt: askedAt, readyAt: 0, doneAt: 0, samples: 0, claims: 0, cpuAtReady: NaN, cpuAtDone: NaN };
  let answers: Array<{ parts: ProbabilityPart[]; timing: ThreadTiming }>;
  try {
    for (const part of runClaims(design, parameters, job, words, threads, timing)) whole.absorb(part);
    // Every sample is claimed now: a worker that has not begun claiming never will, so it is not waited for.
    const claiming = running.filter(({ worker, answer }, k) => {
      if (Atomics.load(words, k + 1) !== 0) return true;
      answer.catch(() => {});
      void worker.terminate();
      return false;
    });
    answers = await Promise.all(claiming.map((r) => r.answer));
  } catch (error) {
    // One thread failed: the others stop too, and the failure is reported once.
    stopAll();
    throw error;
  }
  timings?.push(timing);
  for (const answer of answers) {
    for (const part of answer.parts) whole.absorb(part);
    timings?.push(answer.timing);
  }
  return whole.result();
}

/** The report's Monte Carlo map (null when nothing is ranged) on `workers` threads, and the milliseconds it took; `timings` as for probabilityMapOnCores. */
export async function reportProbabilityMap(input: StudyInput, workers = monteCarloWorkers(), timings?: ThreadTiming[]): Promise<{ map: ProbabilityMap | null; ms: number }> {
  const { seed, samples, grid, parameters } = studySettings(input);
  if (parameters.length === 0) return { map: null, ms: 0 };
  const started = performance.now();
  const map = await probabilityMapOnCores({ concept: input.concept, seed, samples, grid }, input.design, parameters, workers, timings);
  return { map, ms: performance.now() - started };
}

if (!isMainThread && parentPort && (workerData as WorkerInput | undefined)?.marker === MARKER) {
  const { job, shared, slot, threads, askedAt } = workerData as WorkerInput;
  const timing: ThreadTiming = { thread: `worker ${threadId}`, askedAt, loadedAt: now(), readyAt: 0, doneAt: 0, samples: 0, claims: 0, cpuAtReady: NaN, cpuAtDone: NaN };
  try {
    const parsed = parseConcept(job.concept);
    if (!parsed.ok) throw new Error('the concept no longer reads');
    const { parameters } = rangedParameters(parsed.design, job.concept, parsed.uncertainty);
    const words = new Int32Array(shared);
    Atomics.store(words, slot, 1);
    const parts = runClaims(parsed.design, parameters, job, words, threads, timing);
    const buffers = parts.flatMap((p) => [p.counts.buffer, p.metEach.buffer, p.optimumW.buffer, p.optimumY.buffer]) as ArrayBuffer[];
    parentPort.postMessage({ parts, timing } satisfies WorkerAnswer, buffers);
  } catch (error) {
    parentPort.postMessage({ error: error instanceof Error ? error.message : String(error) } satisfies WorkerAnswer);
  }
}
