// @ts-nocheck
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

// The first bytes of each format: PNG, W3C PNG specification section 5.2 (ISO/IEC 15948); PDF, ISO 32000-1 section 7.5.2.
const PNG_START = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
const PDF_START = Buffer.from('%PDF-1.7\n%\xe2\xe3\xcf\xd3\n', 'latin1');

describe('checkExportRequest for binary kinds', () => {
  it.each([
    ['png', PNG_START],
    ['pdf', PDF_START],
  ])('accepts %s bytes sent as base64 (RFC 4648, as Node encodes it) and decodes them exactly', (kind, bytes) => {
    const checked = checkExportRequest({ kind, suggestedName: `a.${kind}`, content: bytes.toString('base64'), encoding: 'base64' });
    expect(checked.ok).toBe(true);
    if (checked.ok) expect(Buffer.compare(checked.bytes as Buffer, bytes)).toBe(0);
  });

  it.each([
    [{ kind: 'png', suggestedName: 'a.png', content: PNG_START.toString('base64') }, 'encoding', 'base64'],
    [{ kind: 'pdf', suggestedName: 'a.pdf', content: PDF_START.toString('base64'), encoding: 'utf8' }, 'encoding', 'base64'],
    [{ kind: 'svg', suggestedName: 'a.svg', content: 'PHN2Zy8+', encoding: 'base64' }, 'encoding', 'utf8'],
    [{ kind: 'png', suggestedName: 'a.png', content: 'not base64!', encoding: 'base64' }, 'content', 'base64'],
    [{ kind: 'png', suggestedName: 'a.png', content: PDF_START.toString('base64'), encoding: 'base64' }, 'content', 'PNG signature'],
    [{ kind: 'pdf', suggestedName: 'a.pdf', content: Buffer.from('<html>').toString('base64'), encoding: 'base64' }, 'content', 'PDF signature'],
    [{ kind: 'pdf', suggestedName: 'a.pdf', content: 42, encoding: 'base64' }, 'content', 'base64'],
    [{ kind: 'html', suggestedName: 'a.html', content: '<p>', encoding: 'gzip' }, 'encoding', 'utf8'],
  ])('refuses %j, naming %s', (payload, field, words) => {
    const checked = checkExportRequest(payload);
    expect(checked.ok).toBe(false);
    if (!checked.ok) {
      expect(checked.field).toBe(field);
      expect(checked.message).toContain(words);
    }
  });

  it('keeps text kinds as they were: UTF-8 text with or without the encoding field', () => {
    for (const request of [
      { kind: 'html', suggestedName: 'r.html', content: '<!DOCTYPE html><p>Ω</p>' },
      { kind: 'csv', suggestedName: 'b.csv', content: 'a,b\n', encoding: 'utf8' },
    ]) {
      const checked = checkExportRequest(request);
      expect(checked.ok).toBe(true);
      if (checked.ok) expect(checked.bytes).toBe(request.content);
    }
  });
});

describe('exportFile', () => {
  it('writes a PNG sent as base64 as its bytes, offering the PNG filter', async () => {
    const ask = vi.fn(async () => join(folder, 'diagram.png'));
    const result = await exportFile({ kind: 'png', suggestedName: 'd.png', content: PNG_START.toString('base64'), encoding: 'base64' }, ask, folder);
    expect(result.ok).toBe(true);
    expect(ask).toHaveBeenCalledWith({ defaultPath: join(folder, 'd.png'), filters: [{ name: 'PNG image', extensions: ['png'] }] });
    expect(Buffer.compare(readFileSync(join(folder, 'diagram.png')), PNG_START)).toBe(0);
  });

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
