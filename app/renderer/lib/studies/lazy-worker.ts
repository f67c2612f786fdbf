/**
 * A worker whose script is fetched the first time a study runs, so the
 * window's first page does not carry it: messages posted before it has
 * started wait and go out in order; a script that cannot be loaded is
 * reported through `onerror` like a worker that failed to start.
 */
import type { StudyReply, StudyRequest } from './probability-protocol';
import type { StudyWorker } from './probability.svelte';

/** What a loaded worker script gives: a way to start one worker. */
export type StartWorker = () => Pick<Worker, 'postMessage' | 'terminate'> & {
  onmessage: ((event: MessageEvent<StudyReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
};

export function lazyWorker(load: () => Promise<StartWorker>): StudyWorker {
  let started: ReturnType<StartWorker> | null = null;
  let waiting: StudyRequest[] = [];
  let terminated = false;
  const worker: StudyWorker = {
    onmessage: null,
    onerror: null,
    postMessage(message) {
      if (started) started.postMessage(message);
      else waiting.push(message);
    },
    terminate() {
      terminated = true;
      waiting = [];
      started?.terminate();
    },
  };
  load().then(
    (start) => {
      if (terminated) return;
      started = start();
      started.onmessage = (event) => worker.onmessage?.(event);
      started.onerror = (event) => worker.onerror?.(event);
      for (const message of waiting) started.postMessage(message);
      waiting = [];
    },
    (error: unknown) => {
      if (terminated) return;
      const reason = error instanceof Error ? error.message : String(error);
      // Only the message is read (as from a worker that failed to start).
      worker.onerror?.({ message: `the study's worker could not be loaded (${reason})` } as ErrorEvent);
    },
  );
  return worker;
}
