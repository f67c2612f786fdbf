/**
 * Builds the window's report in a Web Worker, so the window stays responsive
 * while the studies run. Where no worker can start (an old shell, a page
 * opened from a file), it builds in the page after letting the "Preparing
 * the report…" status paint.
 */
// @ts-nocheck

import type { ReportAnswer } from './report-worker';
import { windowReportHtml, type WindowReportRequest } from './report-request';

/** The part of a Worker used here. */
export interface WorkerLike {
  onmessage: ((event: MessageEvent<ReportAnswer>) => void) | null;
  onerror: ((event: Event) => void) | null;
  postMessage(request: WindowReportRequest): void;
  terminate(): void;
}

function defaultWorker(): WorkerLike | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./report-worker.ts', import.meta.url), { type: 'module', name: 'loftpoint-report' }) as unknown as WorkerLike;
  } catch {
    return null;
  }
}

/** In the page, one frame later, so the status line shows before the work starts. */
async function inPage(request: WindowReportRequest): Promise<string> {
  await new Promise((resolve) => setTimeout(resolve, 50));
  return windowReportHtml(request);
}

export function buildReportOffThread(request: WindowReportRequest, makeWorker: () => WorkerLike | null = defaultWorker): Promise<string> {
  const worker = makeWorker();
  if (!worker) return inPage(request);
  return new Promise((resolve, reject) => {
    worker.onmessage = (event) => {
      worker.terminate();
      if (event.data.ok) resolve(event.data.html);
      else reject(new Error(event.data.message));
    };
    // The worker could not start (its script failed to load): build in the page instead.
    worker.onerror = (event) => {
      event.preventDefault?.();
      worker.terminate();
      inPage(request).then(resolve, reject);
    };
    worker.postMessage(request);
  });
}
