/**
 * Browser mode: the built page and the service API over HTTP, on 127.0.0.1
 * only. GET serves the page; POST /api/METHOD with a JSON body calls one
 * service method and answers with the same result value the desktop window
 * gets over IPC. POST /api/print/pdf, behind the same checks, prints a
 * design-review report and answers with the PDF.
 */
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { CONTENT_SECURITY_POLICY, HEADER_ONLY_POLICY } from '../shared/csp';
import { checkPrintRequest, MAX_REPORT_HTML_BYTES, PRINT_PDF_PATH } from '../shared/print-request';
import type { ServiceError } from '../shared/contract';
import type { Dispatch } from '../shared/transport';
import { isAllowedHost, refuseApiRequest, type ApiRequestHeaders } from './guard';
import type { PrintPdf } from './print';
import { readStaticFile } from './static-files';
import type { DraftStore } from './drafts';

/** Concept documents are a few kilobytes; anything this large is not one. */
export const MAX_BODY_BYTES = 2 * 1024 * 1024;

export interface BrowserServerOptions {
  /** 0 lets the system pick a free port. */
  port: number;
  token: string;
  /** Folder holding the built page (index.html and assets/). */
  rendererDir: string;
  dispatch: Dispatch;
  /** Prints a checked report to PDF; without it the print route says printing is not available. */
  printPdf?: PrintPdf;
  /** Unsaved drafts of the open project, kept across restarts (POST /api/keptDrafts, /api/keepDrafts). */
  drafts?: DraftStore;
  /**
   * Settles once the project is open (null) or cannot be (its error): API calls
   * that arrive before wait for it, and are answered with the error after a
   * failure. The page itself is served meanwhile. Default: open already.
   */
  ready?: Promise<ServiceError | null>;
  /**
   * Told when the page itself has been sent ('page'), each of its other files
   * (scripts, styles: 'asset'), and when an API call arrives ('api').
   */
  onPageActivity?: (step: PageStep) => void;
}

export type PageStep = 'page' | 'asset' | 'api';

export interface BrowserServer {
  port: number;
  /** The address to open, token included in the fragment (never sent over the wire). */
  url: string;
  close(): Promise<void>;
}

const PAGE_HEADERS = {
  'Content-Security-Policy': `${CONTENT_SECURITY_POLICY}; ${HEADER_ONLY_POLICY}`,
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
  'X-Frame-Options': 'DENY',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
};

function send(res: ServerResponse, status: number, body: string | Buffer, headers: Record<string, string>): void {
  res.writeHead(status, { ...PAGE_HEADERS, ...headers, 'Content-Length': String(Buffer.byteLength(body)) });
  res.end(body);
}

function sendJson(res: ServerResponse, status: number, value: unknown): void {
  send(res, status, JSON.stringify(value), { 'Content-Type': 'application/json; charset=utf-8', 'Cache-Control': 'no-store' });
}

function refuse(res: ServerResponse, status: number, code: string, message: string): void {
  sendJson(res, status, { ok: false, error: { code, message } });
}

/** A body this many times over the limit is not drained to its end: the connection is closed after the answer. */
const DRAIN_FACTOR = 16;

/**
 * The body as text, or null when it is over `limit`. An oversized body is read
 * to its end and thrown away (up to DRAIN_FACTOR times the limit), so the
 * browser receives the "too large" answer instead of a dropped connection.
 */
function readBody(req: IncomingMessage, limit = MAX_BODY_BYTES): Promise<string | null> {
  return new Promise((resolveBody, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    let settled = false;
    const settle = (value: string | null) => {
      if (settled) return;
      settled = true;
      resolveBody(value);
    };
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > limit) {
        chunks.length = 0;
        // Far past the limit: answer now; the server closes the connection after the answer.
        if (size > DRAIN_FACTOR * limit) settle(null);
        return;
      }
      chunks.push(chunk);
    });
    req.on('end', () => settle(size > limit ? null : Buffer.concat(chunks).toString('utf8')));
    req.on('error', (error) => (settled ? undefined : reject(error)));
  });
}

/** Megabytes for messages: 2 MB. */
function megabytes(bytes: number): string {
  return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
}

/** The JSON body of an API call that passed the guard, or null once the refusal is sent. */
async function guardedJson(req: IncomingMessage, res: ServerResponse, options: BrowserServerOptions, port: number, limit: number): Promise<{ payload: unknown } | null> {
  if (req.method !== 'POST') {
    refuse(res, 405, 'method-not-allowed', 'API calls use POST');
    return null;
  }
  const refusal = refuseApiRequest(req.headers as ApiRequestHeaders, { port, token: options.token });
  if (refusal) {
    refuse(res, refusal.status, 'refused', refusal.message);
    return null;
  }
  const text = await readBody(req, limit);
  if (text === null) {
    res.setHeader('Connection', 'close');
    refuse(res, 413, 'too-large', `The request is too large for browser mode (over ${megabytes(limit)}); nothing was saved. Shorten the notes or the concept and try again.`);
    return null;
  }
  try {
    return { payload: text.trim() === '' ? undefined : JSON.parse(text) };
  } catch {
    refuse(res, 400, 'bad-json', 'request body is not valid JSON');
    return null;
  }
}

async function handleApi(req: IncomingMessage, res: ServerResponse, method: string, options: BrowserServerOptions, port: number): Promise<void> {
  const body = await guardedJson(req, res, options, port, MAX_BODY_BYTES);
  if (!body) return;
  options.onPageActivity?.('api');
  const problem = options.ready ? await options.ready : null;
  if (problem) return sendJson(res, 200, { ok: false, error: problem });
  if (options.drafts && (method === 'keptDrafts' || method === 'keepDrafts')) return sendJson(res, 200, draftCall(options.drafts, method, body.payload));
  sendJson(res, 200, await options.dispatch(method, body.payload));
}

/** The page's drafts for the open project: read them, or replace them with `{ drafts: { name: draft } }`. */
function draftCall(store: DraftStore, method: 'keptDrafts' | 'keepDrafts', payload: unknown): unknown {
  if (method === 'keptDrafts') return { ok: true, value: store.load() };
  const drafts = (payload as { drafts?: unknown } | undefined)?.drafts;
  if (!drafts || typeof drafts !== 'object' || Array.isArray(drafts)) {
    return { ok: false, error: { code: 'bad-request', message: 'drafts: must be an object of drafts by concept name', field: 'drafts' } };
  }
  try {
    store.save(drafts as Record<string, unknown>);
    return { ok: true, value: { kept: Object.keys(drafts).length } };
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOSPC' ? 'the disk is full' : (code ?? (error instanceof Error ? error.message : String(error)));
    return { ok: false, error: { code: code === 'ENOSPC' ? 'disk-full' : 'io', message: `the draft could not be kept on disk (${reason}); it stays in this page` } };
  }
}

async function handlePrint(req: IncomingMessage, res: ServerResponse, options: BrowserServerOptions, port: number): Promise<void> {
  // The HTML travels as a JSON string: allow for its escapes on top of the report's own limit.
  const body = await guardedJson(req, res, options, port, 2 * MAX_REPORT_HTML_BYTES);
  if (!body) return;
  const checked = checkPrintRequest(body.payload);
  if (!checked.ok) return sendJson(res, 400, { ok: false, error: { code: 'bad-request', message: `printPdf: ${checked.field}: ${checked.message}`, field: checked.field } });
  if (!options.printPdf) return refuse(res, 501, 'io', 'this server does not print PDFs; export the HTML report and print it from the browser');
  const printed = await options.printPdf(checked.html);
  if (!printed.ok) return sendJson(res, printed.error.code === 'io' ? 503 : 500, printed);
  send(res, 200, Buffer.from(printed.value.buffer, printed.value.byteOffset, printed.value.byteLength), { 'Content-Type': 'application/pdf', 'Cache-Control': 'no-store' });
}

async function handlePage(req: IncomingMessage, res: ServerResponse, path: string, options: BrowserServerOptions): Promise<void> {
  const rendererDir = options.rendererDir;
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    return send(res, 405, 'Method not allowed', { 'Content-Type': 'text/plain; charset=utf-8', Allow: 'GET, HEAD' });
  }
  const file = await readStaticFile(rendererDir, path);
  if (!file) return send(res, 404, 'Not found', { 'Content-Type': 'text/plain; charset=utf-8' });
  send(res, 200, req.method === 'HEAD' ? '' : file.body, {
    'Content-Type': file.contentType,
    'Cache-Control': file.immutable ? 'public, max-age=31536000, immutable' : 'no-store',
  });
  options.onPageActivity?.(file.contentType.startsWith('text/html') ? 'page' : 'asset');
}

function listen(server: Server, port: number): Promise<number> {
  return new Promise((resolvePort, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', reject);
      resolvePort((server.address() as AddressInfo).port);
    });
  });
}

export async function startBrowserServer(options: BrowserServerOptions): Promise<BrowserServer> {
  let port = options.port;
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    if (!isAllowedHost(req.headers.host, port)) {
      const message = `Host header "${req.headers.host ?? ''}" is not this server; it answers only on 127.0.0.1:${port}`;
      if (url.pathname.startsWith('/api/')) return refuse(res, 403, 'refused', message);
      return send(res, 403, message, { 'Content-Type': 'text/plain; charset=utf-8' });
    }
    const api = /^\/api\/([A-Za-z][A-Za-z0-9]*)$/.exec(url.pathname);
    const work = url.pathname === PRINT_PDF_PATH
      ? handlePrint(req, res, options, port)
      : url.pathname.startsWith('/api/')
      ? api
        ? handleApi(req, res, api[1], options, port)
        : Promise.resolve(refuse(res, 404, 'unknown-method', `no API method at ${url.pathname}`))
      : handlePage(req, res, url.pathname, options);
    work.catch((error: unknown) => {
      if (res.headersSent) return void res.destroy();
      refuse(res, 500, 'internal', error instanceof Error ? error.message.split('\n')[0] : 'internal error');
    });
  });
  server.keepAliveTimeout = 5_000;
  port = await listen(server, options.port);
  return {
    port,
    url: `http://127.0.0.1:${port}/#token=${options.token}`,
    close: () =>
      new Promise<void>((resolveClose) => {
        server.close(() => resolveClose());
        server.closeAllConnections();
      }),
  };
}
