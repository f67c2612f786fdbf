import { describe, expect, it } from 'vitest';
import { ProbabilityStudy, type StudyWorker } from '../../../app/renderer/lib/studies/probability.svelte';
import type { StudyRequest } from '../../../app/renderer/lib/studies/probability-protocol';
import { stallOnly } from './fixtures';

const GRID = { wingLoading: [400, 1000] as [number, number], loading: [0, 30] as [number, number], nx: 31, ny: 6 };
const KEYS = { concept: null, key: 'k', pointKey: 'p' };

/** A worker that only records what it is sent. */
function recordingWorker(): StudyWorker & { sent: StudyRequest[] } {
  const sent: StudyRequest[] = [];
  return { sent, onmessage: null, onerror: null, postMessage: (message) => void sent.push(message), terminate: () => undefined };
}

describe("the window's chance study", () => {
  it('asks for as many threads as the window sees cores, and leaves the choice to the worker where the browser does not say', () => {
    for (const [cores, expected] of [
      [1, 1],
      [2, 2],
      [8, 8],
    ] as const) {
      const worker = recordingWorker();
      new ProbabilityStudy(() => worker, () => cores).run(stallOnly(650), GRID, KEYS);
      expect(worker.sent).toHaveLength(1);
      expect(worker.sent[0]).toMatchObject({ type: 'run', id: 1, threads: expected });
    }
    const silent = recordingWorker();
    new ProbabilityStudy(() => silent, () => undefined).run(stallOnly(650), GRID, KEYS);
    expect(silent.sent[0].type).toBe('run');
    expect('threads' in silent.sent[0]).toBe(false);
  });

  it('prepares the worker with the same thread count, before any run, and computes nothing', () => {
    const worker = recordingWorker();
    let made = 0;
    const study = new ProbabilityStudy(() => (made++, worker), () => 2);
    study.prepare();
    expect(made).toBe(1);
    expect(worker.sent).toEqual([{ type: 'prepare', threads: 2 }]);
    expect(study.phase).toBe('idle');
    // The run that follows goes to the same worker.
    study.run(stallOnly(650), GRID, KEYS);
    expect(made).toBe(1);
    expect(worker.sent[1]).toMatchObject({ type: 'run', threads: 2 });
    const silent = recordingWorker();
    new ProbabilityStudy(() => silent, () => undefined).prepare();
    expect(silent.sent).toEqual([{ type: 'prepare' }]);
  });
});
