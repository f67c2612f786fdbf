/**
 * Browser mode: the built page and the service API over HTTP, on 127.0.0.1
 * only. GET serves the page; POST /api/METHOD with a JSON body calls one
 * service method and answers with the same result value the desktop window
 * gets over IPC.
 */
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { CONTENT_SECURITY_POLICY, HEADER_ONLY_POLICY } from '../shared/csp';
import type { Dispatch } from '../shared/transport';
import { isAllowedHost, refuseApiRequest, type ApiRequestHeaders } from './guard';
import { readStaticFile } from './static-files';

/** Concept documents are a few kilobytes; anything this large is not one. */
export const MAX_BODY_BYTES = 2 * 1024 * 1024;

export interface BrowserServerOptions {
  /** 0 lets the system pick a free port. */
  port: number;
  token: string;
  /** Folder holding the built page (index.html and assets/). */
  rendererDir: string;
  dispatch: Dispatch;
}

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

function readBody(req: IncomingMessage): Promise<string | null> {
  return new Promise((resolveBody, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        resolveBody(null);
        req.destroy();
        return;
      }
      chunks.push(chunk);
    });
    req.on('end', () => resolveBody(Buffer.concat(chunks).toString('utf8')));
    req.on('error', reject);
  });
}

async function handleApi(req: IncomingMessage, res: ServerResponse, method: string, options: BrowserServerOptions, port: number): Promise<void> {
  if (req.method !== 'POST') return refuse(res, 405, 'method-not-allowed', 'API calls use POST');
  const refusal = refuseApiRequest(req.headers as ApiRequestHeaders, { port, token: options.token });
  if (refusal) return refuse(res, refusal.status, 'refused', refusal.message);
  const text = await readBody(req);
  if (text === null) return refuse(res, 413, 'too-large', `request body is over ${MAX_BODY_BYTES} bytes`);
  let payload: unknown;
  try {
    payload = text.trim() === '' ? undefined : JSON.parse(text);
  } catch {
    return refuse(res, 400, 'bad-json', 'request body is not valid JSON');
  }
  const result = await options.dispatch(method, payload);
  sendJson(res, 200, result);
}

async function handlePage(req: IncomingMessage, res: ServerResponse, path: string, rendererDir: string): Promise<void> {
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    return send(res, 405, 'Method not allowed', { 'Content-Type': 'text/plain; charset=utf-8', Allow: 'GET, HEAD' });
  }
  const file = await readStaticFile(rendererDir, path);
  if (!file) return send(res, 404, 'Not found', { 'Content-Type': 'text/plain; charset=utf-8' });
  send(res, 200, req.method === 'HEAD' ? '' : file.body, {
    'Content-Type': file.contentType,
    'Cache-Control': file.immutable ? 'public, max-age=31536000, immutable' : 'no-store',
  });
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
    const work = url.pathname.startsWith('/api/')
      ? api
        ? handleApi(req, res, api[1], options, port)
        : Promise.resolve(refuse(res, 404, 'unknown-method', `no API method at ${url.pathname}`))
      : handlePage(req, res, url.pathname, options.rendererDir);
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
