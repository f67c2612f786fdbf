/**
 * The designer window: context isolation, sandbox, no Node in the page, our
 * own built page only, and a preload that exposes the service API.
 */
import { BrowserWindow } from 'electron';
import { pathToFileURL } from 'node:url';
import { lockSession, lockWebContents } from './security';

export interface WindowFiles {
  /** out/renderer/index.html */
  page: string;
  /** out/preload/index.cjs */
  preload: string;
  /** During development only: the renderer's dev server. */
  devUrl?: string;
}

/** The page URL the window shows, for navigation and sender checks. */
export function pageUrl(files: WindowFiles): string {
  return files.devUrl ?? pathToFileURL(files.page).href;
}

export const SECURE_PREFERENCES = {
  contextIsolation: true,
  sandbox: true,
  nodeIntegration: false,
  nodeIntegrationInWorker: false,
  nodeIntegrationInSubFrames: false,
  webSecurity: true,
  allowRunningInsecureContent: false,
  webviewTag: false,
  spellcheck: false,
  navigateOnDragDrop: false,
} as const;

export function createDesignerWindow(files: WindowFiles): BrowserWindow {
  const window = new BrowserWindow({
    width: 1440,
    height: 900,
    minWidth: 1000,
    minHeight: 620,
    show: false,
    title: 'Loftpoint',
    backgroundColor: '#eceee9',
    webPreferences: { ...SECURE_PREFERENCES, preload: files.preload },
  });
  const url = pageUrl(files);
  lockWebContents(window.webContents, url);
  lockSession(window.webContents.session, url);
  window.once('ready-to-show', () => window.show());
  void (files.devUrl ? window.loadURL(files.devUrl) : window.loadFile(files.page));
  return window;
}
