/**
 * What the page may hand a shell to print to PDF: one design-review report,
 * a whole HTML document, checked from `unknown` before anything opens it.
 * Both shells (the desktop window and browser mode) use these checks, then
 * print the document with its own policy put first in its head, so nothing
 * in it can run, load or fetch, whatever the page sent.
 */
// @ts-nocheck


/** The largest report accepted; the demo reports are a few hundred kilobytes. */
export const MAX_REPORT_HTML_BYTES = 8 * 1024 * 1024;

/** Allowed while printing: inline styles and embedded images, nothing else. */
export const PRINT_POLICY = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; font-src data:";

export type PrintCheck = { ok: true; html: string } | { ok: false; field: string; message: string };

const DOCUMENT_START = /^\uFEFF?\s*<!doctype html>\s*<html(?:\s[^<>]*)?>\s*<head>/i;
const HTTP_EQUIV = /http-equiv\s*=\s*(["']?)([^"'\s>]*)\1/gi;

export function checkPrintRequest(payload: unknown): PrintCheck {
  if (typeof payload !== 'object' || payload === null || Array.isArray(payload)) return { ok: false, field: '(request)', message: 'must be an object with the report as html' };
  const { html, ...rest } = payload as Record<string, unknown>;
  const extra = Object.keys(rest);
  if (extra.length > 0) return { ok: false, field: extra[0], message: 'is not a field of a print request' };
  if (typeof html !== 'string' || html.length === 0) return { ok: false, field: 'html', message: 'must be the report as HTML text' };
  if (new TextEncoder().encode(html).length > MAX_REPORT_HTML_BYTES) {
    return { ok: false, field: 'html', message: `is larger than ${MAX_REPORT_HTML_BYTES / 1024 / 1024} MB; a design-review report is far smaller` };
  }
  if (!DOCUMENT_START.test(html)) return { ok: false, field: 'html', message: 'must be a whole HTML document starting <!DOCTYPE html><html><head>' };
  // A refresh is the one way a document without scripts goes elsewhere, and no content policy stops it:
  // only the policy itself may be set this way.
  for (const match of html.matchAll(HTTP_EQUIV)) {
    if (match[2].toLowerCase() !== 'content-security-policy') return { ok: false, field: 'html', message: `may not set http-equiv "${match[2].slice(0, 40)}" (a report sets only its content security policy)` };
  }
  return { ok: true, html: lockedReport(html) };
}

/** The document with PRINT_POLICY as the first thing in its head, ahead of anything it carries itself. */
export function lockedReport(html: string): string {
  const match = DOCUMENT_START.exec(html);
  if (!match) throw new RangeError('lockedReport: the text is not a whole HTML document');
  const at = match.index + match[0].length;
  return `${html.slice(0, at)}\n<meta http-equiv="Content-Security-Policy" content="${PRINT_POLICY}">${html.slice(at)}`;
}

/** Browser mode's route for printing, beside the service API and behind the same checks. */
export const PRINT_PDF_PATH = '/api/print/pdf';
