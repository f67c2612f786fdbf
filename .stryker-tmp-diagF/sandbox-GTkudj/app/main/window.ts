/**
 * The designer window: context isolation, sandbox, no Node in the page, our
 * own built page only, and a preload that exposes the service API.
 */
// @ts-nocheck

import { BrowserWindow } from 'electron';
import { PAGE_URL } from './page-protocol';
import { lockSession, lockWebContents } from './security';
import { DEFAULT_SIZE, MIN_SIZE, type WindowPlacement } from './window-state';

export interface WindowFiles {
  /** out/renderer/index.html */
  page: string;
  /** out/preload/index.cjs */
  preload: string;
  /** During development only: the renderer's dev server. */
  devUrl?: string;
}

/** The page URL the window shows, for navigation and sender checks: our own protocol, never file://. */
export function pageUrl(files: WindowFiles): string {
  return files.devUrl ?? PAGE_URL;
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

export function createDesignerWindow(files: WindowFiles, placement: WindowPlacement | null = null): BrowserWindow {
  const window = new BrowserWindow({
    ...(placement ? placement.bounds : DEFAULT_SIZE),
    minWidth: MIN_SIZE.width,
    minHeight: MIN_SIZE.height,
    show: false,
    title: 'Loftpoint',
    backgroundColor: '#eceee9',
    webPreferences: { ...SECURE_PREFERENCES, preload: files.preload },
  });
  const url = pageUrl(files);
  lockWebContents(window.webContents, url);
  lockSession(window.webContents.session, url);
  window.once('ready-to-show', () => {
    if (placement?.maximized) window.maximize();
    window.show();
  });
  void window.loadURL(url);
  return window;
}
