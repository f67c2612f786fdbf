/**
 * The worker's side of the chance study, without the worker: it reads the
 * concept, starts core `probabilityMapRun` and advances it in slices of a
 * few tens of milliseconds, reporting progress after each and yielding in
 * between so that a cancel message gets through. Same seed, samples and
 * grid: the same map as one uninterrupted run.
 */
import { parseConcept, probabilityMapRun, type ProbabilityGrid, type ProbabilityMapRun } from '../../../../core';
import type { StudyReply, StudyRequest } from './probability-protocol';
import { studyParameters } from './study-parameters';

export type Prepared =
  | { ok: true; run: ProbabilityMapRun; whose: 'concept' | 'typical'; ranged: number }
  | { ok: false; message: string };

/** The run for a concept document, or what stops it, naming the field. */
function prepareStudy(concept: unknown, grid: ProbabilityGrid): Prepared {
  const parsed = parseConcept(concept);
  if (!parsed.ok) {
    const first = parsed.issues[0];
    return { ok: false, message: first ? `${first.path || 'concept'}: ${first.message}` : 'the concept cannot be read' };
  }
  const ranges = studyParameters(parsed.concept as { uncertainty?: unknown }, parsed.design);
  if (!ranges.ok) return { ok: false, message: `${ranges.path}: ${ranges.message}` };
  if (ranges.parameters.length === 0) return { ok: false, message: 'uncertainty.parameters: no assumption is ranged; give at least one range' };
  try {
    const run = probabilityMapRun(parsed.design, ranges.parameters, { seed: ranges.seed, samples: ranges.samples, grid });
    return { ok: true, run, whose: ranges.whose, ranged: ranges.parameters.length };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}

export interface RunnerHost {
  post(reply: StudyReply, transfer?: Transferable[]): void;
  /** Calls `next` soon, after any message already waiting has been handled. */
  defer(next: () => void): void;
  now(): number;
}

interface Job {
  id: number;
  run: ProbabilityMapRun;
  whose: 'concept' | 'typical';
  ranged: number;
  started: number;
  cancelled: boolean;
}

/** Samples between clock readings inside a slice. */
const STEP = 64;

export class StudyRunner {
  readonly #host: RunnerHost;
  readonly #sliceMs: number;
  #job: Job | null = null;

  constructor(host: RunnerHost, sliceMs = 40) {
    this.#host = host;
    this.#sliceMs = sliceMs;
  }

  get busy(): boolean {
    return this.#job !== null;
  }

  handle(request: StudyRequest): void {
    if (request.type === 'cancel') {
      if (this.#job?.id === request.id) this.#job.cancelled = true;
      return;
    }
    if (this.#job) this.#host.post({ type: 'cancelled', id: this.#job.id, done: this.#job.run.done(), total: this.#job.run.total });
    this.#job = null;
    const prepared = prepareStudy(request.concept, request.grid);
    if (!prepared.ok) {
      this.#host.post({ type: 'failed', id: request.id, message: prepared.message });
      return;
    }
    const job: Job = { id: request.id, run: prepared.run, whose: prepared.whose, ranged: prepared.ranged, started: this.#host.now(), cancelled: false };
    this.#job = job;
    this.#host.post({ type: 'progress', id: job.id, done: 0, total: job.run.total });
    this.#host.defer(() => this.#slice(job));
  }

  #slice(job: Job): void {
    if (this.#job !== job) return;
    const { run } = job;
    if (job.cancelled) {
      this.#job = null;
      this.#host.post({ type: 'cancelled', id: job.id, done: run.done(), total: run.total });
      return;
    }
    let finished = false;
    try {
      const start = this.#host.now();
      do finished = run.step(STEP);
      while (!finished && this.#host.now() - start < this.#sliceMs);
    } catch (error) {
      this.#job = null;
      this.#host.post({ type: 'failed', id: job.id, message: `the study stopped: ${error instanceof Error ? error.message : String(error)}` });
      return;
    }
    this.#host.post({ type: 'progress', id: job.id, done: run.done(), total: run.total });
    if (!finished) {
      this.#host.defer(() => this.#slice(job));
      return;
    }
    this.#job = null;
    const map = run.result();
    const outcome = { map, whose: job.whose, ranged: job.ranged, elapsedMs: this.#host.now() - job.started };
    this.#host.post({ type: 'done', id: job.id, outcome }, [map.wingLoadings.buffer, map.loadings.buffer, map.probability.buffer]);
  }
}
