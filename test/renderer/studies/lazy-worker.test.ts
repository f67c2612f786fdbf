import { describe, expect, it } from 'vitest';
import { lazyWorker, type StartWorker } from '../../../app/renderer/lib/studies/lazy-worker';
import type { StudyReply, StudyRequest } from '../../../app/renderer/lib/studies/probability-protocol';

/** A recording stand-in for a started worker. */
function recorder() {
  const started = {
    received: [] as StudyRequest[],
    terminated: false,
    onmessage: null as ((event: MessageEvent<StudyReply>) => void) | null,
    onerror: null as ((event: ErrorEvent) => void) | null,
    postMessage(message: StudyRequest) {
      started.received.push(message);
    },
    terminate() {
      started.terminated = true;
    },
  };
  return started;
}

const run = (id: number): StudyRequest => ({ type: 'cancel', id });
const turn = () => new Promise((resolveTurn) => setTimeout(resolveTurn, 0));

describe('lazyWorker', () => {
  it('keeps messages posted before the script has loaded and sends them in order once it has', async () => {
    const started = recorder();
    let loaded!: (start: StartWorker) => void;
    const worker = lazyWorker(() => new Promise((resolveLoad) => (loaded = resolveLoad)));
    worker.postMessage(run(1));
    worker.postMessage(run(2));
    await turn();
    expect(started.received).toEqual([]);
    loaded(() => started as unknown as ReturnType<StartWorker>);
    await turn();
    expect(started.received).toEqual([run(1), run(2)]);
    worker.postMessage(run(3));
    expect(started.received).toEqual([run(1), run(2), run(3)]);
    // Replies reach whoever listens on the stand-in.
    const replies: unknown[] = [];
    worker.onmessage = (event) => replies.push(event.data);
    started.onmessage?.({ data: { type: 'progress', id: 3, done: 1, total: 2 } } as unknown as MessageEvent<StudyReply>);
    expect(replies).toEqual([{ type: 'progress', id: 3, done: 1, total: 2 }]);
  });

  it('starts nothing when terminated before the script arrived', async () => {
    const started = recorder();
    let starts = 0;
    const worker = lazyWorker(async () => () => {
      starts += 1;
      return started as unknown as ReturnType<StartWorker>;
    });
    worker.postMessage(run(1));
    worker.terminate();
    await turn();
    expect(starts).toBe(0);
    expect(started.received).toEqual([]);
  });

  it('reports a script that cannot be fetched as a worker error with the reason', async () => {
    const worker = lazyWorker(async () => {
      throw new Error('Failed to fetch dynamically imported module');
    });
    const messages: string[] = [];
    worker.onerror = (event) => messages.push(event.message);
    worker.postMessage(run(1));
    await turn();
    expect(messages).toEqual(["the study's worker could not be loaded (Failed to fetch dynamically imported module)"]);
  });
});
