/**
 * A worker thread of the report's Monte Carlo (monte-carlo-workers.ts starts
 * it). Built ahead on its own as one small CommonJS file (app/build-cli.js)
 * holding only what the samples need, which the worker's loader runs with
 * V8's code cache, then calls runThread. It starts
 * while the main thread is still reading the concept, then waits for the
 * run: the resolved design and the ranged assumptions as plain data, so it
 * parses nothing. It claims samples from the shared counter like the main
 * thread, and posts the counts of its claims back.
 */
import { isMainThread, parentPort, threadId, workerData } from 'node:worker_threads';
import type { Design } from '../../core/model';
import type { ProbabilityPart } from '../../core/studies/monte-carlo';
import { now, runClaims, sharedTexts, threadParameters, type MonteCarloJob, type PlainParameter, type ThreadTiming } from './monte-carlo-claims';

/** In workerData: marks a Monte Carlo worker. */
export const THREAD_MARKER = 'loftpoint-monte-carlo-thread';

/** What a worker is started with. */
export interface ThreadStart {
  marker: typeof THREAD_MARKER;
  /**
   * Int32 words shared by every thread of the run: [0] the next sample nobody
   * has claimed yet; [slot] set to 1 by this worker before its first claim.
   */
  shared: SharedArrayBuffer;
  slot: number;
  askedAt: number;
}

/** The run, posted to each worker once the main thread has it. */
export interface ThreadJob {
  job: MonteCarloJob;
  threads: number;
  design: Design;
  /** The concept document: which configurations inherit clean's values. */
  concept: unknown;
  parameters: PlainParameter[];
}

export type ThreadAnswer = { parts: ProbabilityPart[]; timing: ThreadTiming } | { error: string };

/**
 * Runs this worker: waits for the run, claims samples until none is left,
 * posts the counts back, then calls `afterAnswer` (the loader writes the code
 * cache there, off the way of the run). Does nothing outside a
 * Monte Carlo worker.
 */
export function runThread(afterAnswer: () => void = () => {}): void {
  if (isMainThread || !parentPort || (workerData as ThreadStart | undefined)?.marker !== THREAD_MARKER) return;
  const port = parentPort;
  const { shared, slot, askedAt } = workerData as ThreadStart;
  const timing: ThreadTiming = { thread: `worker ${threadId}`, askedAt, loadedAt: now(), readyAt: 0, doneAt: 0, samples: 0, claims: 0, cpuAtReady: NaN, cpuAtDone: NaN };
  port.once('message', ({ job, threads, design, concept, parameters }: ThreadJob) => {
    try {
      // Texts as V8 shares them, as in a design read on this thread (sharedTexts says why).
      const ranged = threadParameters(sharedTexts(parameters), sharedTexts(design), sharedTexts(concept));
      const words = new Int32Array(shared);
      Atomics.store(words, slot, 1);
      const parts = runClaims(design, ranged, job, words, threads, timing);
      const buffers = parts.flatMap((p) => [p.counts.buffer, p.metEach.buffer, p.optimumW.buffer, p.optimumY.buffer]) as ArrayBuffer[];
      port.postMessage({ parts, timing } satisfies ThreadAnswer, buffers);
    } catch (error) {
      port.postMessage({ error: error instanceof Error ? error.message : String(error) } satisfies ThreadAnswer);
      return;
    }
    afterAnswer();
  });
}
