/**
 * The report's builder off the page's main thread: the studies (the Monte
 * Carlo map above all) take half a second or more, and the window keeps
 * answering meanwhile. One request in, one answer out.
 */
// @ts-nocheck

import { windowReportHtml, type WindowReportRequest } from './report-request';

export type ReportAnswer = { ok: true; html: string } | { ok: false; message: string };

const scope = self as unknown as { onmessage: ((event: MessageEvent<WindowReportRequest>) => void) | null; postMessage(answer: ReportAnswer): void };

scope.onmessage = (event) => {
  try {
    scope.postMessage({ ok: true, html: windowReportHtml(event.data) });
  } catch (error) {
    scope.postMessage({ ok: false, message: error instanceof Error ? error.message.split('\n')[0] : String(error) });
  }
};
