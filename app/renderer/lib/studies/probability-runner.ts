/**
 * The worker's side of the chance study, without the worker: it reads the
 * concept, starts core `probabilityMapRun` and advances it in slices of a
 * few tens of milliseconds, reporting progress after each and yielding in
 * between so that a cancel message gets through. Same seed, samples and
 * grid: the same map as one uninterrupted run.
 *
 * Where the host offers helper threads (probability-part.worker.ts), the
 * samples are split into parts of whole random blocks (core `sampleParts`):
 * the helpers run the first parts, this thread the last, and their counts
 * are absorbed into one run: the very map one thread gives, sooner. Helpers
 * that have answered are kept for the next run, warm.
 */
import { parseConcept, probabilityMapRun, sampleParts, type ProbabilityGrid, type ProbabilityMapRun, type ProbabilityPart } from '../../../../core';
import type { PartReply, PartRequest, StudyReply, StudyRequest } from './probability-protocol';
import { studyParameters } from './study-parameters';

export type Prepared =
  | { ok: true; run: ProbabilityMapRun; whose: 'concept' | 'typical'; ranged: number; partRun(part: { first: number; end: number }): ProbabilityMapRun }
  | { ok: false; message: string };

/** The run for a concept document (or a part of it), or what stops it, naming the field. */
export function prepareStudy(concept: unknown, grid: ProbabilityGrid, part?: { first: number; end: number }): Prepared {
  const parsed = parseConcept(concept);
  if (!parsed.ok) {
    const first = parsed.issues[0];
    return { ok: false, message: first ? `${first.path || 'concept'}: ${first.message}` : 'the concept cannot be read' };
  }
  const ranges = studyParameters(parsed.concept as { uncertainty?: unknown }, parsed.design);
  if (!ranges.ok) return { ok: false, message: `${ranges.path}: ${ranges.message}` };
  if (ranges.parameters.length === 0) return { ok: false, message: 'uncertainty.parameters: no assumption is ranged; give at least one range' };
  try {
    const options = { seed: ranges.seed, samples: ranges.samples, grid };
    const run = probabilityMapRun(parsed.design, ranges.parameters, part ? { ...options, part } : options);
    const partRun = (range: { first: number; end: number }) => probabilityMapRun(parsed.design, ranges.parameters, { ...options, part: range });
    return { ok: true, run, whose: ranges.whose, ranged: ranges.parameters.length, partRun };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}

/** The little of a helper Worker the runner uses. */
export interface PartWorker {
  postMessage(message: PartRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<PartReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

export interface RunnerHost {
  post(reply: StudyReply, transfer?: Transferable[]): void;
  /** Calls `next` soon, after any message already waiting has been handled. */
  defer(next: () => void): void;
  now(): number;
  /**
   * Helper threads for parts of a run: how many at most (0: this thread alone; a run's `threads` may ask
   * for fewer), and how to start one.
   */
  helpers?: { count: number; create(): PartWorker };
}

interface Helper {
  worker: PartWorker;
  done: number;
  part: ProbabilityPart | null;
}

interface Job {
  id: number;
  /** The whole run: counts its own last part, absorbs the helpers'. */
  run: ProbabilityMapRun;
  /** This thread's part (the whole run when there are no helpers). */
  own: ProbabilityMapRun;
  helpers: Helper[];
  whose: 'concept' | 'typical';
  ranged: number;
  started: number;
  /** When progress was last posted. */
  reported: number;
  cancelled: boolean;
}

/** Least time between two progress messages to the window [ms]. */
const PROGRESS_MS = 100;

/** Samples between clock readings inside a slice. */
const STEP = 64;

export class StudyRunner {
  readonly #host: RunnerHost;
  readonly #sliceMs: number;
  #job: Job | null = null;
  /**
   * Helper threads that finished their part, kept for the next run: their compiled code is warm, so
   * "Run again" gets both cores at once instead of waiting for a new thread to start and compile.
   */
  readonly #idle: PartWorker[] = [];

  constructor(host: RunnerHost, sliceMs = 40) {
    this.#host = host;
    this.#sliceMs = sliceMs;
  }

  get busy(): boolean {
    return this.#job !== null;
  }

  handle(request: StudyRequest): void {
    if (request.type === 'prepare') {
      this.#prepareHelpers(this.#helperCount(request.threads));
      return;
    }
    if (request.type === 'cancel') {
      const job = this.#job;
      if (job?.id !== request.id) return;
      job.cancelled = true;
      // Waiting for helpers, with no slice to come: stop now.
      if (job.own.done() >= job.own.total) this.#slice(job);
      return;
    }
    if (this.#job) {
      this.#stopHelpers(this.#job);
      this.#host.post({ type: 'cancelled', id: this.#job.id, done: this.#doneSoFar(this.#job), total: this.#job.run.total });
    }
    this.#job = null;
    const prepared = prepareStudy(request.concept, request.grid);
    if (!prepared.ok) {
      this.#host.post({ type: 'failed', id: request.id, message: prepared.message });
      return;
    }
    const job: Job = { id: request.id, run: prepared.run, own: prepared.run, helpers: [], whose: prepared.whose, ranged: prepared.ranged, started: this.#host.now(), reported: -Infinity, cancelled: false };
    this.#job = job;
    this.#startHelpers(job, request, prepared);
    job.reported = this.#host.now();
    this.#host.post({ type: 'progress', id: job.id, done: 0, total: job.run.total });
    this.#host.defer(() => this.#slice(job));
  }

  /** Helper threads a run of `threads` threads in all would use: no more than the host offers. */
  #helperCount(threads: number | undefined): number {
    const count = Math.min(this.#host.helpers?.count ?? 0, threads === undefined ? Infinity : Math.floor(threads) - 1);
    return count >= 1 ? count : 0;
  }

  /** Starts helpers until `count` are waiting or at work on a run; where none can be started, the runs go on without them. */
  #prepareHelpers(count: number): void {
    const helpers = this.#host.helpers;
    const working = this.#job?.helpers.filter((helper) => !helper.part).length ?? 0;
    try {
      while (helpers && this.#idle.length + working < count) this.#idle.push(helpers.create());
    } catch {
      // No helper threads here.
    }
  }

  /** Hands all but the last part to helper threads; this thread keeps the last. */
  #startHelpers(job: Job, request: Extract<StudyRequest, { type: 'run' }>, prepared: Extract<Prepared, { ok: true }>): void {
    const helpers = this.#host.helpers;
    const count = this.#helperCount(request.threads);
    if (!helpers || count < 1) return;
    const parts = sampleParts(job.run.total, count + 1);
    if (parts.length < 2) return;
    try {
      for (const part of parts.slice(0, -1)) {
        const helper: Helper = { worker: this.#idle.pop() ?? helpers.create(), done: 0, part: null };
        helper.worker.onmessage = (event) => this.#fromHelper(job, helper, event.data);
        helper.worker.onerror = (event) => {
          event.preventDefault?.();
          this.#fromHelper(job, helper, { type: 'failed', message: event.message || 'a helper thread could not run' });
        };
        helper.worker.postMessage({ concept: request.concept, grid: request.grid, part });
        job.helpers.push(helper);
      }
    } catch {
      // No helper threads here: this thread runs everything.
      this.#stopHelpers(job);
      job.helpers = [];
      return;
    }
    job.own = prepared.partRun(parts[parts.length - 1]);
  }

  /** Ends the helpers still running a part (one cannot be interrupted); those done are already kept. */
  #stopHelpers(job: Job): void {
    for (const helper of job.helpers) if (!helper.part) helper.worker.terminate();
  }

  /** Keeps a helper that has answered, for the next run. */
  #keep(worker: PartWorker): void {
    worker.onmessage = null;
    worker.onerror = null;
    this.#idle.push(worker);
  }

  #fromHelper(job: Job, helper: Helper, reply: PartReply): void {
    if (this.#job !== job) return;
    if (reply.type === 'progress') {
      helper.done = reply.done;
      this.#progress(job);
      return;
    }
    if (reply.type === 'failed') {
      this.#job = null;
      this.#stopHelpers(job);
      this.#host.post({ type: 'failed', id: job.id, message: `the study stopped: ${reply.message}` });
      return;
    }
    helper.part = reply.part;
    helper.done = reply.part.end - reply.part.first;
    this.#keep(helper.worker);
    this.#finishIfDone(job);
  }

  /**
   * Tells the window how far the run has got: at most every PROGRESS_MS, and when every sample is done.
   * Each message redraws the window's progress bar, on a core the samples could use.
   */
  #progress(job: Job): void {
    const done = this.#doneSoFar(job);
    const now = this.#host.now();
    if (done < job.run.total && now - job.reported < PROGRESS_MS) return;
    job.reported = now;
    this.#host.post({ type: 'progress', id: job.id, done, total: job.run.total });
  }

  #doneSoFar(job: Job): number {
    return job.own.done() + job.helpers.reduce((sum, helper) => sum + helper.done, 0);
  }

  /** With this thread's part and every helper's counted, absorbs them and posts the map. */
  #finishIfDone(job: Job): void {
    if (this.#job !== job || job.own.done() < job.own.total || job.helpers.some((helper) => !helper.part)) return;
    this.#job = null;
    if (job.own !== job.run) {
      job.run.absorb(job.own.part());
      for (const helper of job.helpers) job.run.absorb(helper.part as ProbabilityPart);
    }
    const map = job.run.result();
    const outcome = { map, whose: job.whose, ranged: job.ranged, elapsedMs: this.#host.now() - job.started };
    this.#host.post({ type: 'done', id: job.id, outcome }, [map.wingLoadings.buffer, map.loadings.buffer, map.probability.buffer]);
  }

  #slice(job: Job): void {
    if (this.#job !== job) return;
    const { run, own } = job;
    if (job.cancelled) {
      this.#job = null;
      this.#stopHelpers(job);
      this.#host.post({ type: 'cancelled', id: job.id, done: this.#doneSoFar(job), total: run.total });
      return;
    }
    let finished = own.done() >= own.total;
    try {
      const start = this.#host.now();
      while (!finished) {
        finished = own.step(STEP);
        if (this.#host.now() - start >= this.#sliceMs) break;
      }
    } catch (error) {
      this.#job = null;
      this.#stopHelpers(job);
      this.#host.post({ type: 'failed', id: job.id, message: `the study stopped: ${error instanceof Error ? error.message : String(error)}` });
      return;
    }
    this.#progress(job);
    // This thread's part goes on; once it is done, the helpers' last answers finish the run.
    if (!finished) this.#host.defer(() => this.#slice(job));
    else this.#finishIfDone(job);
  }
}
