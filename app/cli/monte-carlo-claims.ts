/**
 * What every thread of the report's Monte Carlo shares (the main thread in
 * monte-carlo-workers.ts, a worker thread in monte-carlo-thread.ts): claiming
 * samples from the shared counter, running the claims as part runs of core
 * `probabilityMapRun`, and the ranged assumptions sent between threads as
 * plain data. Imports only the core modules the samples need (no schemas, no
 * concept parsing), so a worker thread loads little before its first sample.
 */
import { readFileSync } from 'node:fs';
import { probabilityMapRun, type ProbabilityPart } from '../../core/studies/monte-carlo';
import type { ProbabilityGrid } from '../../core/studies/probability-grid';
import { workingCopy, assigner, targetConfigurations } from '../../core/studies/uncertain-apply';
import { fieldRef } from '../../core/studies/uncertain-fields';
import type { UncertainParameter } from '../../core/studies/uncertainty-schema';
import type { Design } from '../../core/model';

/** The fewest samples a thread claims at once: the most one thread can be left running after the others end. */
export const LEAST_CLAIM = 100;

/** The run every thread works on: seed, samples and grid as core `probabilityMapRun` takes them. */
export interface MonteCarloJob {
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
  /** The design and ranges were in hand and its first claim began. */
  readyAt: number;
  /** Its last claim ended. */
  doneAt: number;
  samples: number;
  claims: number;
  /** CPU time of this thread alone at readyAt and doneAt (ms; NaN where the system does not tell). */
  cpuAtReady: number;
  cpuAtDone: number;
}

/** A ranged assumption as plain data (no functions), to send to another thread. */
export type PlainParameter = Omit<UncertainParameter, 'apply' | 'assign'>;

/** The ranged assumptions without their functions, which cannot cross to another thread. */
export function plainParameters(parameters: readonly UncertainParameter[]): PlainParameter[] {
  return parameters.map((p) => ({
    field: p.field,
    label: p.label,
    low: p.low,
    nominal: p.nominal,
    high: p.high,
    distribution: p.distribution,
    ...(p.requirementIds ? { requirementIds: [...p.requirementIds] } : {}),
  }));
}

/**
 * The ranged assumptions again, with the functions that write each into a
 * design made again from its field, as core `resolveUncertainty` makes them
 * (the numbers are the ones sent, already checked and resolved). `concept`
 * tells which configurations inherit clean's values. Throws on a field the
 * design does not have.
 */
export function threadParameters(plain: readonly PlainParameter[], design: Design, concept: unknown): UncertainParameter[] {
  return plain.map((p) => {
    const found = fieldRef(p.field, design);
    if (!found.ok) throw new Error(`${p.field}: ${found.message}`);
    const assign = assigner(found.ref, targetConfigurations(found.ref, design, concept));
    return {
      ...p,
      apply: (d: Design, value: number) => {
        const working = workingCopy(d);
        assign(working, value);
        return working;
      },
      assign,
    };
  });
}

/** The same text as V8's one shared copy of it: a property name is always that copy. */
function sharedCopy(text: string): string {
  return Object.keys({ [text]: 0 })[0] ?? text;
}

/**
 * `value` (a design, a concept, ranged assumptions, as another thread sent
 * them) with every text in it, at any depth, replaced in place by the same
 * text as V8 keeps it for property names; answers `value`. Text received
 * from another thread is a private copy, so every kind, configuration name
 * and distribution the samples look up or compare is matched character by
 * character instead of at once: a worker's samples ran a few per cent slower
 * on such a design than on one read from the concept (each thread's own CPU
 * time, side by side). Only the copies change: every value stays equal, so
 * the samples draw the very same numbers.
 */
export function sharedTexts<T>(value: T): T {
  const seen = new Set<object>();
  const visit = (node: unknown): void => {
    if (node === null || typeof node !== 'object' || seen.has(node)) return;
    seen.add(node);
    if (ArrayBuffer.isView(node)) return;
    const record = node as Record<string, unknown>;
    for (const key of Object.keys(record)) {
      const item = record[key];
      if (typeof item === 'string') record[key] = sharedCopy(item);
      else visit(item);
    }
  };
  visit(value);
  return value;
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
export const now = () => performance.timeOrigin + performance.now();

/** This thread's own CPU time in ms, from Linux's per-thread scheduler figures; NaN elsewhere. */
export function threadCpuMs(): number {
  try {
    return Number(readFileSync('/proc/thread-self/schedstat', 'utf8').split(' ')[0]) / 1e6;
  } catch {
    return NaN;
  }
}

/** Runs claims until none is left: each claim a part run of its own, its counts kept to be absorbed. */
export function runClaims(design: Design, parameters: readonly UncertainParameter[], job: MonteCarloJob, next: Int32Array, threads: number, timing: ThreadTiming): ProbabilityPart[] {
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
