/**
 * The chance study as the window sees it: whether it is running and how far
 * it has got, the last finished result, and what stopped a run. The work
 * happens in a worker (probability.worker.ts); this class only talks to it.
 * A result remembers what it was computed from, so the window can tell when
 * the concept has moved on (see study-parameters.ts, studyKey).
 */
import type { ProbabilityGrid } from '../../../../core';
import type { StudyOutcome, StudyReply, StudyRequest } from './probability-protocol';

export type StudyPhase = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface StudyResult extends StudyOutcome {
  /** The concept of the project it ran on (null outside a project). */
  concept: string | null;
  /** studyKey of the document it ran on. */
  key: string;
  /** pointKey of the document it ran on. */
  pointKey: string;
}

/** The little of a Worker this class uses, so a test can stand in for one. */
export interface StudyWorker {
  postMessage(message: StudyRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<StudyReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

/** The cores the window's own thread sees; undefined where the browser does not say. */
function windowCores(): number | undefined {
  const cores = typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency;
  return typeof cores === 'number' && cores >= 1 ? cores : undefined;
}

export class ProbabilityStudy {
  phase = $state<StudyPhase>('idle');
  done = $state(0);
  total = $state(0);
  /** The last finished run; kept through later cancelled or failed runs. */
  result = $state.raw<StudyResult | null>(null);
  /** Why the last run did not finish (failed), or where it stopped (cancelled). */
  message = $state<string | null>(null);

  readonly #create: () => StudyWorker;
  #worker: StudyWorker | null = null;
  #id = 0;
  #keys: { concept: string | null; key: string; pointKey: string } = { concept: null, key: '', pointKey: '' };

  /** How many threads a run may use in all: the cores the window sees (undefined: the worker decides). */
  readonly #threads: () => number | undefined;

  constructor(create: () => StudyWorker, threads: () => number | undefined = windowCores) {
    this.#create = create;
    this.#threads = threads;
  }

  get running(): boolean {
    return this.phase === 'running';
  }

  /** Fraction done, 0 to 1. */
  get fraction(): number {
    return this.total > 0 ? Math.min(1, this.done / this.total) : 0;
  }

  /** Starts a run of this concept document; one already going is dropped. */
  run(concept: unknown, grid: ProbabilityGrid, keys: { concept: string | null; key: string; pointKey: string }): void {
    let worker: StudyWorker;
    try {
      worker = this.#ensureWorker();
    } catch (error) {
      this.#fail(`the study could not start: ${error instanceof Error ? error.message : String(error)}`);
      return;
    }
    this.#id += 1;
    this.#keys = keys;
    this.phase = 'running';
    this.done = 0;
    this.total = 0;
    this.message = null;
    // A plain copy: the document may be a reactive proxy, which the structured clone refuses.
    const request: Extract<StudyRequest, { type: 'run' }> = { type: 'run', id: this.#id, concept: JSON.parse(JSON.stringify(concept)), grid: { ...grid, wingLoading: [...grid.wingLoading], loading: [...grid.loading] } };
    const threads = this.#threads();
    if (threads !== undefined) request.threads = threads;
    worker.postMessage(request);
  }

  /**
   * Starts the study's worker and the helper threads a run would use, ahead of the first run (the Ranges
   * panel asks when it opens): the first run then finds them loaded. Nothing is computed.
   */
  prepare(): void {
    let worker: StudyWorker;
    try {
      worker = this.#ensureWorker();
    } catch {
      // The first run says why, if it cannot start either.
      return;
    }
    const threads = this.#threads();
    worker.postMessage(threads === undefined ? { type: 'prepare' } : { type: 'prepare', threads });
  }

  cancel(): void {
    if (this.phase !== 'running' || !this.#worker) return;
    this.#worker.postMessage({ type: 'cancel', id: this.#id });
  }

  /** Forgets the result (the contours leave the diagram). */
  clear(): void {
    if (this.phase === 'running') return;
    this.result = null;
    this.phase = 'idle';
    this.message = null;
  }

  dispose(): void {
    this.#worker?.terminate();
    this.#worker = null;
    if (this.phase === 'running') this.phase = 'cancelled';
  }

  #ensureWorker(): StudyWorker {
    if (this.#worker) return this.#worker;
    const worker = this.#create();
    worker.onmessage = (event) => this.#receive(event.data);
    worker.onerror = (event) => {
      event.preventDefault?.();
      // A worker that failed to load or broke is replaced on the next run.
      this.#worker?.terminate();
      this.#worker = null;
      this.#fail(`the study stopped: ${event.message || 'the worker could not run'}`);
    };
    this.#worker = worker;
    return worker;
  }

  #fail(message: string): void {
    this.phase = 'failed';
    this.message = message;
  }

  #receive(reply: StudyReply): void {
    if (reply.id !== this.#id) return;
    switch (reply.type) {
      case 'progress':
        this.done = reply.done;
        this.total = reply.total;
        return;
      case 'done':
        this.done = reply.outcome.map.samples;
        this.total = reply.outcome.map.samples;
        this.result = { ...reply.outcome, ...this.#keys };
        this.phase = 'done';
        return;
      case 'cancelled':
        this.phase = 'cancelled';
        this.message = `Cancelled after ${reply.done.toLocaleString('en-US')} of ${reply.total.toLocaleString('en-US')} samples.`;
        return;
      case 'failed':
        this.#fail(reply.message);
        return;
    }
  }
}
