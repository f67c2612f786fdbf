/**
 * What the desktop window's preload puts on `window.api`: the service
 * methods (typed from the contract), plus the three things only the shell
 * can do for the page: tell it about menu commands, write a file the person
 * picks in a save dialog, and print a report to PDF.
 */
// @ts-nocheck

import type { RemoteService, ServiceResult } from './contract';

/** Menu items the page acts on (the shell handles New, Open and Quit itself). */
const WINDOW_COMMANDS = [
  'save-version',
  'undo',
  'redo',
  'export-diagram',
  'export-concept',
  'export-diagram-png',
  'export-boundaries',
  'export-report-html',
  'export-report-pdf',
  'units-si',
  'units-us',
  'units-kt-ft',
  'reset-view',
  'show-history',
  /** The shell opened or created another project: reload everything. */
  'project-changed',
] as const;

export type WindowCommand = (typeof WINDOW_COMMANDS)[number];

export function isWindowCommand(value: unknown): value is WindowCommand {
  return typeof value === 'string' && (WINDOW_COMMANDS as readonly string[]).includes(value);
}

/** Export formats the page can hand to the shell, with the file filter each gets. */
export const EXPORT_KINDS = {
  svg: { name: 'SVG diagram', extensions: ['svg'], mime: 'image/svg+xml', binary: false },
  json: { name: 'Concept JSON', extensions: ['json'], mime: 'application/json', binary: false },
  csv: { name: 'CSV table', extensions: ['csv'], mime: 'text/csv', binary: false },
  html: { name: 'HTML report', extensions: ['html', 'htm'], mime: 'text/html', binary: false },
  pdf: { name: 'PDF report', extensions: ['pdf'], mime: 'application/pdf', binary: true },
  png: { name: 'PNG image', extensions: ['png'], mime: 'image/png', binary: true },
} as const;

export type ExportKind = keyof typeof EXPORT_KINDS;

/** How `content` is written: text as UTF-8, or bytes as base64 (the binary kinds, PDF and PNG). */
export type ExportEncoding = 'utf8' | 'base64';

export interface ExportFileRequest {
  kind: ExportKind;
  /** File name offered in the dialog, without folders. */
  suggestedName: string;
  content: string;
  /** Absent means 'utf8'. */
  encoding?: ExportEncoding;
}

/** The file written, or null when the person cancelled the dialog. */
export type ExportFileResponse = { file: string } | null;

/** A design-review report (self-contained HTML) for the shell to print to PDF. */
export interface PrintPdfRequest {
  html: string;
}

/** What the page tells the shell so its menu and title follow the page. */
export interface WindowStateReport {
  units: 'si' | 'us' | 'kt-ft';
  /** The concept in view has changes not saved as a version. */
  dirty: boolean;
}

export function isWindowStateReport(value: unknown): value is WindowStateReport {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const { units, dirty, ...rest } = value as Record<string, unknown>;
  return Object.keys(rest).length === 0 && (units === 'si' || units === 'us' || units === 'kt-ft') && typeof dirty === 'boolean';
}

export interface DesktopApi extends RemoteService {
  onCommand(listener: (command: WindowCommand) => void): () => void;
  exportFile(request: ExportFileRequest): Promise<ServiceResult<ExportFileResponse>>;
  /** The PDF's bytes, printed by the shell with scripts off. */
  printPdf(request: PrintPdfRequest): Promise<ServiceResult<Uint8Array>>;
  /** Tells the shell the page's units and unsaved state (menu radio, window title). */
  reportWindowState(state: WindowStateReport): void;
}
