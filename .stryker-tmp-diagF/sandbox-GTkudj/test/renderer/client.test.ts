// @ts-nocheck
import { describe, expect, it, vi } from 'vitest';
import { httpService, launchToken, TOKEN_HEADER } from '../../app/renderer/lib/api/client';
import { SERVICE_METHODS } from '../../app/shared/contract';

function memoryStorage(): Storage {
  const items = new Map<string, string>();
  return {
    get length() {
      return items.size;
    },
    clear: () => items.clear(),
    getItem: (key) => items.get(key) ?? null,
    key: (index) => [...items.keys()][index] ?? null,
    removeItem: (key) => void items.delete(key),
    setItem: (key, value) => void items.set(key, value),
  };
}

describe('launchToken', () => {
  it('takes the token from the fragment once, keeps it for reloads, and clears the address bar', () => {
    const storage = memoryStorage();
    const history = { replaceState: vi.fn() } as unknown as History;
    const first = launchToken({ hash: '#token=abc_DEF-123', pathname: '/', search: '' } as Location, storage, history);
    expect(first).toBe('abc_DEF-123');
    expect(history.replaceState).toHaveBeenCalledWith(null, '', '/');
    expect(launchToken({ hash: '', pathname: '/', search: '' } as Location, storage, history)).toBe('abc_DEF-123');
  });

  it('ignores a fragment that is not a token', () => {
    expect(launchToken({ hash: '#token=<script>', pathname: '/', search: '' } as Location, memoryStorage(), { replaceState: vi.fn() } as unknown as History)).toBeNull();
  });
});

describe('httpService', () => {
  it('posts each method to /api/METHOD with the token and returns the result value', async () => {
    const fetcher = vi.fn(async () => new Response(JSON.stringify({ ok: true, value: [] }), { status: 200 }));
    const service = httpService('tok', fetcher as unknown as typeof fetch);
    expect(Object.keys(service).sort()).toEqual([...SERVICE_METHODS].sort());
    expect(await service.listConcepts({})).toEqual({ ok: true, value: [] });
    const [url, init] = fetcher.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('./api/listConcepts');
    expect((init.headers as Record<string, string>)[TOKEN_HEADER]).toBe('tok');
    expect(init.method).toBe('POST');
  });

  it('turns a dead server or a non-JSON answer into an error value', async () => {
    const dead = httpService('tok', (async () => {
      throw new TypeError('fetch failed');
    }) as unknown as typeof fetch);
    const result = await dead.getProject({});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.message).toContain('not answering');
    const html = httpService('tok', (async () => new Response('<html>', { status: 502 })) as unknown as typeof fetch);
    const answer = await html.getProject({});
    expect(answer.ok).toBe(false);
  });
});
