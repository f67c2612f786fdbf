// @ts-nocheck
import { describe, expect, it, vi } from 'vitest';

const created: Array<{ options: Record<string, unknown>; loaded: string[] }> = [];

vi.mock('electron', () => {
  class BrowserWindow {
    webContents = {
      on: vi.fn(),
      setWindowOpenHandler: vi.fn(),
      session: { setPermissionRequestHandler: vi.fn(), setPermissionCheckHandler: vi.fn(), webRequest: { onBeforeRequest: vi.fn() } },
    };
    record: { options: Record<string, unknown>; loaded: string[] };
    constructor(options: Record<string, unknown>) {
      this.record = { options, loaded: [] };
      created.push(this.record);
    }
    once = vi.fn();
    show = vi.fn();
    loadFile = vi.fn(async (file: string) => void this.record.loaded.push(file));
    loadURL = vi.fn(async (url: string) => void this.record.loaded.push(url));
  }
  return { BrowserWindow };
});

const { createDesignerWindow, pageUrl } = await import('../../app/main/window');

describe('createDesignerWindow', () => {
  it('isolates the page: context isolation, sandbox, no Node, web security', () => {
    createDesignerWindow({ page: '/opt/lp/out/renderer/index.html', preload: '/opt/lp/out/preload/index.cjs' });
    const preferences = created[0].options.webPreferences as Record<string, unknown>;
    // Electron's security checklist (electronjs.org/docs/latest/tutorial/security).
    expect(preferences).toMatchObject({
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      preload: '/opt/lp/out/preload/index.cjs',
    });
    // The page comes through our own protocol, never file:// (Electron security checklist, item 18).
    expect(created[0].loaded).toEqual(['loftpoint://app/index.html']);
  });

  it('names the built page by its own protocol', () => {
    expect(pageUrl({ page: '/opt/lp/out/renderer/index.html', preload: '' })).toBe('loftpoint://app/index.html');
    expect(pageUrl({ page: '', preload: '', devUrl: 'http://localhost:5173/' })).toBe('http://localhost:5173/');
  });
});
