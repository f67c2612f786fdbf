/**
 * Printing a design-review report to PDF for the desktop window: the page
 * sends the report's HTML; main checks it, writes it to a fresh temporary
 * folder and prints it in a hidden window with JavaScript off, its own
 * in-memory session and no way out (no navigation, no requests but its own
 * file), then hands back the bytes. The page itself cannot print to PDF.
 */
// @ts-nocheck

import { BrowserWindow, type PrintToPDFOptions } from 'electron';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { ServiceResult } from '../service/contract';
import { checkPrintRequest } from '../shared/print-request';
import { failure } from '../shared/transport';
import { lockSession, lockWebContents } from './security';
import { SECURE_PREFERENCES } from './window';

/** The part of a BrowserWindow printing uses. */
export interface PrintWindow {
  loadFile(file: string): Promise<void>;
  webContents: { printToPDF(options: PrintToPDFOptions): Promise<Buffer> };
  /** Closes the window and empties its session, so nothing of a print outlives it. */
  destroy(): void | Promise<void>;
}

/**
 * Every print shares one in-memory session (never on disk), emptied after
 * each print: a session per print would stay in memory until the app quits,
 * as Electron keeps every session it made.
 */
export const PRINT_PARTITION = 'loftpoint-print';

export interface PrintDeps {
  /** A hidden window that may show only `page`. */
  openWindow: (page: string) => PrintWindow;
  /** Where the temporary folder goes [the system's]. */
  folder?: string;
  timeoutMs?: number;
}

/** Paper size and margins come from the report's own @page rule; its shaded boxes print. */
export const PDF_OPTIONS: PrintToPDFOptions = { printBackground: true, preferCSSPageSize: true, generateDocumentOutline: true };

/** A window for printing only: never shown, no scripts, no Node, its own session. */
export function printWindowOptions(partition: string) {
  return {
    show: false,
    width: 900,
    height: 1200,
    // The designer window's locked-down settings, and no JavaScript at all.
    webPreferences: { ...SECURE_PREFERENCES, javascript: false, partition },
  };
}

export function hiddenPrintWindow(page: string): PrintWindow {
  // The print session (in memory, never on disk), locked to the one page.
  const window = new BrowserWindow(printWindowOptions(PRINT_PARTITION));
  const session = window.webContents.session;
  const url = pathToFileURL(page).href;
  lockWebContents(window.webContents, url);
  lockSession(session, url);
  return {
    loadFile: (file) => window.loadFile(file),
    webContents: window.webContents,
    async destroy() {
      window.destroy();
      await Promise.all([session.clearStorageData(), session.clearCache()]).catch(() => undefined);
    },
  };
}

let queue: Promise<unknown> = Promise.resolve();

/** One print at a time: they share the print session, which is locked to one page. */
export function printInTurn<T>(work: () => Promise<T>): Promise<T> {
  const next = queue.then(work, work);
  queue = next.catch(() => undefined);
  return next;
}

function withTimeout<T>(work: Promise<T>, ms: number): Promise<T> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`it took longer than ${Math.round(ms / 1000)} s`)), ms);
    work.then(
      (value) => (clearTimeout(timer), resolve(value)),
      (error: unknown) => (clearTimeout(timer), reject(error)),
    );
  });
}

export async function printReportPdf(payload: unknown, deps: PrintDeps): Promise<ServiceResult<Uint8Array>> {
  const checked = checkPrintRequest(payload);
  if (!checked.ok) return failure('bad-request', `printPdf: ${checked.field}: ${checked.message}`, checked.field);
  let folder: string | null = null;
  let window: PrintWindow | null = null;
  try {
    folder = await mkdtemp(join(deps.folder ?? tmpdir(), 'loftpoint-print-'));
    const page = join(folder, 'report.html');
    await writeFile(page, checked.html, 'utf8');
    const opened = deps.openWindow(page);
    window = opened;
    const pdf = await withTimeout(
      opened.loadFile(page).then(() => opened.webContents.printToPDF(PDF_OPTIONS)),
      deps.timeoutMs ?? 60_000,
    );
    const bytes = new Uint8Array(pdf);
    if (bytes.length < 5 || String.fromCharCode(...bytes.subarray(0, 5)) !== '%PDF-') return failure('internal', 'The report could not be printed to PDF: the printer gave no PDF');
    return { ok: true, value: bytes };
  } catch (error) {
    return failure('io', `The report could not be printed to PDF: ${error instanceof Error ? error.message.split('\n')[0] : String(error)}`);
  } finally {
    await window?.destroy();
    if (folder) await rm(folder, { recursive: true, force: true });
  }
}
