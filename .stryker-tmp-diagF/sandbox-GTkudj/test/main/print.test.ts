// @ts-nocheck
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';

const created: Array<{ options: Record<string, unknown>; contents: Record<string, unknown>; window: { destroyed: boolean } }> = [];

vi.mock('electron', () => {
  class BrowserWindow {
    webContents = {
      on: vi.fn(),
      setWindowOpenHandler: vi.fn(),
      session: {
        setPermissionRequestHandler: vi.fn(),
        setPermissionCheckHandler: vi.fn(),
        webRequest: { onBeforeRequest: vi.fn() },
        clearStorageData: vi.fn(async () => {}),
        clearCache: vi.fn(async () => {}),
      },
    };
    destroyed = false;
    constructor(options: Record<string, unknown>) {
      created.push({ options, contents: this.webContents, window: this });
    }
    loadFile = vi.fn(async () => {});
    destroy() {
      this.destroyed = true;
    }
  }
  return { BrowserWindow };
});

const { hiddenPrintWindow, PDF_OPTIONS, printInTurn, printReportPdf } = await import('../../app/main/print');
const { PRINT_POLICY } = await import('../../app/shared/print-request');

const REPORT = '<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>r</title>\n</head>\n<body><p>Preliminary sizing</p></body>\n</html>\n';
// A PDF file starts with "%PDF-" and its version (ISO 32000-1 section 7.5.2).
const PDF = Buffer.from('%PDF-1.4\n%%EOF\n', 'latin1');

function fakeWindow(print: () => Promise<Buffer> = async () => PDF, load: (file: string) => Promise<void> = async () => {}) {
  const seen: { file?: string; html?: string; options?: unknown; destroyed: boolean } = { destroyed: false };
  const window = {
    loadFile: vi.fn(async (file: string) => {
      seen.file = file;
      seen.html = readFileSync(file, 'utf8');
      await load(file);
    }),
    webContents: {
      printToPDF: vi.fn(async (options: unknown) => {
        seen.options = options;
        return print();
      }),
    },
    destroy: vi.fn(() => void (seen.destroyed = true)),
  };
  return { window, seen };
}

describe('printReportPdf', () => {
  it('prints the report from a temporary file with the print policy first in its head, then removes the file and the window', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-print-test-'));
    const { window, seen } = fakeWindow();
    const result = await printReportPdf({ html: REPORT }, { openWindow: () => window, folder });
    expect(result.ok).toBe(true);
    if (result.ok) expect(Buffer.from(result.value).equals(PDF)).toBe(true);
    expect(seen.html).toMatch(new RegExp(`<head>\\n<meta http-equiv="Content-Security-Policy" content="${PRINT_POLICY.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}">\\n<meta charset="utf-8">`));
    expect(seen.options).toEqual(PDF_OPTIONS);
    expect(PDF_OPTIONS).toMatchObject({ printBackground: true, preferCSSPageSize: true });
    expect(seen.destroyed).toBe(true);
    expect(existsSync(seen.file!)).toBe(false);
    expect(readdirSync(folder)).toEqual([]);
  });

  it.each([
    [null, '(request)'],
    [{ html: 5 }, 'html'],
    [{ html: '<p>not a document</p>' }, 'html'],
    [{ html: REPORT, file: '/etc/passwd' }, 'file'],
    [{ html: REPORT.replace('<meta charset="utf-8">', '<meta http-equiv="refresh" content="0;url=file:///etc/passwd">') }, 'html'],
  ])('refuses %j as a bad request naming %s, without opening a window', async (payload, field) => {
    const openWindow = vi.fn();
    const result = await printReportPdf(payload, { openWindow });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe('bad-request');
      expect(result.error.field).toBe(field);
    }
    expect(openWindow).not.toHaveBeenCalled();
  });

  it('answers a printer failure with a message, and still cleans up', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'loftpoint-print-test-'));
    const { window, seen } = fakeWindow(async () => {
      throw new Error('Printing failed\nat somewhere');
    });
    const result = await printReportPdf({ html: REPORT }, { openWindow: () => window, folder });
    expect(result).toEqual({ ok: false, error: { code: 'io', message: 'The report could not be printed to PDF: Printing failed' } });
    expect(seen.destroyed).toBe(true);
    expect(readdirSync(folder)).toEqual([]);
  });

  it('gives up on a page that never finishes loading', async () => {
    const { window, seen } = fakeWindow(undefined, () => new Promise(() => {}));
    const result = await printReportPdf({ html: REPORT }, { openWindow: () => window, timeoutMs: 50 });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.message).toContain('longer than');
    expect(seen.destroyed).toBe(true);
  });

  it('refuses to hand back bytes that are not a PDF', async () => {
    const { window } = fakeWindow(async () => Buffer.from('<html>'));
    const result = await printReportPdf({ html: REPORT }, { openWindow: () => window });
    expect(result.ok).toBe(false);
  });
});

describe('hiddenPrintWindow', () => {
  it('is never shown, runs no script, has no Node, uses the one in-memory print session, and is locked to its page', () => {
    hiddenPrintWindow('/tmp/loftpoint-print-x/report.html');
    const { options, contents } = created[0];
    expect(options.show).toBe(false);
    // Electron's security checklist (electronjs.org/docs/latest/tutorial/security) and
    // webPreferences.javascript (electronjs.org/docs/latest/api/structures/web-preferences).
    expect(options.webPreferences).toMatchObject({ javascript: false, sandbox: true, contextIsolation: true, nodeIntegration: false, webSecurity: true, webviewTag: false });
    const partition = (options.webPreferences as { partition: string }).partition;
    // Without the "persist:" prefix a partition lives in memory only (Electron session docs).
    expect(partition).toBe('loftpoint-print');
    expect(partition.startsWith('persist:')).toBe(false);
    // Electron keeps every session it made until the app quits: one per print would pile up.
    hiddenPrintWindow('/tmp/loftpoint-print-y/report.html');
    expect((created[1].options.webPreferences as { partition: string }).partition).toBe(partition);
    const webContents = contents as { on: ReturnType<typeof vi.fn>; setWindowOpenHandler: ReturnType<typeof vi.fn>; session: { webRequest: { onBeforeRequest: ReturnType<typeof vi.fn> } } };
    expect(webContents.on.mock.calls.map(([event]) => event)).toContain('will-navigate');
    expect(webContents.setWindowOpenHandler).toHaveBeenCalled();
    const filter = webContents.session.webRequest.onBeforeRequest.mock.calls[0][0] as (details: { url: string }, callback: (answer: { cancel: boolean }) => void) => void;
    const answer = (url: string) => {
      let cancel = true;
      filter({ url }, (result) => (cancel = result.cancel));
      return cancel;
    };
    expect(answer('file:///tmp/loftpoint-print-x/report.html')).toBe(false);
    expect(answer('file:///home/ada/.ssh/id_rsa')).toBe(true);
    expect(answer('https://example.com/')).toBe(true);
  });
});

describe('print sessions', () => {
  it('are emptied when the print window is released, so no print leaves anything behind', async () => {
    const before = created.length;
    const window = hiddenPrintWindow('/tmp/loftpoint-print-z/report.html');
    const record = created[before];
    const session = record.contents.session as { clearStorageData: ReturnType<typeof vi.fn>; clearCache: ReturnType<typeof vi.fn> };
    await window.destroy();
    expect(record.window.destroyed).toBe(true);
    expect(session.clearStorageData).toHaveBeenCalledTimes(1);
    expect(session.clearCache).toHaveBeenCalledTimes(1);
  });

  it('run one at a time, since they share the one print session', async () => {
    const order: string[] = [];
    let release!: () => void;
    const first = printInTurn(async () => {
      order.push('first starts');
      await new Promise<void>((resolve) => (release = resolve));
      order.push('first ends');
    });
    const second = printInTurn(async () => void order.push('second starts'));
    await new Promise((resolve) => setTimeout(resolve, 10));
    expect(order).toEqual(['first starts']);
    release();
    await Promise.all([first, second]);
    expect(order).toEqual(['first starts', 'first ends', 'second starts']);
  });
});
