/**
 * Printing in browser mode: POST /api/print/pdf sits behind the same three
 * checks as the service API (Host, Origin, token), checks the report from
 * `unknown`, and answers with the PDF's bytes or a message. With the real
 * Chromium, the report is printed with the print policy in force: read back
 * with Poppler's pdftotext (outside the project), its text is there and
 * nothing a script would have written.
 */
// @ts-nocheck

import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { ChromiumUnavailable, findChromium } from '../../app/report/chromium';
import { chromiumPrinter, type PrintPdf } from '../../app/server/print';
import { startBrowserServer, type BrowserServer } from '../../app/server/server';
import { PRINT_PDF_PATH } from '../../app/shared/print-request';

const TOKEN = 'print-token-0123456789';
const root = mkdtempSync(join(tmpdir(), 'loftpoint-print-server-'));
writeFileSync(join(root, 'index.html'), '<!doctype html><title>page</title>');
// A PDF file starts with "%PDF-" and its version (ISO 32000-1 section 7.5.2).
const PDF = Buffer.from('%PDF-1.7\n%%EOF\n', 'latin1');
const REPORT = '<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>Design review</title>\n</head>\n<body><p>Preliminary sizing only</p></body>\n</html>\n';

let printer: PrintPdf = async () => ({ ok: true, value: new Uint8Array(PDF) });
const printed: string[] = [];
let server: BrowserServer;
let bare: BrowserServer;

function call(target: BrowserServer, options: { method?: string; headers?: Record<string, string>; body?: string } = {}): Promise<{ status: number; type: string; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest(
      { host: '127.0.0.1', port: target.port, path: PRINT_PDF_PATH, method: options.method ?? 'POST', headers: { host: `127.0.0.1:${target.port}`, ...options.headers } },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, type: String(res.headers['content-type'] ?? ''), body: Buffer.concat(chunks) }));
      },
    );
    req.on('error', reject);
    if (options.body) req.write(options.body);
    req.end();
  });
}

const api = (extra: Record<string, string> = {}) => ({ 'content-type': 'application/json', 'x-loftpoint-token': TOKEN, ...extra });
const dispatch = vi.fn(async () => ({ ok: true as const, value: null }));

beforeAll(async () => {
  server = await startBrowserServer({
    port: 0,
    token: TOKEN,
    rendererDir: root,
    dispatch,
    printPdf: (html) => {
      printed.push(html);
      return printer(html);
    },
  });
  bare = await startBrowserServer({ port: 0, token: TOKEN, rendererDir: root, dispatch });
});
afterAll(async () => {
  await server.close();
  await bare.close();
  rmSync(root, { recursive: true, force: true });
});

describe('POST /api/print/pdf', () => {
  it('answers a good report with the PDF bytes, printed with the print policy first in its head', async () => {
    const answer = await call(server, { headers: api(), body: JSON.stringify({ html: REPORT }) });
    expect(answer.status).toBe(200);
    expect(answer.type).toBe('application/pdf');
    expect(answer.body.equals(PDF)).toBe(true);
    expect(printed.at(-1)).toMatch(/^<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta http-equiv="Content-Security-Policy" content="default-src 'none';/);
    expect(dispatch).not.toHaveBeenCalled();
  });

  it.each([
    ['no token', { 'content-type': 'application/json' }, 401],
    ['a wrong token', api({ 'x-loftpoint-token': 'guess' }), 401],
    ['another site', api({ origin: 'https://evil.example' }), 403],
    ['a cross-site fetch', api({ 'sec-fetch-site': 'cross-site' }), 403],
    ['a form post', { 'x-loftpoint-token': TOKEN, 'content-type': 'text/plain' }, 415],
    ['a rebinding host name', api({ host: 'evil.example:80' }), 403],
  ])('refuses %s before printing anything', async (_title, headers, status) => {
    const before = printed.length;
    const answer = await call(server, { headers, body: JSON.stringify({ html: REPORT }) });
    expect(answer.status).toBe(status);
    expect(printed.length).toBe(before);
  });

  it.each([
    [{ html: 12 }, 'html'],
    [{ html: '<script>alert(1)</script>' }, 'html'],
    [{ html: REPORT, out: '/tmp/x.pdf' }, 'out'],
    [{ html: REPORT.replace('<title>', '<meta http-equiv="refresh" content="0;url=file:///etc/passwd"><title>') }, 'html'],
  ])('refuses %j naming %s', async (payload, field) => {
    const before = printed.length;
    const answer = await call(server, { headers: api(), body: JSON.stringify(payload) });
    expect(answer.status).toBe(400);
    const result = JSON.parse(answer.body.toString('utf8'));
    expect(result).toMatchObject({ ok: false, error: { code: 'bad-request', field } });
    expect(printed.length).toBe(before);
  });

  it('refuses GET and bodies that are not JSON', async () => {
    expect((await call(server, { method: 'GET', headers: api() })).status).toBe(405);
    expect((await call(server, { headers: api(), body: '{html:' })).status).toBe(400);
  });

  it('passes on a missing browser as a 503 with what to install', async () => {
    printer = chromiumPrinter({
      find: () => {
        throw new ChromiumUnavailable('no Chromium found. PDF and PNG output need Chromium: install it or set CHROMIUM_PATH');
      },
      print: async () => PDF,
    });
    const answer = await call(server, { headers: api(), body: JSON.stringify({ html: REPORT }) });
    expect(answer.status).toBe(503);
    const result = JSON.parse(answer.body.toString('utf8'));
    expect(result.error.code).toBe('io');
    expect(result.error.message).toContain('could not be printed to PDF');
    expect(result.error.message).toContain('CHROMIUM_PATH');
  });

  it('says so when the server has no printer', async () => {
    const answer = await call(bare, { headers: api(), body: JSON.stringify({ html: REPORT }) });
    expect(answer.status).toBe(501);
    expect(JSON.parse(answer.body.toString('utf8')).error.message).toContain('HTML report');
  });
});

describe('chromiumPrinter', () => {
  it('prints one report at a time', async () => {
    let running = 0;
    let most = 0;
    const print = chromiumPrinter({
      find: () => '/usr/bin/chromium',
      print: async () => {
        running += 1;
        most = Math.max(most, running);
        await new Promise((resolve) => setTimeout(resolve, 20));
        running -= 1;
        return PDF;
      },
    });
    const results = await Promise.all([print(REPORT), print(REPORT), print(REPORT)]);
    expect(results.every((result) => result.ok)).toBe(true);
    expect(most).toBe(1);
  });
});

function chromiumPath(): string | null {
  try {
    return findChromium();
  } catch {
    return null;
  }
}
const missing = !chromiumPath() ? 'Chromium not found' : !existsSync('/usr/bin/pdftotext') ? 'pdftotext not found (install poppler-utils)' : '';
if (missing) console.warn(`Printing with Chromium skipped: ${missing}`);

describe.skipIf(missing !== '')('printing with Chromium', () => {
  it('prints the text of the report and runs none of its scripts', async () => {
    const { checkPrintRequest } = await import('../../app/shared/print-request');
    const hostile = REPORT.replace(
      '<body><p>Preliminary sizing only</p></body>',
      '<body><p>Preliminary sizing only</p><p id="x">Static text stays</p><script>document.getElementById("x").textContent = "A script ran";</script></body>',
    );
    const checked = checkPrintRequest({ html: hostile });
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    const result = await chromiumPrinter()(checked.html);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-print-read-'));
    try {
      const file = join(folder, 'report.pdf');
      writeFileSync(file, result.value);
      const text = execFileSync('/usr/bin/pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
      expect(text).toContain('Preliminary sizing only');
      expect(text).toContain('Static text stays');
      expect(text).not.toContain('A script ran');
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
