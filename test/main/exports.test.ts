import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { checkExportRequest, exportFile } from '../../app/main/exports';

vi.mock('electron', () => ({}));

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-export-'));

describe('checkExportRequest', () => {
  it('accepts a plain request', () => {
    expect(checkExportRequest({ kind: 'svg', suggestedName: 'trainer-diagram.svg', content: '<svg/>' }).ok).toBe(true);
  });

  it.each([
    [null, '(request)'],
    ['text', '(request)'],
    [{ kind: 'exe', suggestedName: 'a', content: '' }, 'kind'],
    [{ kind: 'svg', suggestedName: '../../.bashrc', content: '' }, 'suggestedName'],
    [{ kind: 'svg', suggestedName: '/etc/passwd', content: '' }, 'suggestedName'],
    [{ kind: 'svg', suggestedName: 'a\\b.svg', content: '' }, 'suggestedName'],
    [{ kind: 'svg', suggestedName: '', content: '' }, 'suggestedName'],
    [{ kind: 'svg', suggestedName: 'a.svg', content: 5 }, 'content'],
    [{ kind: 'svg', suggestedName: 'a.svg', content: '', path: '/tmp/x' }, 'path'],
    [{ kind: '__proto__', suggestedName: 'a.svg', content: '' }, 'kind'],
  ])('refuses %j, naming %s', (payload, field) => {
    const checked = checkExportRequest(payload);
    expect(checked.ok).toBe(false);
    if (!checked.ok) expect(checked.field).toBe(field);
  });
});

describe('exportFile', () => {
  it('writes the content where the person chose, offering the suggested name in the documents folder', async () => {
    const ask = vi.fn(async () => join(folder, 'chosen.svg'));
    const result = await exportFile({ kind: 'svg', suggestedName: 'trainer.svg', content: '<svg/>' }, ask, '/home/ada/Documents');
    expect(ask).toHaveBeenCalledWith({ defaultPath: '/home/ada/Documents/trainer.svg', filters: [{ name: 'SVG diagram', extensions: ['svg'] }] });
    expect(result).toEqual({ ok: true, value: { file: join(folder, 'chosen.svg') } });
    expect(readFileSync(join(folder, 'chosen.svg'), 'utf8')).toBe('<svg/>');
    expect(readdirSync(folder).filter((name) => name.endsWith('.tmp'))).toEqual([]);
  });

  it('returns null when the dialog is cancelled, and writes nothing', async () => {
    const write = vi.fn();
    expect(await exportFile({ kind: 'json', suggestedName: 'c.json', content: '{}' }, async () => null, folder, write)).toEqual({ ok: true, value: null });
    expect(write).not.toHaveBeenCalled();
  });

  it('reports a failed write as an io error naming the file', async () => {
    const result = await exportFile({ kind: 'json', suggestedName: 'c.json', content: '{}' }, async () => join(folder, 'no-such-folder', 'c.json'), folder);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe('io');
      expect(result.error.message).toContain('c.json');
    }
  });

  it('never opens a dialog for a bad request', async () => {
    const ask = vi.fn(async () => '/tmp/x');
    const result = await exportFile({ kind: 'svg', suggestedName: '../x', content: '' }, ask, folder);
    expect(result.ok).toBe(false);
    expect(ask).not.toHaveBeenCalled();
  });
});
