import { mkdtempSync, writeFileSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_BODY_BYTES, startBrowserServer, type BrowserServer } from '../../app/server/server';
import type { Dispatch } from '../../app/shared/transport';

const TOKEN = 'test-token-0123456789';
const root = mkdtempSync(join(tmpdir(), 'loftpoint-server-'));
writeFileSync(join(root, 'index.html'), '<!doctype html><title>page</title>');
const calls: Array<[string, unknown]> = [];
const dispatch: Dispatch = async (method, payload) => {
  calls.push([method, payload]);
  return { ok: true, value: { echoed: method } };
};
let server: BrowserServer;

/** A raw HTTP call, so Host and Origin can be anything. */
function call(path: string, options: { method?: string; headers?: Record<string, string>; body?: string } = {}): Promise<{ status: number; headers: Record<string, unknown>; body: string }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest(
      { host: '127.0.0.1', port: server.port, path, method: options.method ?? 'GET', headers: { host: `127.0.0.1:${server.port}`, ...options.headers } },
      (res) => {
        let body = '';
        res.on('data', (chunk) => (body += chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
      },
    );
    req.on('error', reject);
    if (options.body) req.write(options.body);
    req.end();
  });
}

const api = (extra: Record<string, string> = {}) => ({ 'content-type': 'application/json', 'x-loftpoint-token': TOKEN, ...extra });

beforeAll(async () => {
  server = await startBrowserServer({ port: 0, token: TOKEN, rendererDir: root, dispatch });
});
afterAll(async () => {
  await server.close();
});

describe('startBrowserServer', () => {
  it('listens on 127.0.0.1 and names the token only in the fragment', () => {
    expect(server.url).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${server.port}/#token=${TOKEN}$`));
  });

  it('serves the page with a strict content security policy', async () => {
    const page = await call('/');
    expect(page.status).toBe(200);
    expect(page.body).toContain('<title>page</title>');
    expect(String(page.headers['content-security-policy'])).toContain("default-src 'none'");
    expect(String(page.headers['content-security-policy'])).toContain("frame-ancestors 'none'");
    expect(page.headers['x-content-type-options']).toBe('nosniff');
    expect((await call('/../../etc/passwd')).status).toBe(404);
  });

  it('answers a good API call with the dispatch result', async () => {
    const answer = await call('/api/listConcepts', { method: 'POST', headers: api(), body: '{"a":1}' });
    expect(answer.status).toBe(200);
    expect(JSON.parse(answer.body)).toEqual({ ok: true, value: { echoed: 'listConcepts' } });
    expect(calls.at(-1)).toEqual(['listConcepts', { a: 1 }]);
  });

  it('refuses calls without the token, from elsewhere, or malformed, without reaching the service', async () => {
    const before = calls.length;
    const cases: Array<[Parameters<typeof call>[1], string, number]> = [
      [{ method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' }, '/api/getProject', 401],
      [{ method: 'POST', headers: api({ host: 'evil.example' }), body: '{}' }, '/api/getProject', 403],
      [{ method: 'POST', headers: api({ origin: 'http://evil.example' }), body: '{}' }, '/api/getProject', 403],
      [{ method: 'GET', headers: api() }, '/api/getProject', 405],
      [{ method: 'POST', headers: api(), body: '{not json' }, '/api/getProject', 400],
      [{ method: 'POST', headers: api(), body: '{}' }, '/api/get-project/x', 404],
    ];
    for (const [options, path, status] of cases) {
      const answer = await call(path, options);
      expect(answer.status, `${options?.method} ${path} ${JSON.stringify(options?.headers)}`).toBe(status);
      expect(JSON.parse(answer.body).ok).toBe(false);
    }
    expect(calls.length).toBe(before);
  });

  it('answers a body over the limit with "too large" (HTTP 413, RFC 9110 §15.5.14), not a dropped connection', async () => {
    const before = calls.length;
    const answer = await call('/api/saveVersion', { method: 'POST', headers: api(), body: `"${'x'.repeat(MAX_BODY_BYTES + 10)}"` });
    expect(answer.status).toBe(413);
    const result = JSON.parse(answer.body);
    expect(result).toMatchObject({ ok: false, error: { code: 'too-large' } });
    expect(result.error.message).toMatch(/too large for browser mode \(over 2 MB\); nothing was saved/);
    expect(calls.length).toBe(before);
    // The server still answers afterwards.
    expect((await call('/')).status).toBe(200);
  });

  it('refuses the page itself on a foreign Host (DNS rebinding)', async () => {
    expect((await call('/', { headers: { host: 'evil.example' } })).status).toBe(403);
  });
});

describe('a server whose project is still opening', () => {
  async function opening(settleWith: () => { ok: true } | { ok: false; message: string }) {
    let settle!: (problem: { code: 'corrupt'; message: string } | null) => void;
    const ready = new Promise<{ code: 'corrupt'; message: string } | null>((resolveReady) => (settle = resolveReady));
    const steps: string[] = [];
    const reached: string[] = [];
    const waiting = await startBrowserServer({
      port: 0,
      token: TOKEN,
      rendererDir: root,
      dispatch: async (method) => {
        reached.push(method);
        return { ok: true, value: { echoed: method } };
      },
      ready,
      onPageActivity: (step) => steps.push(step),
    });
    const previous = server;
    server = waiting;
    try {
      const page = await call('/');
      const early = call('/api/getProject', { method: 'POST', headers: api(), body: '{}' });
      await new Promise((resolveLater) => setTimeout(resolveLater, 50));
      // The page is served at once; the API call waits and has not reached the service.
      expect(page.status).toBe(200);
      expect(reached).toEqual([]);
      expect(steps).toEqual(['page', 'api']);
      const outcome = settleWith();
      settle(outcome.ok ? null : { code: 'corrupt', message: outcome.message });
      return { answer: JSON.parse((await early).body), reached };
    } finally {
      server = previous;
      await waiting.close();
    }
  }

  it('serves the page meanwhile and answers API calls once the project is open', async () => {
    const { answer, reached } = await opening(() => ({ ok: true }));
    expect(answer).toEqual({ ok: true, value: { echoed: 'getProject' } });
    expect(reached).toEqual(['getProject']);
  });

  it('answers API calls with the reason when the project cannot be opened, never reaching the service', async () => {
    const { answer, reached } = await opening(() => ({ ok: false, message: 'plans.loftpoint: the project file is damaged' }));
    expect(answer).toEqual({ ok: false, error: { code: 'corrupt', message: 'plans.loftpoint: the project file is damaged' } });
    expect(reached).toEqual([]);
  });
});
