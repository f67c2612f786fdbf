/**
 * The worker that runs the chance study off the window's thread, so the
 * diagram stays live while thousands of sampled designs are evaluated.
 * A message channel yields between slices: a cancel waiting in the queue is
 * handled before the next slice starts. With more than one core, helper
 * threads run parts of the samples (probability-part.worker.ts): as many
 * as the cores beyond one; none on a single core.
 */
// @ts-nocheck

import PartWorker from './probability-part.worker?worker&inline';
import type { StudyReply, StudyRequest } from './probability-protocol';
import { StudyRunner, type PartWorker as Helper } from './probability-runner';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<StudyRequest>) => void) | null;
  postMessage(message: StudyReply, transfer: Transferable[]): void;
};

const channel = new MessageChannel();
let next: (() => void) | null = null;
channel.port1.onmessage = () => {
  const run = next;
  next = null;
  run?.();
};

const runner = new StudyRunner({
  post: (reply, transfer = []) => scope.postMessage(reply, transfer),
  defer: (callback) => {
    next = callback;
    channel.port2.postMessage(null);
  },
  now: () => performance.now(),
  helpers: {
    count: Math.max(0, Math.min(3, (navigator.hardwareConcurrency || 1) - 1)),
    create: () => new PartWorker({ name: 'loftpoint-chance-study-part' }) as unknown as Helper,
  },
});

scope.onmessage = (event) => runner.handle(event.data);
