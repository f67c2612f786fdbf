/**
 * Unsaved drafts in browser mode survive a restart: each start of
 * `loftpoint serve` listens on a new port, and a browser keeps storage per
 * origin (scheme, host and port: HTML Living Standard, "Origin"; RFC 6454),
 * so the drafts are kept by the server per project file instead.
 */
// @ts-nocheck

import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { draftFile, fileDraftStore } from '../../app/server/drafts';
import { startBrowserServer } from '../../app/server/server';
import type { Dispatch } from '../../app/shared/transport';

const TOKEN = 'test-token-0123456789';
const dispatch: Dispatch = async () => ({ ok: true, value: null });

async function post(port: number, method: string, body: unknown): Promise<any> {
  const response = await fetch(`http://127.0.0.1:${port}/api/${method}`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-loftpoint-token': TOKEN, origin: `http://127.0.0.1:${port}` },
    body: JSON.stringify(body),
  });
  return response.json();
}

describe('drafts kept per project file across restarts of browser mode', () => {
  it('a draft sent to one server is offered by the next one, on another port, for the same project file only', async () => {
    const data = mkdtempSync(join(tmpdir(), 'loftpoint-drafts-'));
    const rendererDir = mkdtempSync(join(tmpdir(), 'loftpoint-page-'));
    writeFileSync(join(rendererDir, 'index.html'), '<!doctype html><title>page</title>');
    const project = join(data, 'study.loftpoint');
    const other = join(data, 'other.loftpoint');
    const draft = { document: { name: 'Trainer', aircraft: { takeoffMass: '760 kg' } }, parent: 3 };

    const first = await startBrowserServer({ port: 0, token: TOKEN, rendererDir, dispatch, drafts: fileDraftStore(data, project) });
    expect((await post(first.port, 'keepDrafts', { drafts: { Trainer: draft } })).ok).toBe(true);
    await first.close();
    expect(existsSync(draftFile(data, project))).toBe(true);

    const second = await startBrowserServer({ port: 0, token: TOKEN, rendererDir, dispatch, drafts: fileDraftStore(data, project) });
    const third = await startBrowserServer({ port: 0, token: TOKEN, rendererDir, dispatch, drafts: fileDraftStore(data, other) });
    try {
      expect(await post(second.port, 'keptDrafts', {})).toEqual({ ok: true, value: { Trainer: draft } });
      expect(await post(third.port, 'keptDrafts', {})).toEqual({ ok: true, value: {} });
      // Saved, so nothing left to offer: the file goes.
      expect((await post(second.port, 'keepDrafts', { drafts: {} })).ok).toBe(true);
      expect(existsSync(draftFile(data, project))).toBe(false);
      expect((await post(second.port, 'keepDrafts', { drafts: [] })).ok).toBe(false);
    } finally {
      await second.close();
      await third.close();
    }
  });
});
