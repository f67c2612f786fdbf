import { afterEach, describe, expect, it, vi } from 'vitest';
import { httpDrafts, httpService } from '../../app/renderer/lib/api/client';
import { conceptToOpen, endEarlyRequests, rememberedConceptKey, sendEarlyRequests, takeEarlyRequest, TOKEN_HEADER, type EarlyEnvironment } from '../../app/renderer/lib/api/early-requests';

const CONCEPTS = [
  { name: 'Draft only', latestVersion: null },
  { name: 'Trainer', latestVersion: 3 },
  { name: 'Survey', latestVersion: 7 },
];

/** A stand-in server: answers each call by method, records what was asked, in order. */
function server(answers: Record<string, unknown> = {}) {
  const calls: { method: string; body: string; token: string }[] = [];
  const fetcher = vi.fn(async (url: string, init: RequestInit) => {
    const method = url.replace('./api/', '');
    calls.push({ method, body: String(init.body), token: (init.headers as Record<string, string>)[TOKEN_HEADER] });
    const value = method in answers ? answers[method] : { method };
    return new Response(JSON.stringify({ ok: true, value }), { status: 200 });
  });
  return { calls, fetch: fetcher as unknown as typeof fetch };
}

function environment(fetcher: typeof fetch, overrides: Partial<EarlyEnvironment> = {}, remembered: Record<string, string> = {}): EarlyEnvironment {
  return {
    location: { protocol: 'http:', hash: '#token=tok_1' },
    sessionStorage: { getItem: () => null },
    localStorage: { getItem: (key: string) => remembered[key] ?? null },
    fetch: fetcher,
    desktop: false,
    ...overrides,
  };
}

/** Lets the answers sent ahead be read and the second round go out. */
const settle = () => new Promise((resolve) => setTimeout(resolve, 0));

afterEach(() => endEarlyRequests());

describe('the concept a window opens first', () => {
  it('is the one last worked on, else the first concept with a saved version', () => {
    expect(conceptToOpen(CONCEPTS, 'Survey')?.name).toBe('Survey');
    expect(conceptToOpen(CONCEPTS, null)?.name).toBe('Trainer');
    expect(conceptToOpen(CONCEPTS, 'Renamed since')?.name).toBe('Trainer');
    expect(conceptToOpen([{ name: 'Draft only', latestVersion: null }], null)).toBeUndefined();
  });
});

describe('early requests (browser mode)', () => {
  it('sends the first three calls at once with the token, then the opening concept\'s versions', async () => {
    const { calls, fetch } = server({ getProject: { file: '/p/a.loftpoint' }, listConcepts: CONCEPTS });
    expect(sendEarlyRequests(environment(fetch, {}, { [rememberedConceptKey('/p/a.loftpoint')]: 'Survey' }))).toBe(true);
    expect(calls.map((c) => `${c.method} ${c.body}`)).toEqual(['getProject {}', 'keptDrafts {}', 'listConcepts {}']);
    expect(calls.every((c) => c.token === 'tok_1')).toBe(true);
    await settle();
    expect(calls.slice(3).map((c) => `${c.method} ${c.body}`)).toEqual(['getVersion {"version":7}', 'listVersions {"concept":"Survey"}']);
  });

  it('hands each answer to the window once; the same call again goes to the server', async () => {
    const { calls, fetch } = server({ getProject: { file: '/p/a.loftpoint' }, listConcepts: CONCEPTS });
    sendEarlyRequests(environment(fetch));
    await settle();
    const service = httpService('tok_1', fetch);
    const sentAhead = calls.length;
    expect(await service.getProject({})).toEqual({ ok: true, value: { file: '/p/a.loftpoint' } });
    expect(await service.getVersion({ version: 3 })).toEqual({ ok: true, value: { method: 'getVersion' } });
    expect(await httpDrafts('tok_1', fetch).load()).toEqual({ method: 'keptDrafts' });
    expect(calls.length).toBe(sentAhead);
    await service.getProject({});
    expect(calls.length).toBe(sentAhead + 1);
    // A body that differs is another call.
    await service.getVersion({ version: 2 });
    expect(calls.at(-1)).toMatchObject({ method: 'getVersion', body: '{"version":2}' });
  });

  it('never sends a call the window has already made itself', async () => {
    const { calls, fetch } = server({ getProject: { file: '/p/a.loftpoint' }, listConcepts: CONCEPTS });
    sendEarlyRequests(environment(fetch));
    // The window asks for the version list before the answers sent ahead are back.
    expect(takeEarlyRequest('listVersions', '{"concept":"Trainer"}')).toBeUndefined();
    await settle();
    expect(calls.filter((c) => c.method === 'listVersions')).toEqual([]);
    expect(calls.filter((c) => c.method === 'getVersion')).toHaveLength(1);
  });

  it('takes nothing once the first start is over', async () => {
    const { fetch } = server({ getProject: { file: '/p/a.loftpoint' }, listConcepts: CONCEPTS });
    sendEarlyRequests(environment(fetch));
    endEarlyRequests();
    expect(takeEarlyRequest('getProject', '{}')).toBeUndefined();
  });

  it('sends nothing in the desktop window, without a server or without a token', () => {
    const { calls, fetch } = server();
    expect(sendEarlyRequests(environment(fetch, { desktop: true }))).toBe(false);
    expect(sendEarlyRequests(environment(fetch, { location: { protocol: 'file:', hash: '#token=tok_1' } }))).toBe(false);
    expect(sendEarlyRequests(environment(fetch, { location: { protocol: 'http:', hash: '' } }))).toBe(false);
    expect(calls).toEqual([]);
    expect(takeEarlyRequest('getProject', '{}')).toBeUndefined();
  });

  it('uses the token kept from an earlier load of the tab when the address has none', () => {
    const { calls, fetch } = server();
    sendEarlyRequests(environment(fetch, { location: { protocol: 'http:', hash: '' }, sessionStorage: { getItem: (key) => (key === 'loftpoint.token' ? 'kept_2' : null) } }));
    expect(calls[0]?.token).toBe('kept_2');
  });

  it('a server that does not answer gives the window the error its own call would', async () => {
    const dead = (async () => {
      throw new TypeError('fetch failed');
    }) as unknown as typeof fetch;
    sendEarlyRequests(environment(dead));
    await settle();
    const result = await httpService('tok_1', dead).getProject({});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.message).toContain('not answering');
  });
});
