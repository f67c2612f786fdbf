import { describe, expect, it } from 'vitest';
import { parseConcept, probabilityMap } from '../../../core';
import { KNOT_MPS } from '../../../core/units/factors';
import { prepareStudy, StudyRunner, type PartWorker, type RunnerHost } from '../../../app/renderer/lib/studies/probability-runner';
import type { PartReply, PartRequest, StudyReply } from '../../../app/renderer/lib/studies/probability-protocol';
import { setIn } from '../../../app/renderer/lib/concept/edit';
import { stallOnly } from './fixtures';

const GRID = { wingLoading: [400, 1000] as [number, number], loading: [0, 30] as [number, number], nx: 31, ny: 6 };
const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const V = 45 * KNOT_MPS; // 1 kt = 1852/3600 m/s exactly (NIST SP 811)

/** P(CLmax >= 2w/(rho0 V^2)) for CLmax ~ U(a, b) (stalling speed, Anderson, Introduction to Flight; uniform CDF). */
function stallChance(w: number, a: number, b: number): number {
  const needed = (2 * w) / (RHO0 * V * V);
  return Math.min(1, Math.max(0, (b - needed) / (b - a)));
}

/** A host whose clock advances 1 ms per reading, and whose deferred calls wait in a queue run by `drain`. */
function testHost(): RunnerHost & { replies: StudyReply[]; drain(limit?: number): void; queued(): number } {
  let clock = 0;
  const queue: Array<() => void> = [];
  const replies: StudyReply[] = [];
  return {
    replies,
    post: (reply) => replies.push(reply),
    defer: (next) => queue.push(next),
    now: () => (clock += 1),
    queued: () => queue.length,
    drain(limit = Infinity) {
      for (let i = 0; i < limit && queue.length > 0; i++) queue.shift()!();
    },
  };
}

/** Helper threads that never answer: counts how many were started and ended, and keeps what each was asked. */
function silentHelpers() {
  const counts = { created: 0, terminated: 0 };
  const started: PartRequest[] = [];
  const create = (): PartWorker => {
    counts.created++;
    return { onmessage: null, onerror: null, terminate: () => void counts.terminated++, postMessage: (request: PartRequest) => void started.push(request) };
  };
  return { counts, started, create };
}

describe('the chance study runner', () => {
  it('gives the closed-form chance at the design point for a stall-only concept, within 4 standard errors', () => {
    const host = testHost();
    const runner = new StudyRunner(host, 5);
    const n = 20000;
    runner.handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, n), grid: GRID });
    host.drain();
    const done = host.replies.find((reply) => reply.type === 'done');
    if (done?.type !== 'done') throw new Error(`no result: ${JSON.stringify(host.replies.at(-1))}`);
    const point = done.outcome.map.designPoint!;
    const p = stallChance(650, 1.6, 2.8);
    expect(Math.abs(point.probability - p)).toBeLessThanOrEqual(4 * Math.sqrt((p * (1 - p)) / n));
    expect(point.byRequirement).toEqual([{ id: 'stall', probability: point.probability }]);
    expect(done.outcome).toMatchObject({ whose: 'concept', ranged: 1 });
    // Progress came in several slices, rising to the total.
    const progress = host.replies.filter((reply) => reply.type === 'progress').map((reply) => (reply.type === 'progress' ? reply.done : -1));
    expect(progress.length).toBeGreaterThan(3);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    expect(progress.at(-1)).toBe(n);
  });

  it('gives, in slices, exactly the map of one uninterrupted run with the same seed', () => {
    const concept = stallOnly(650, 1.6, 2.8, 3000);
    const host = testHost();
    new StudyRunner(host, 3).handle({ type: 'run', id: 7, concept, grid: GRID });
    host.drain();
    const done = host.replies.find((reply) => reply.type === 'done');
    const parsed = parseConcept(concept);
    if (!parsed.ok || !parsed.uncertainty || done?.type !== 'done') throw new Error('expected a parsed concept and a result');
    const whole = probabilityMap(parsed.design, parsed.uncertainty.parameters, { seed: 20261202, samples: 3000, grid: GRID });
    expect(Array.from(done.outcome.map.probability)).toEqual(Array.from(whole!.probability));
    expect(done.outcome.map.designPoint).toEqual(whole!.designPoint);
  });

  it('gives the same map, bit for bit, with 1, 2 or 3 helper threads as on its own', () => {
    // Helper threads stood in for by queued calls that do what probability-part.worker.ts does.
    const withHelpers = (count: number) => {
      const host = testHost();
      const started: PartRequest[] = [];
      let terminated = 0;
      const create = (): PartWorker => {
        const worker: PartWorker = {
          onmessage: null,
          onerror: null,
          terminate: () => void terminated++,
          postMessage(request: PartRequest) {
            started.push(request);
            host.defer(() => {
              const prepared = prepareStudy(request.concept, request.grid, request.part);
              if (!prepared.ok) throw new Error(prepared.message);
              while (!prepared.run.step(250)) worker.onmessage?.({ data: { type: 'progress', done: prepared.run.done() } as PartReply } as MessageEvent<PartReply>);
              worker.onmessage?.({ data: { type: 'part', part: prepared.run.part() } as PartReply } as MessageEvent<PartReply>);
            });
          },
        };
        return worker;
      };
      let created = 0;
      const counted = (): PartWorker => (created++, create());
      const runner = new StudyRunner({ ...host, helpers: { count, create: counted } }, 3);
      runner.handle({ type: 'run', id: 9, concept: stallOnly(650, 1.6, 2.8, 2600), grid: GRID });
      host.drain();
      const done = host.replies.find((reply) => reply.type === 'done');
      if (done?.type !== 'done') throw new Error(`no result: ${JSON.stringify(host.replies.at(-1))}`);
      // Run again: the helpers that answered are used again, none started anew, and the map is the same.
      runner.handle({ type: 'run', id: 10, concept: stallOnly(650, 1.6, 2.8, 2600), grid: GRID });
      host.drain();
      const again = host.replies.find((reply) => reply.type === 'done' && reply.id === 10);
      if (again?.type !== 'done') throw new Error(`no second result: ${JSON.stringify(host.replies.at(-1))}`);
      return { map: done.outcome.map, again: again.outcome.map, started, terminated, created, replies: host.replies.filter((reply) => reply.id === 9) };
    };
    const alone = withHelpers(0);
    expect(alone.started).toEqual([]);
    for (const count of [1, 2, 3]) {
      const run = withHelpers(count);
      expect(run.started).toHaveLength(2 * count);
      expect(run.created).toBe(count);
      expect(run.terminated).toBe(0);
      expect(Buffer.from(run.again.probability.buffer)).toEqual(Buffer.from(alone.map.probability.buffer));
      expect(run.map.samples).toBe(2600);
      expect(Buffer.from(run.map.probability.buffer)).toEqual(Buffer.from(alone.map.probability.buffer));
      expect(run.map.designPoint).toEqual(alone.map.designPoint);
      expect(run.map.optimumSpread).toEqual(alone.map.optimumSpread);
      const progress = run.replies.flatMap((reply) => (reply.type === 'progress' ? [reply.done] : []));
      expect(Math.max(...progress)).toBe(2600);
    }
  });

  it('ends the helper threads still running a part when the run is cancelled, and starts new ones for the next run', () => {
    // Helpers that never answer: a part cannot be interrupted, so cancel must end them, not keep them.
    const host = testHost();
    const { counts, create } = silentHelpers();
    const runner = new StudyRunner({ ...host, helpers: { count: 2, create } }, 2);
    runner.handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID });
    host.drain(1);
    runner.handle({ type: 'cancel', id: 1 });
    host.drain();
    expect(host.replies.at(-1)?.type).toBe('cancelled');
    expect(counts.terminated).toBe(2);
    runner.handle({ type: 'run', id: 2, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID });
    expect(counts.created).toBe(4);
  });

  it('uses no more threads than the window asks for', () => {
    const host = testHost();
    const { counts, create } = silentHelpers();
    const runner = new StudyRunner({ ...host, helpers: { count: 3, create } }, 2);
    runner.handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID, threads: 1 });
    expect(counts.created).toBe(0);
    runner.handle({ type: 'run', id: 2, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID, threads: 3 });
    expect(counts.created).toBe(2);
    runner.handle({ type: 'run', id: 3, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID });
    // The two of run 2 never answered, so they were ended; run 3 starts three (its own count) anew.
    expect(counts.created).toBe(5);
    // No more threads than random blocks: 1,000 samples are two blocks of 500, so one helper at most.
    runner.handle({ type: 'run', id: 4, concept: stallOnly(650, 1.6, 2.8, 1000), grid: GRID });
    expect(counts.created).toBe(6);
  });

  it('starts the helpers a run would use when asked to prepare, and the first run uses them without starting more', () => {
    const host = testHost();
    const { counts, started, create } = silentHelpers();
    const runner = new StudyRunner({ ...host, helpers: { count: 3, create } }, 2);
    runner.handle({ type: 'prepare', threads: 1 });
    expect(counts.created).toBe(0);
    runner.handle({ type: 'prepare', threads: 3 });
    expect(counts.created).toBe(2);
    // Asked again, nothing more: two are waiting.
    runner.handle({ type: 'prepare', threads: 3 });
    expect(counts.created).toBe(2);
    expect(started).toHaveLength(0);
    expect(runner.busy).toBe(false);
    runner.handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, 3000), grid: GRID, threads: 3 });
    expect(counts.created).toBe(2);
    expect(started).toHaveLength(2);
    // Without a count from the window, the host's own, three helpers: the two at work count, so one more.
    runner.handle({ type: 'prepare' });
    expect(counts.created).toBe(3);
  });

  it('tells the window how far it has got at most every 100 ms of its clock, and once at the end', () => {
    // Each progress message redraws the window's progress bar: fewer of them leave the cores to the samples.
    let clock = 0;
    const queue: Array<() => void> = [];
    const posted: Array<{ at: number; reply: StudyReply }> = [];
    const host: RunnerHost = { post: (reply) => posted.push({ at: clock, reply }), defer: (next) => queue.push(next), now: () => (clock += 1) };
    new StudyRunner(host, 2).handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, 20000), grid: GRID });
    while (queue.length > 0) queue.shift()!();
    const progress = posted.filter(({ reply }) => reply.type === 'progress') as Array<{ at: number; reply: Extract<StudyReply, { type: 'progress' }> }>;
    expect(progress[0].reply.done).toBe(0);
    expect(progress.at(-1)?.reply.done).toBe(20000);
    expect(progress.length).toBeGreaterThan(3);
    for (let k = 1; k < progress.length - 1; k++) expect(progress[k].at - progress[k - 1].at).toBeGreaterThanOrEqual(100);
    // Slices of 2 ms: without the spacing there would be one message per slice, hundreds of them.
    expect(progress.length).toBeLessThan(clock / 100 + 3);
    expect(posted.at(-1)?.reply.type).toBe('done');
  });

  it('stops at the next pause when cancelled, and reports how far it got', () => {
    const host = testHost();
    const runner = new StudyRunner(host, 2);
    runner.handle({ type: 'run', id: 3, concept: stallOnly(650, 1.6, 2.8, 100000), grid: GRID });
    host.drain(2);
    runner.handle({ type: 'cancel', id: 3 });
    host.drain();
    const last = host.replies.at(-1);
    expect(last?.type).toBe('cancelled');
    if (last?.type === 'cancelled') {
      expect(last.done).toBeGreaterThan(0);
      expect(last.done).toBeLessThan(100000);
    }
    expect(host.replies.some((reply) => reply.type === 'done')).toBe(false);
    expect(runner.busy).toBe(false);
  });

  it('drops a run still going when a new one starts', () => {
    const host = testHost();
    const runner = new StudyRunner(host, 2);
    runner.handle({ type: 'run', id: 1, concept: stallOnly(650, 1.6, 2.8, 100000), grid: GRID });
    host.drain(1);
    runner.handle({ type: 'run', id: 2, concept: stallOnly(650, 1.6, 2.8, 1000), grid: GRID });
    host.drain();
    expect(host.replies.filter((reply) => reply.type === 'cancelled').map((reply) => reply.id)).toEqual([1]);
    expect(host.replies.filter((reply) => reply.type === 'done').map((reply) => reply.id)).toEqual([2]);
  });

  it('says which field stops a run, in the words of the concept schema', () => {
    const host = testHost();
    const runner = new StudyRunner(host);
    runner.handle({ type: 'run', id: 1, concept: setIn(stallOnly(650), ['uncertainty', 'samples'], 5), grid: GRID });
    runner.handle({ type: 'run', id: 2, concept: setIn(stallOnly(650), ['aircraft', 'takeoffMass'], '-5 kg'), grid: GRID });
    runner.handle({ type: 'run', id: 3, concept: stallOnly(650), grid: { ...GRID, nx: 1 } });
    const failed = host.replies.filter((reply) => reply.type === 'failed').map((reply) => (reply.type === 'failed' ? reply.message : ''));
    expect(failed[0]).toMatch(/^uncertainty\.samples: must be at least 100/);
    expect(failed[1]).toMatch(/^aircraft\.takeoffMass: /);
    expect(failed[2]).toMatch(/grid\.nx is 1/);
    expect(failed.join(' ')).not.toMatch(/NaN|undefined/);
  });

  it('samples the typical ranges, and says so, when the concept ranges nothing of its own', () => {
    const host = testHost();
    const concept = setIn(stallOnly(650, 1.6, 2.8, 500), ['uncertainty', 'parameters'], []);
    new StudyRunner(host).handle({ type: 'run', id: 1, concept, grid: GRID });
    host.drain();
    const done = host.replies.find((reply) => reply.type === 'done');
    expect(done?.type === 'done' && done.outcome.whose).toBe('typical');
    expect(done?.type === 'done' && done.outcome.ranged).toBeGreaterThan(1);
  });
});
