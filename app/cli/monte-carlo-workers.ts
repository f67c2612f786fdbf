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
 * The workers are started first (startMonteCarloThreads, at the start of the
 * report), so they load while this thread reads and evaluates the concept;
 * the run then sends them the resolved design and ranges as plain data
 * (monte-carlo-thread.ts), and nobody parses the concept twice.
 *
 * Workers run only from the JavaScript built ahead (out/cli): the build
 * names the worker's own small file (monte-carlo-thread.ts built alone) in
 * __LOFTPOINT_MONTE_CARLO_THREAD__. From the TypeScript sources (tests, tsx)
 * there is none, so everything runs in this thread, with the same result.
 */
import { existsSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { probabilityMapRun, type Design, type ProbabilityMap, type ProbabilityPart, type UncertainParameter } from '../../core';
import { studySettings, type StudyInput } from '../report/studies';
import { LEAST_CLAIM, now, plainParameters, runClaims, type MonteCarloJob, type ThreadTiming } from './monte-carlo-claims';
import { THREAD_MARKER, type ThreadAnswer, type ThreadJob, type ThreadStart } from './monte-carlo-thread';

export { claimSamples, LEAST_CLAIM, type MonteCarloJob, type ThreadTiming } from './monte-carlo-claims';

/** The worker's file name in out/cli, set by the build; undefined when running from the TypeScript sources. */
declare const __LOFTPOINT_MONTE_CARLO_THREAD__: string | undefined;

/** The worker's built file, or null from the TypeScript sources (or when the build lacks it). */
function threadScript(): string | null {
  if (typeof __LOFTPOINT_MONTE_CARLO_THREAD__ !== 'string') return null;
  const file = fileURLToPath(new URL(`./${__LOFTPOINT_MONTE_CARLO_THREAD__}`, import.meta.url));
  return existsSync(file) ? file : null;
}

/**
 * What each worker runs first (CommonJS, as a worker's `eval` code): the
 * worker's file with V8's code cache, so the code is not parsed and compiled
 * again; then its runThread, and after the answer the cache is written when
 * there was none or V8 refused it (another Node or other flags). The cache is
 * only ever a shortcut: without it the file is compiled as usual.
 *
 * The cache is taken as soon as the file is compiled, before anything runs:
 * it then holds the file's top level, which is what loading costs. A cache
 * taken after a run also holds every function the samples compiled, and code
 * read back from it ran the samples about a tenth slower per sample on this
 * machine (each thread's own CPU time, the same worker file with either
 * cache, side by side), for no faster start.
 */
const THREAD_LOADER = `'use strict';
const { readFileSync, renameSync, rmSync, writeFileSync } = require('node:fs');
const { dirname } = require('node:path');
const { Script } = require('node:vm');
const { threadId, workerData } = require('node:worker_threads');
const { script: file, cache } = workerData.load;
let cachedData;
try { cachedData = readFileSync(cache); } catch {}
const code = new Script('(function (exports, require, module, __filename, __dirname) {' + readFileSync(file, 'utf8') + '\\n})', { filename: file, cachedData });
const fresh = cachedData === undefined || code.cachedDataRejected === true ? code.createCachedData() : null;
const module = { exports: {} };
code.runInThisContext()(module.exports, require, module, file, dirname(file));
module.exports.runThread(() => {
  if (fresh === null) return;
  const temporary = cache + '.' + process.pid + '-' + threadId + '.tmp';
  try {
    writeFileSync(temporary, fresh);
    renameSync(temporary, cache);
  } catch {
    rmSync(temporary, { force: true });
  }
});
`;

/** A short fingerprint of text (djb2), so a changed loader never meets a cache made for another. */
function fingerprint(text: string): string {
  let hash = 5381;
  for (let i = 0; i < text.length; i++) hash = ((hash * 33) ^ text.charCodeAt(i)) >>> 0;
  return hash.toString(36);
}

/** The worker file's code cache: one per V8, processor and set of Node options (V8 refuses a cache made under other flags). */
function threadCache(script: string): string {
  const options = `${process.execArgv.join(' ')}|${process.env.NODE_OPTIONS ?? ''}`;
  return `${script}.${process.versions.v8}-${process.arch}-${fingerprint(THREAD_LOADER + options)}.cache`;
}

/**
 * How many threads to use: LOFTPOINT_WORKERS when set (1 to 16), else the
 * cores not busy with other work by the 1-minute load average (this process
 * counting as one), at least 1. From the TypeScript sources always 1.
 */
export function monteCarloWorkers(env: NodeJS.ProcessEnv = process.env, built = threadScript() !== null): number {
  if (!built) return 1;
  const asked = Number(env.LOFTPOINT_WORKERS);
  if (env.LOFTPOINT_WORKERS !== undefined && Number.isInteger(asked) && asked >= 1) return Math.min(asked, 16);
  const cores = availableParallelism();
  const others = Math.max(0, loadavg()[0] - 1);
  return Math.max(1, Math.min(cores, Math.floor(cores - others + 0.5)));
}

interface RunningWorker {
  worker: Worker;
  answer: Promise<{ parts: ProbabilityPart[]; timing: ThreadTiming }>;
}

function startWorker(script: string, shared: SharedArrayBuffer, slot: number): RunningWorker {
  const start: ThreadStart & { load: { script: string; cache: string } } = { marker: THREAD_MARKER, shared, slot, askedAt: now(), load: { script, cache: threadCache(script) } };
  const worker = new Worker(THREAD_LOADER, { eval: true, workerData: start });
  const answer = new Promise<{ parts: ProbabilityPart[]; timing: ThreadTiming }>((resolve, reject) => {
    let got: { parts: ProbabilityPart[]; timing: ThreadTiming } | undefined;
    worker.once('message', (message: ThreadAnswer) => {
      if ('error' in message) reject(new Error(message.error));
      else got = message;
    });
    worker.once('error', reject);
    worker.once('exit', (code) => (got ? resolve(got) : reject(new Error(`a Monte Carlo worker ended (exit ${code}) without its counts`))));
  });
  // A worker told to stop before it answered: nobody waits for its answer.
  answer.catch(() => {});
  return { worker, answer };
}

/** Worker threads started ahead of the run they will share; run once, or closed unused. */
export interface MonteCarloThreads {
  /** Threads in all, this one included. */
  readonly threads: number;
  /**
   * The probability map of `design` and `parameters` (`concept`: the
   * document they were read from) on these threads; the same map, bit for
   * bit, as one thread gives. `timings`, when given, receives each thread's
   * timing. Ends the workers.
   */
  run(job: MonteCarloJob, design: Design, concept: unknown, parameters: readonly UncertainParameter[], timings?: ThreadTiming[]): Promise<ProbabilityMap>;
  /** Ends workers not yet ended (a run that never came, or an error on the way to it). */
  close(): void;
}

/**
 * Starts the workers for a Monte Carlo run to come, `workers` threads in all
 * (this one included; 1 starts none), so they load while this thread is
 * still busy. `script`: the worker's built file (the build's own by
 * default; none runs everything here). Call close() when the run may not come.
 */
export function startMonteCarloThreads(workers = monteCarloWorkers(), script: string | null = threadScript()): MonteCarloThreads {
  const wanted = script ? Math.max(1, Math.min(16, Math.floor(workers))) : 1;
  const shared = new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT * wanted);
  const running = script ? Array.from({ length: wanted - 1 }, (_, k) => startWorker(script, shared, k + 1)) : [];
  let used = false;
  const close = () => {
    for (const { worker } of running) void worker.terminate();
  };
  return {
    threads: wanted,
    close,
    async run(job, design, concept, parameters, timings) {
      if (used) throw new Error('these Monte Carlo threads have already run');
      used = true;
      const askedAt = now();
      // Checks the settings (and throws on bad ones) before any worker is sent the run; setting up takes well under a millisecond.
      let whole;
      try {
        whole = probabilityMapRun(design, parameters, { seed: job.seed, samples: job.samples, grid: job.grid });
      } catch (error) {
        close();
        throw error;
      }
      // No more threads than claims of the least size.
      const threads = Math.max(1, Math.min(wanted, Math.ceil(job.samples / LEAST_CLAIM)));
      const words = new Int32Array(shared);
      const sharing = running.slice(0, threads - 1);
      for (const { worker } of running.slice(threads - 1)) void worker.terminate();
      if (sharing.length === 0) {
        whole.step(whole.total);
        return whole.result();
      }
      const message: ThreadJob = { job, threads, design, concept, parameters: plainParameters(parameters) };
      for (const { worker } of sharing) worker.postMessage(message);
      const timing: ThreadTiming = { thread: 'main', askedAt, loadedAt: askedAt, readyAt: 0, doneAt: 0, samples: 0, claims: 0, cpuAtReady: NaN, cpuAtDone: NaN };
      let answers: Array<{ parts: ProbabilityPart[]; timing: ThreadTiming }>;
      try {
        for (const part of runClaims(design, parameters, job, words, threads, timing)) whole.absorb(part);
        // Every sample is claimed now: a worker that has not begun claiming never will, so it is not waited for.
        const claiming = sharing.filter(({ worker }, k) => {
          if (Atomics.load(words, k + 1) !== 0) return true;
          void worker.terminate();
          return false;
        });
        answers = await Promise.all(claiming.map((r) => r.answer));
      } catch (error) {
        // One thread failed: the others stop too, and the failure is reported once.
        close();
        throw error;
      }
      timings?.push(timing);
      for (const answer of answers) {
        for (const part of answer.parts) whole.absorb(part);
        timings?.push(answer.timing);
      }
      return whole.result();
    },
  };
}

/**
 * The probability map of `design` and `parameters` (read from `concept`) on
 * `workers` threads, started now; the same map, bit for bit, as one thread
 * gives. `timings`, when given, receives each thread's timing.
 */
export async function probabilityMapOnCores(
  job: MonteCarloJob,
  design: Design,
  concept: unknown,
  parameters: readonly UncertainParameter[],
  workers = monteCarloWorkers(),
  timings?: ThreadTiming[],
): Promise<ProbabilityMap> {
  return startMonteCarloThreads(workers).run(job, design, concept, parameters, timings);
}

/**
 * The report's Monte Carlo map (null when nothing is ranged) and the
 * milliseconds it took, on `threads` (started earlier with
 * startMonteCarloThreads, which this ends) or on `threads` new ones when it
 * is a number; `timings` as for probabilityMapOnCores.
 */
export async function reportProbabilityMap(
  input: StudyInput,
  threads: MonteCarloThreads | number = monteCarloWorkers(),
  timings?: ThreadTiming[],
): Promise<{ map: ProbabilityMap | null; ms: number }> {
  const started = performance.now();
  const running = typeof threads === 'number' ? startMonteCarloThreads(threads) : threads;
  const { seed, samples, grid, parameters } = studySettings(input);
  if (parameters.length === 0) {
    running.close();
    return { map: null, ms: 0 };
  }
  const map = await running.run({ seed, samples, grid }, input.design, input.concept, parameters, timings);
  return { map, ms: performance.now() - started };
}
