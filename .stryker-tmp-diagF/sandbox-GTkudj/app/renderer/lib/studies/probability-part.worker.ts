/**
 * A helper thread of the chance study: runs one part of its samples (whole
 * random blocks, core `sampleParts`) for the study's worker, reporting
 * progress now and then, and posts the part's counts back. The study's
 * worker absorbs them; it ends this thread when done or cancelled.
 */
// @ts-nocheck

import type { PartReply, PartRequest } from './probability-protocol';
import { prepareStudy } from './probability-runner';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<PartRequest>) => void) | null;
  postMessage(message: PartReply, transfer?: Transferable[]): void;
};

scope.onmessage = (event) => {
  const { concept, grid, part } = event.data;
  const prepared = prepareStudy(concept, grid, part);
  if (!prepared.ok) {
    scope.postMessage({ type: 'failed', message: prepared.message });
    return;
  }
  try {
    const { run } = prepared;
    while (!run.step(500)) scope.postMessage({ type: 'progress', done: run.done() });
    const counts = run.part();
    scope.postMessage({ type: 'part', part: counts }, [counts.counts.buffer, counts.metEach.buffer, counts.optimumW.buffer, counts.optimumY.buffer] as ArrayBuffer[]);
  } catch (error) {
    scope.postMessage({ type: 'failed', message: error instanceof Error ? error.message : String(error) });
  }
};
