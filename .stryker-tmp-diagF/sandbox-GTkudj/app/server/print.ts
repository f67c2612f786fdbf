/**
 * Printing for browser mode: a checked report is printed to PDF by headless
 * Chromium (app/report/chromium.ts), one at a time. Every way it can fail
 * comes back as a result with a message a person can act on, never as an
 * exception.
 */
// @ts-nocheck

import { ChromiumUnavailable, findChromium, printPdf } from '../report/chromium';
import type { ServiceResult } from '../shared/contract';
import { failure } from '../shared/transport';

/** The PDF of a report's HTML, already checked by checkPrintRequest. */
export type PrintPdf = (html: string) => Promise<ServiceResult<Uint8Array>>;

export interface PrinterParts {
  find: () => string;
  print: (html: string, options: { binary: string }) => Promise<Buffer>;
}

const CHROMIUM: PrinterParts = { find: () => findChromium(), print: (html, options) => printPdf(html, options) };

export function chromiumPrinter(parts: PrinterParts = CHROMIUM): PrintPdf {
  // One browser at a time: a second request waits for the first.
  let queue: Promise<unknown> = Promise.resolve();
  const printOne = async (html: string): Promise<ServiceResult<Uint8Array>> => {
    try {
      const binary = parts.find();
      const pdf = await parts.print(html, { binary });
      return { ok: true, value: new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength) };
    } catch (error) {
      const message = error instanceof Error ? error.message.split('\n')[0] : String(error);
      // Missing Chromium is the computer's set-up, not a fault: its message says what to install or set.
      return failure(error instanceof ChromiumUnavailable ? 'io' : 'internal', `The report could not be printed to PDF on the computer running Loftpoint: ${message}`);
    }
  };
  return (html) => {
    const result = queue.then(() => printOne(html));
    queue = result.catch(() => undefined);
    return result;
  };
}
